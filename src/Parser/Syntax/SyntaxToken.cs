using MotorLang.Parser.Text;

namespace MotorLang.Parser.Syntax;

public enum TokenKind { Word, String, Comment }

/// <summary>
/// One token on one line. Its position is stored here and nowhere else; offsets are derived
/// from the line's start when needed.
/// </summary>
public readonly record struct SyntaxToken(TokenKind Kind, int Line, int Column, string Text)
{
    public int Length => Text.Length;

    public int EndColumn => Column + Text.Length;

    public SourceRange Range => SourceRange.OnLine(Line, Column, Text.Length);

    /// <summary>For a string token, its content without quotes and with escapes resolved.</summary>
    public string StringValue
    {
        get
        {
            if (Kind != TokenKind.String) return Text;
            var inner = Text.Length >= 2 && Text[^1] == '"' && !EndsWithEscape(Text) ? Text[1..^1] : Text[1..];
            return inner.Replace("\\\"", "\"").Replace("\\\\", "\\");
        }
    }

    private static bool EndsWithEscape(string t)
    {
        var backslashes = 0;
        for (var i = t.Length - 2; i >= 1 && t[i] == '\\'; i--) backslashes++;
        return backslashes % 2 == 1;
    }
}
