using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Formatting;

/// <summary>
/// Which lines the formatter must leave byte for byte as written: every line that carries a
/// diagnostic of any kind, every line the parser marked broken (an error of its own, or under a
/// header it could not read), every line of a merge conflict, and any statement whose canonical
/// form would not account for every token on it. A document that was not read at all (P018,
/// P019) is left alone as a whole.
/// </summary>
public static class FrozenLines
{
    /// <summary>True when the document was not read (too large, or binary): there is nothing the formatter may touch.</summary>
    public static bool IsUnreadable(ParseResult parsed) =>
        parsed.Diagnostics.Any(d => d.Code is SyntaxCodes.FileTooLarge or SyntaxCodes.BinaryContent);

    public static bool[] Of(ParseResult parsed)
    {
        var lines = parsed.Tree.Lines;
        var frozen = new bool[lines.Count];
        foreach (var d in parsed.Diagnostics)
        {
            // Diagnostics sit on one line; marking both ends costs nothing and holds if one ever spans two.
            Mark(frozen, d.Range.Start.Line);
            Mark(frozen, d.Range.End.Line);
        }

        for (var i = 0; i < frozen.Length; i++)
        {
            var line = lines[i];
            frozen[i] |= line.IsBroken || line.InConflict || (line.Tokens.Length > 0 && !Accounted(line));
        }

        return frozen;
    }

    private static void Mark(bool[] frozen, int line)
    {
        if (line >= 0 && line < frozen.Length) frozen[line] = true;
    }

    /// <summary>
    /// True when the line's statement covers every token: the keyword, and each other token inside
    /// the range of an argument. The formatter writes a line from its statement, so a token outside
    /// every argument would be lost; such a line is not rewritten.
    /// </summary>
    private static bool Accounted(SyntaxLine line)
    {
        if (line.Statement is not { } statement) return false;
        var tokens = line.Tokens;
        var args = statement.Args;
        for (var t = 1; t < tokens.Length; t++)
        {
            var range = tokens[t].Range;
            var covered = false;
            for (var a = 0; a < args.Length && !covered; a++)
                covered = args[a].Range.Start.CompareTo(range.Start) <= 0 && range.End.CompareTo(args[a].Range.End) <= 0;
            if (!covered) return false;
        }

        return true;
    }
}
