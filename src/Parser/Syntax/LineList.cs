using System.Collections;
using System.Runtime.InteropServices;

namespace MotorLang.Parser.Syntax;

/// <summary>
/// The lines of a tree: an immutable list kept in chunks, so that the tree after a one-line edit
/// shares all but one chunk with the tree before. Replacing a line copies a few kilobytes, not the
/// whole table (half a megabyte for 60,000 lines), which keeps typing in a large list light.
/// </summary>
public sealed class LineList : IReadOnlyList<SyntaxLine>
{
    private const int Shift = 10;
    private const int ChunkSize = 1 << Shift;
    private const int Mask = ChunkSize - 1;

    private readonly SyntaxLine[][] _chunks;

    private LineList(SyntaxLine[][] chunks, int count)
    {
        _chunks = chunks;
        Count = count;
    }

    public static LineList From(IReadOnlyList<SyntaxLine> lines)
    {
        var chunks = new SyntaxLine[(lines.Count + ChunkSize - 1) >> Shift][];
        for (var c = 0; c < chunks.Length; c++)
        {
            var chunk = chunks[c] = new SyntaxLine[Math.Min(ChunkSize, lines.Count - (c << Shift))];
            for (var i = 0; i < chunk.Length; i++) chunk[i] = lines[(c << Shift) + i];
        }

        return new LineList(chunks, lines.Count);
    }

    public int Count { get; }

    /// <summary>Collects lines straight into chunks, so a large document is never held in one big array.</summary>
    public sealed class Builder
    {
        private readonly List<SyntaxLine[]> _chunks = [];
        private int _count;

        public void Add(SyntaxLine line)
        {
            if ((_count & Mask) == 0) _chunks.Add(new SyntaxLine[ChunkSize]);
            _chunks[^1][_count & Mask] = line;
            _count++;
        }

        public LineList ToList()
        {
            if (_chunks.Count > 0 && (_count & Mask) != 0) Array.Resize(ref CollectionsMarshal.AsSpan(_chunks)[^1], _count & Mask);
            return new LineList([.. _chunks], _count);
        }
    }

    /// <summary>The same as <see cref="Count"/>, for callers that think of the lines as an array.</summary>
    public int Length => Count;

    public SyntaxLine this[int index] =>
        (uint)index < (uint)Count ? _chunks[index >> Shift][index & Mask] : throw new ArgumentOutOfRangeException(nameof(index));

    /// <summary>A list with one line replaced; every other chunk is shared.</summary>
    public LineList SetItem(int index, SyntaxLine line)
    {
        if ((uint)index >= (uint)Count) throw new ArgumentOutOfRangeException(nameof(index));
        var chunks = (SyntaxLine[][])_chunks.Clone();
        var chunk = (SyntaxLine[])chunks[index >> Shift].Clone();
        chunk[index & Mask] = line;
        chunks[index >> Shift] = chunk;
        return new LineList(chunks, Count);
    }

    public Enumerator GetEnumerator() => new(this);

    IEnumerator<SyntaxLine> IEnumerable<SyntaxLine>.GetEnumerator() => GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>A struct enumerator, so a foreach over the lines allocates nothing.</summary>
    public struct Enumerator(LineList list) : IEnumerator<SyntaxLine>
    {
        private int _index = -1;

        public readonly SyntaxLine Current => list[_index];

        readonly object IEnumerator.Current => Current;

        public bool MoveNext() => ++_index < list.Count;

        public void Reset() => _index = -1;

        public readonly void Dispose()
        {
        }
    }
}
