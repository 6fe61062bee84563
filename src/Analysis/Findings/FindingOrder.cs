namespace MotorLang.Analysis.Findings;

/// <summary>
/// A finding with its place among findings at the same position: where it came from (the
/// parser's line, a motor's or a feeder's header line) and its index there. Findings are
/// reported by position, then code, then this rank, so that a full analysis and an update after an
/// edit give the same order, and fixes inserted at one point keep the order the sizer wrote them.
/// </summary>
internal readonly record struct RankedFinding(Finding Finding, long Rank)
{
    public static long ParseRank(int line, int indexOnLine) => ((long)line << 20) | (uint)indexOnLine;

    public static long MotorRank(int headerLine, int index) => (1L << 60) | ((long)headerLine << 20) | (uint)index;

    public static long FeederRank(int headerLine, int index) => (2L << 60) | ((long)headerLine << 20) | (uint)index;

    /// <summary>The fault study's findings, in the order it wrote them (it runs whole on every analysis).</summary>
    public static long PowerRank(int index) => (3L << 60) | (uint)index;
}

internal sealed class FindingOrder : IComparer<RankedFinding>
{
    public static readonly FindingOrder Instance = new();

    public int Compare(RankedFinding x, RankedFinding y)
    {
        var c = x.Finding.Range.Start.CompareTo(y.Finding.Range.Start);
        if (c == 0) c = string.CompareOrdinal(x.Finding.Code, y.Finding.Code);
        if (c == 0) c = x.Rank.CompareTo(y.Rank);
        return c;
    }

    /// <summary>Joins two lists that are each in this order into one.</summary>
    public static List<RankedFinding> Merge(IReadOnlyList<RankedFinding> a, IReadOnlyList<RankedFinding> b)
    {
        var merged = new List<RankedFinding>(a.Count + b.Count);
        int i = 0, j = 0;
        while (i < a.Count && j < b.Count) merged.Add(Instance.Compare(a[i], b[j]) <= 0 ? a[i++] : b[j++]);
        while (i < a.Count) merged.Add(a[i++]);
        while (j < b.Count) merged.Add(b[j++]);
        return merged;
    }
}
