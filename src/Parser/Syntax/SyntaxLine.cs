using System.Collections.Immutable;
using MotorLang.Parser.Statements;

namespace MotorLang.Parser.Syntax;

public enum LineKind { Blank, Comment, Statement, ConflictMarker }

/// <summary>
/// One physical line: indentation, tokens, an optional comment, trailing whitespace and its own
/// line ending. The gaps between tokens are read back from <see cref="Content"/>, so the line
/// prints back exactly as written.
/// </summary>
public sealed class SyntaxLine
{
    internal SyntaxLine(int index, int offset, string content, string lineEnding, int indentWidth, bool indentHasTab,
        ImmutableArray<SyntaxToken> tokens, SyntaxToken? comment, bool inConflict)
    {
        Index = index;
        Offset = offset;
        Content = content;
        LineEnding = lineEnding;
        IndentWidth = indentWidth;
        IndentHasTab = indentHasTab;
        Tokens = tokens;
        Comment = comment;
        InConflict = inConflict;
    }

    public int Index { get; }

    /// <summary>Offset of the first character of the line in the document text (after any BOM).</summary>
    public int Offset { get; }

    /// <summary>The line without its ending.</summary>
    public string Content { get; }

    /// <summary>"\n", "\r\n" or "" for a last line without one.</summary>
    public string LineEnding { get; }

    public int IndentWidth { get; }

    public bool IndentHasTab { get; }

    /// <summary>Word and string tokens, in order; the comment is separate.</summary>
    public ImmutableArray<SyntaxToken> Tokens { get; }

    public SyntaxToken? Comment { get; }

    /// <summary>True for the marker lines and both sides of an unresolved merge conflict.</summary>
    public bool InConflict { get; }

    /// <summary>Set by the structure pass for statement lines.</summary>
    public Statement? Statement { get; internal set; }

    /// <summary>Block depth assigned by the structure pass; -1 where it could not be decided.</summary>
    public int Depth { get; internal set; } = -1;

    /// <summary>True when this line has an error of its own or sits under a line that could not be read.</summary>
    public bool IsBroken { get; internal set; }

    public LineKind Kind =>
        IsConflictMarker(Content) && InConflict ? LineKind.ConflictMarker
        : Tokens.Length > 0 ? LineKind.Statement
        : Comment is not null ? LineKind.Comment
        : LineKind.Blank;

    internal static bool IsConflictMarker(string content) =>
        content.StartsWith("<<<<<<<", StringComparison.Ordinal) || content.StartsWith(">>>>>>>", StringComparison.Ordinal)
        || content.StartsWith("=======", StringComparison.Ordinal) || content.StartsWith("|||||||", StringComparison.Ordinal);

    /// <summary>Rebuilds the line from its pieces; equal to Content + LineEnding when positions are right.</summary>
    public string Print()
    {
        var sb = new System.Text.StringBuilder(Content.Length + 2);
        var col = 0;
        foreach (var t in Tokens.Append(Comment).OfType<SyntaxToken>())
        {
            sb.Append(Content, col, t.Column - col).Append(t.Text);
            col = t.EndColumn;
        }

        sb.Append(Content, col, Content.Length - col).Append(LineEnding);
        return sb.ToString();
    }
}
