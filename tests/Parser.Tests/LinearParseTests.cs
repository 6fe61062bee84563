using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using Xunit;

namespace MotorLang.Parser.Tests;

/// <summary>Work and memory of the parser in proportion to the input: cycles found in one pass, one diagnostic for a line's surplus values.</summary>
public sealed class LinearParseTests
{
    private sealed class Node(int id)
    {
        public int Id { get; } = id;
        public Node? Next { get; set; }
    }

    private static (long Steps, HashSet<Node> Members, Node[] Nodes) CycleOf(int n, int tail)
    {
        var nodes = Enumerable.Range(0, n + tail).Select(i => new Node(i)).ToArray();
        for (var i = 0; i < n; i++) nodes[i].Next = nodes[(i + 1) % n];
        for (var i = n; i < n + tail; i++) nodes[i].Next = nodes[i - 1]; // a tail leading into the cycle
        long steps = 0;
        var members = ReferenceCycles.Members(nodes.Reverse(), x => x.Next, ref steps);
        return (steps, members, nodes);
    }

    [Fact]
    public void CyclesAreFoundWithEachReferenceFollowedOnce()
    {
        var (small, _, _) = CycleOf(1000, 1000);
        var (large, members, nodes) = CycleOf(8000, 8000);
        Assert.True(large < 20 * small, $"steps {small} for 2000 nodes, {large} for 16000");
        Assert.Equal(16_001, large); // each node once, and one more step to come back round the cycle
        Assert.True(members.SetEquals(nodes.Take(8000)), "the cycle's nodes, and not the tail's");
    }

    [Fact]
    public void ACycleIsReportedOnceNamingItsFirstMembersAndACount()
    {
        var n = 3000;
        var text = string.Concat(Enumerable.Range(1, n).Select(i => $"feeder F-{i} 480V 3ph\n  from F-{i % n + 1}\n"))
                   + "feeder T 480V 3ph\n  from F-1\n";
        var parse = DocumentParser.Parse(text);
        var cycles = parse.Diagnostics.Where(d => d.Code == SyntaxCodes.ReferenceCycle).ToList();
        var cycle = Assert.Single(cycles); // one loop, one diagnostic; T leads into it but is not on it
        Assert.Equal(1, cycle.Range.Start.Line); // on F-1's own 'from' line, the first member written
        Assert.EndsWith($"F-1 (line 1) → F-2 (line 3) → F-3 (line 5) → F-4 (line 7) → F-5 (line 9) → F-6 (line 11) → F-7 (line 13) → F-8 (line 15) → {n - 8} more → F-1", cycle.Message);
        Assert.DoesNotContain(parse.Diagnostics, d => d.Code == SyntaxCodes.UnknownReference);
    }

    [Fact]
    public void SurplusValuesOnALineGiveOneDiagnosticForTheRest()
    {
        // 'motor' takes one current-free set of values: each '1A' is a problem.
        var text = "feeder F-1 480V 3ph\n  motor M-1 5hp" + string.Concat(Enumerable.Repeat(" 1A", 100)) + "\n";
        var onLine = DocumentParser.Parse(text).Diagnostics.Where(d => d.Range.Start.Line == 1).ToList();
        Assert.Equal(StatementParser.MaxProblemsPerLine + 1, onLine.Count);
        var rest = onLine[^1];
        Assert.Equal(SyntaxCodes.MoreOnLine, rest.Code);
        Assert.StartsWith("90 more problems on this line not shown", rest.Message);
        // "  motor M-1 5hp" is 15 characters; value k (from 0) starts after its space at 15 + 3k + 1.
        // The note covers the 11th value (k = 10) to the end of the last (k = 99, two characters).
        Assert.Equal(15 + 3 * 10 + 1, rest.Range.Start.Column);
        Assert.Equal(15 + 3 * 99 + 1 + 2, rest.Range.End.Column);
    }

    private static long AllocatedForValueLine(int values)
    {
        var text = "feeder F-1 480V 3ph\n  motor M-1 5hp" + string.Concat(Enumerable.Repeat(" 1A", values)) + "\n";
        DocumentParser.Parse(text); // warm up
        var before = GC.GetAllocatedBytesForCurrentThread();
        var parse = DocumentParser.Parse(text);
        var allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.True(parse.Diagnostics.Length <= StatementParser.MaxProblemsPerLine + 1);
        return allocated;
    }

    [Fact]
    public void ALongLineOfValuesAllocatesInProportionToItsLength()
    {
        long small = AllocatedForValueLine(20_000), large = AllocatedForValueLine(160_000);
        Assert.True(large < 12 * small, $"allocated {small} bytes for 20,000 values, {large} for 160,000");
        // Bounded per character of input (3 characters a value): the tokens, their grouping and
        // the messages built (and dropped) while counting: about 400 bytes a character today.
        Assert.True(large < 160_000 * 3 * 600L, $"{large} bytes for {160_000 * 3} characters");
    }
}
