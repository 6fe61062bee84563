using System.Text;
using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Formatting;

/// <summary>
/// What formatting must not change: every comment and every statement's canonical tokens, in
/// order, and the block depth of each statement. Whitespace, unit spelling and keyword case are
/// not part of it.
/// </summary>
public static class Fingerprint
{
    public static string Of(ParseResult parsed)
    {
        var sb = new StringBuilder();
        foreach (var line in parsed.Tree.Lines)
        {
            if (line.InConflict || (line.IsBroken && line.Tokens.Length > 0))
            {
                sb.Append("raw:").Append(line.Content.Trim()).Append('\n');
                continue;
            }

            if (line.Statement is { } s) sb.Append(line.Depth).Append(' ').Append(Formatter.Canonical(s)).Append('\n');
            if (line.Comment is { } c) sb.Append(c.Text).Append('\n');
        }

        return sb.ToString();
    }
}
