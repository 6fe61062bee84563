namespace MotorLang.Parser.Text;

/// <summary>A zero-based line and UTF-16 column, counted the way LSP counts them by default.</summary>
public readonly record struct TextPosition(int Line, int Column) : IComparable<TextPosition>
{
    public int CompareTo(TextPosition other) =>
        Line != other.Line ? Line.CompareTo(other.Line) : Column.CompareTo(other.Column);

    public override string ToString() => $"{Line + 1}:{Column + 1}";
}

/// <summary>A half-open range [Start, End) between two positions.</summary>
public readonly record struct SourceRange(TextPosition Start, TextPosition End)
{
    public static SourceRange OnLine(int line, int column, int length) =>
        new(new TextPosition(line, column), new TextPosition(line, column + length));

    public bool Contains(TextPosition p) => p.CompareTo(Start) >= 0 && p.CompareTo(End) <= 0;

    public static SourceRange Cover(SourceRange a, SourceRange b) =>
        new(a.Start.CompareTo(b.Start) <= 0 ? a.Start : b.Start, a.End.CompareTo(b.End) >= 0 ? a.End : b.End);

    public override string ToString() => $"{Start}-{End}";
}
