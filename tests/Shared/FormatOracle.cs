using System.Text;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;
using MotorLang.Parser.Syntax;

namespace MotorLang.Tests.Shared;

/// <summary>
/// What the formatter promises (docs/format.md, "Formatting"), checked from the outside: it
/// works from the scanner's tokens and the documented spellings, not from the formatter's code.
/// </summary>
public static class FormatOracle
{
    // The accepted aliases docs/format.md lists, each with the word the formatter writes instead.
    private static readonly Dictionary<string, string> Aliases = new(StringComparer.Ordinal)
    {
        ["pvc-40"] = "pvc", ["time-delay-fuse"] = "dual-element-fuse", ["squirrel-cage"] = "induction",
        ["energy-efficient"] = "premium", ["noncontinuous"] = "non-continuous", ["copper"] = "cu",
        ["aluminum"] = "al", ["aluminium"] = "al",
    };

    /// <summary>Returns null when every promise holds, else what broke.</summary>
    public static string? Violation(string input, FormatResult result) => Violation(input, DocumentParser.Parse(input), result);

    /// <summary>The same, given the input as already parsed.</summary>
    public static string? Violation(string input, ParseResult before, FormatResult result)
    {
        var output = result.Text;
        if (input.Length > 0 && output.Length == 0) return "non-empty input formatted to nothing";
        if (Parser.Text.TextEdits.Apply(input, result.Edits) != output) return "the edits do not give the formatted text";
        if (FrozenLines.IsUnreadable(before))
            return output == input && result.Edits.Count == 0 ? null : "an unreadable document was changed";
        if (before.Tree.HasBom && !output.StartsWith('\uFEFF')) return "the byte order mark was dropped";

        var after = DocumentParser.Parse(output);
        var flagged = new HashSet<int>(before.Diagnostics.Select(d => d.Range.Start.Line));
        var (a, b) = (before.Tree.Lines, after.Tree.Lines);
        var j = 0;
        for (var i = 0; i < a.Count; i++)
        {
            var x = a[i];
            if (IsBlank(x))
            {
                // Blank lines may go; a kept one pairs with the next blank output line.
                if (j < b.Count && IsBlank(b[j])) j++;
                continue;
            }

            if (j >= b.Count) return $"input line {i + 1} is missing from the output";
            var y = b[j++];
            if (x.LineEnding != y.LineEnding) return $"line {i + 1} lost its line ending";
            var leftAlone = flagged.Contains(i) || x.IsBroken || x.InConflict;
            if (leftAlone)
            {
                if (!x.ContentSpan.SequenceEqual(y.ContentSpan)) return $"line {i + 1} has an error or could not be read, yet was rewritten";
                continue;
            }

            if (x.Comment?.Text != y.Comment?.Text) return $"line {i + 1} changed its comment";
            if (Squeeze(x) != Squeeze(y)) return $"line {i + 1} lost or changed text: '{Squeeze(x)}' became '{Squeeze(y)}'";
        }

        if (j != b.Count) return "the output has lines the input did not";
        var again = Formatter.Format(after);
        if (again.Text != output) return "formatting the output again changes it";
        if (before.Diagnostics.IsEmpty && !result.Verified) return "a list without a single diagnostic was not formatted";
        return null;
    }

    private static bool IsBlank(SyntaxLine line) => line.ContentSpan.IndexOfAnyExcept(' ', '\t') < 0;

    /// <summary>
    /// The line's tokens without the spaces between them: descriptions exactly as written, other
    /// words in lower case with the documented aliases and unit spellings (MCM, a degree sign) replaced.
    /// </summary>
    private static string Squeeze(SyntaxLine line)
    {
        var sb = new StringBuilder();
        foreach (var t in line.Tokens)
        {
            if (t.Kind == TokenKind.String)
            {
                sb.Append('\u0001').Append(t.Text).Append('\u0001');
                continue;
            }

            var word = t.Text.ToLowerInvariant().Replace("°", "", StringComparison.Ordinal);
            if (Aliases.TryGetValue(word, out var canonical)) word = canonical;
            else if (word.EndsWith("mcm", StringComparison.Ordinal)) word = word[..^3] + "kcmil";
            sb.Append(word);
        }

        return sb.ToString();
    }
}
