using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser;
using MotorLang.Parser.Collections;
using MotorLang.Parser.Model;
using Xunit;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Long chains of 'like' and 'from' must cost work in proportion to their length. These count
/// the resolution steps (not wall time): 8 times the chain may cost at most 20 times the steps,
/// where the quadratic walks they replace cost 64 times.
/// </summary>
public sealed class LinearResolutionTests
{
    private static string LikeChain(int n)
    {
        var lines = new List<string> { "feeder F-1 480V 3ph", "  motor M-1 5hp", "    length 50ft" };
        for (var i = 2; i <= n; i++) lines.AddRange([$"  motor M-{i} 5hp", $"    like M-{i - 1}"]);
        return string.Join("\n", lines) + "\n";
    }

    private static string FromChain(int n)
    {
        var lines = new List<string>();
        for (var i = 1; i <= n; i++)
        {
            lines.Add($"feeder F-{i} 480V 3ph");
            if (i > 1) lines.Add($"  from F-{i - 1}");
            lines.AddRange(["  length 100ft", $"  motor M-{i} 5hp", "    length 50ft"]);
        }

        return string.Join("\n", lines) + "\n";
    }

    /// <summary>Every motor of the chain looks up its length, the way the motor sizer does; returns the steps walked.</summary>
    private static long LikeSteps(int n)
    {
        var model = DocumentParser.Parse(LikeChain(n)).Model;
        var likes = new LikeResolver(model);
        var first = model.Motors.First();
        foreach (var motor in model.Motors)
        {
            var found = likes.Get(motor, static m => m.Length);
            Assert.NotNull(found);
            Assert.Same(first, found.Value.Owner); // only M-1 writes a length; every motor inherits it
            Assert.False(likes.Has(motor, static m => m.HardStart)); // nobody writes hard-start
        }

        return likes.Steps;
    }

    [Fact]
    public void LikeChainResolutionIsLinear()
    {
        long small = LikeSteps(500), large = LikeSteps(4000);
        Assert.True(large < 20 * small, $"steps {small} for 500 motors, {large} for 4000");
        // Two attributes, each walked once per motor plus one memo hit per walk: at most 3 steps per motor and attribute.
        Assert.True(large <= 2 * 3 * 4000, $"{large} steps for 4000 motors");
    }

    [Fact]
    public void AHundredThousandLongLikeChainNeedsNoStack()
    {
        // Walked from the far end first, so one walk covers the whole chain.
        var model = DocumentParser.Parse(LikeChain(100_000)).Model;
        var likes = new LikeResolver(model);
        var last = model.Motors.Last();
        Assert.Equal("M-1", likes.Get(last, static m => m.Length)?.Owner.Tag?.Value);
        Assert.Equal(100_000, likes.Steps);
    }

    /// <summary>
    /// The remembered lookups give what walking each chain gives (<see cref="Likes"/>), on chains,
    /// trees, cycles with and without a motor that writes the value, and unknown tags.
    /// </summary>
    [Fact]
    public void RememberedLookupsEqualWalkingTheChain()
    {
        var text = string.Join("\n",
            "feeder F 480V 3ph",
            "  motor A 5hp", "    length 50ft",
            "  motor B 5hp", "    like A",
            "  motor C 5hp", "    like B", "    length 70ft",
            "  motor D 5hp", "    like C",
            "  motor E 5hp", "    like B",
            "  motor X 5hp", "    like Y",
            "  motor Y 5hp", "    like Z", "    quantity 2",
            "  motor Z 5hp", "    like X",
            "  motor P 5hp", "    like Q",
            "  motor Q 5hp", "    like P",
            "  motor T 5hp", "    like P",
            "  motor U 5hp", "    like NOBODY",
            "  motor V 5hp", "    like F") + "\n";
        var model = DocumentParser.Parse(text).Model;
        var likes = new LikeResolver(model);
        // Resolve in reverse order too, so that walks meet remembered motors from both sides.
        foreach (var motor in model.Motors.Reverse().Concat(model.Motors))
        {
            Assert.Equal(Likes.Get(motor, model, static m => m.Length)?.Owner, likes.Get(motor, static m => m.Length)?.Owner);
            Assert.Equal(Likes.Get(motor, model, static m => m.Quantity)?.Owner, likes.Get(motor, static m => m.Quantity)?.Owner);
            Assert.Equal(Likes.Has(motor, model, static m => m.Length is not null), likes.Has(motor, static m => m.Length is not null));
        }

        // Hand check: D is like C, which writes its own length; X's cycle takes Y's quantity; P and Q's cycle has no length.
        Assert.Equal("C", likes.Get(model.Motors.Single(m => m.Tag?.Value == "D"), static m => m.Length)?.Owner.Tag?.Value);
        Assert.Equal("Y", likes.Get(model.Motors.Single(m => m.Tag?.Value == "X"), static m => m.Quantity)?.Owner.Tag?.Value);
        Assert.Null(likes.Get(model.Motors.Single(m => m.Tag?.Value == "T"), static m => m.Length));
    }

