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
    // A list has a hundred thousand lines, so a line keeps only what it needs: its text is a slice
    // of the document, and the rare comment sits in a small object of its own.
    private readonly string _source;
    private readonly int _start;
    private readonly int _length;
    private readonly CommentHolder? _comment;

    private sealed class CommentHolder(SyntaxToken token)
    {
        public SyntaxToken Token { get; } = token;
    }

    internal SyntaxLine(int index, string source, int start, int length, string lineEnding, int indentWidth, bool indentHasTab,
        ImmutableArray<SyntaxToken> tokens, SyntaxToken? comment, bool inConflict)
    {
        Index = index;
        _source = source;
        _start = start;
        _length = length;
        LineEnding = lineEnding;
        IndentWidth = indentWidth;
        IndentHasTab = indentHasTab;
        Tokens = tokens;
        _comment = comment is { } c ? new CommentHolder(c) : null;
        InConflict = inConflict;
    }

    public int Index { get; }

    /// <summary>The line without its ending, as a new string (prefer <see cref="ContentSpan"/>).</summary>
    public string Content => _source.Substring(_start, _length);

    public ReadOnlySpan<char> ContentSpan => _source.AsSpan(_start, _length);

    public int Length => _length;

    /// <summary>"\n", "\r\n" or "" for a last line without one.</summary>
    public string LineEnding { get; }

    public int IndentWidth { get; }

    public bool IndentHasTab { get; }

    /// <summary>Word and string tokens, in order; the comment is separate.</summary>
    public ImmutableArray<SyntaxToken> Tokens { get; }

    public SyntaxToken? Comment => _comment?.Token;

    /// <summary>True for the marker lines and both sides of an unresolved merge conflict.</summary>
    public bool InConflict { get; }

    /// <summary>Set by the structure pass for statement lines.</summary>
    public Statement? Statement { get; internal set; }

    /// <summary>Block depth assigned by the structure pass; -1 where it could not be decided.</summary>
    public int Depth { get; internal set; } = -1;

    /// <summary>True when this line has an error of its own or sits under a line that could not be read.</summary>
    public bool IsBroken { get; internal set; }

    public LineKind Kind =>
        InConflict && IsConflictMarker(ContentSpan) ? LineKind.ConflictMarker
        : Tokens.Length > 0 ? LineKind.Statement
        : Comment is not null ? LineKind.Comment
        : LineKind.Blank;

    internal static bool IsConflictMarker(ReadOnlySpan<char> content) =>
        content.StartsWith("<<<<<<<", StringComparison.Ordinal) || content.StartsWith(">>>>>>>", StringComparison.Ordinal)
        || content.StartsWith("=======", StringComparison.Ordinal) || content.StartsWith("|||||||", StringComparison.Ordinal);

    /// <summary>Rebuilds the line from its pieces; equal to Content + LineEnding when positions are right.</summary>
    public string Print()
    {
        var content = ContentSpan;
        var sb = new System.Text.StringBuilder(content.Length + 2);
        var col = 0;
        foreach (var t in Comment is { } c ? Tokens.Add(c) : Tokens)
        {
            sb.Append(content[col..t.Column]).Append(t.Text);
            col = t.EndColumn;
        }

        sb.Append(content[col..]).Append(LineEnding);
        return sb.ToString();
    }
}