    /// <summary>Sizes every motor and feeder as a full analysis does; returns the pass (for its step count) and the feeders.</summary>
    private static (SizingPass Pass, Dictionary<FeederNode, FeederResult> Feeders) SizeAll(string text)
    {
        var parse = DocumentParser.Parse(text);
        var pass = new SizingPass(parse);
        var motors = LayeredMap<MotorNode, MotorResult>.Empty().ToBuilder();
        foreach (var motor in parse.Model.Motors) motors[motor] = pass.Size(motor);
        return (pass, pass.SizeFeeders(motors, previous: null, affected: null, sharedMotor: null));
    }

    [Fact]
    public void CumulativeDropsDownAFromChainAreLinear()
    {
        var (small, _) = SizeAll(FromChain(100));
        var (large, feeders) = SizeAll(FromChain(800));
        Assert.True(large.FeederSteps < 20 * small.FeederSteps, $"steps {small.FeederSteps} for 100 feeders, {large.FeederSteps} for 800");

        // Hand calculation: the drop from the source to a feeder's load end is its own drop plus
        // each feeder's above it, so down the chain each total is the one above plus its own.
        decimal above = 0;
        foreach (var r in feeders.Values.OrderBy(r => r.Feeder.Header.Line.Index))
        {
            above += r.Drop?.Value?.Percent ?? 0;
            Assert.Equal(above, r.CumulativeDropPercent);
        }

        Assert.True(above > 0);
    }

    [Fact]
    public void FeederSizingDownAFromChainIsLinear()
    {
        // Each feeder of the chain carries every motor below it: adding them up per feeder from a
        // list of everything downstream costs n²/2 motor visits, from the totals of the feeder below n.
        var (small, _) = SizeAll(FromChain(100));
        var (large, feeders) = SizeAll(FromChain(800));
        Assert.True(large.FeederSteps < 20 * small.FeederSteps, $"steps {small.FeederSteps} for 100 feeders, {large.FeederSteps} for 800");

        // Hand calculation: a 5 hp 480 V three-phase motor takes 7.6 A (NFPA 70-2023 Table 430.250,
        // 460 V column). F-k carries the 801 - k motors of F-k to F-800, so NEC 430.24 requires
        // 125 % × 7.6 A for one and 7.6 A for each of the 800 - k others.
        foreach (var r in feeders.Values)
        {
            var k = int.Parse(r.Feeder.Tag!.Value[2..]);
            Assert.Equal(1.25m * 7.6m + (800 - k) * 7.6m, r.RequiredAmpacity!.Value);
            Assert.Equal((801 - k) * 7.6m, r.CalculatedLoad);
        }
    }

    [Fact]
    public void AFromCycleIsFoundOnceAndItsFeedersAreNotSized()
    {
        static string Cycle(int n) => string.Join("\n", Enumerable.Range(1, n).Select(i => $"feeder F-{i} 480V 3ph\n  from F-{i % n + 1}\n  motor M-{i} 5hp")) + "\n";
        var (small, _) = SizeAll(Cycle(200));
        var (large, feeders) = SizeAll(Cycle(1600));
        Assert.True(large.FeederSteps < 20 * small.FeederSteps, $"steps {small.FeederSteps} for 200 feeders, {large.FeederSteps} for 1600");
        // Conservative: a feeder on a cycle of 'from' would carry itself, so it is not sized and says so.
        Assert.All(feeders.Values, r =>
        {
            Assert.Null(r.RequiredAmpacity);
            Assert.Contains(r.SizingFindings, f => f.Code == FindingCodes.CannotCheck && f.Message.Contains("goes round in a circle"));
        });
    }

    [Fact]
    public void FindingsAreCappedPerFileWithOneNote()
    {
        // 1,000 bare motors give at least four findings each (no overload, wire, protection, ground).
        var text = "feeder F-1 480V 3ph\n" + string.Concat(Enumerable.Range(1, 1000).Select(i => $"  motor M-{i} 5hp\n"));
        var all = Analyzer.Analyze(text).Findings;
        Assert.True(all.Length > FindingCap.MaxShown + 1);
        var shown = FindingCap.Shown(all);
        Assert.Equal(FindingCap.MaxShown + 1, shown.Count);
        Assert.Equal(all.Take(FindingCap.MaxShown), shown.Take(FindingCap.MaxShown));
        var note = shown[^1];
        Assert.Equal(FindingCodes.NotShown, note.Code);
        Assert.Equal(all[FindingCap.MaxShown].Range, note.Range);
        Assert.StartsWith($"{all.Length - FindingCap.MaxShown} more findings not shown", note.Message);

        var few = all.Take(FindingCap.MaxShown).ToArray();
        Assert.Same(few, FindingCap.Shown(few));
    }
}
