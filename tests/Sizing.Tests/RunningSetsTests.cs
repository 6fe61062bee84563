using CsCheck;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>430.24 Exception No. 3 (interlocked motors), 430.26 (demand factor) and 430.53 / 430.110(C) group rules, against hand calculations.</summary>
public class RunningSetsTests
{
    // NFPA 70-2023 430.24 Exception No. 3, hand calculation (Table 430.250, 460 V column):
    // two 40 hp pumps (52 A each) interlocked duty/standby, one 5 hp pump (7.6 A) free.
    // Without the exception: 125 % x 52 + 52 + 7.6 = 124.6 A. With it only one 40 hp runs:
    // 125 % x 52 + 7.6 = 72.6 A.
    [Fact]
    public void DutyStandbyPairCountsOnePump()
    {
        var (amps, steps) = RunningSets.MotorShare(7.6m, 7.6m,
            [new("P-1A", "HPU", "1", 52m, 1), new("P-1B", "HPU", "2", 52m, 1)]);
        Assert.Equal(72.6m, amps);
        Assert.All(steps, s => Assert.Equal("NEC 430.24 Exception No. 3", s.Rule));
    }

    // The trap: the set with the larger sum is not always the one that governs, because 430.24
    // adds 25 % of the largest running motor. Set 1 = three 10 hp (14 A each, 42 A), set 2 = one
    // 30 hp (40 A). Set 1: 42 + 25 % x 14 = 45.5 A; set 2: 40 + 25 % x 40 = 50 A. Hand calculation,
    // Table 430.250 460 V column.
    [Fact]
    public void TheLargerTotalNotTheLargerSumGoverns()
    {
        var (amps, steps) = RunningSets.MotorShare(0m, 0m,
            [new("F-1", "FANS", "1", 14m, 3), new("F-2", "FANS", "2", 40m, 1)]);
        Assert.Equal(50m, amps);
        Assert.Contains("runs: F-2", steps[0].Note);
    }

    // A free motor larger than any interlocked one takes the 25 %: free 65 A (50 hp), sets of 27 A
    // and 2 x 14 A: 65 + 28 + 25 % x 65 = 109.25 A (hand calculation).
    [Fact]
    public void AFreeMotorCanHoldTheLargestShare()
    {
        var (amps, _) = RunningSets.MotorShare(65m, 65m,
            [new("A", "I", "1", 27m, 1), new("B", "I", "2", 14m, 2)]);
        Assert.Equal(109.25m, amps);
    }

    // NFPA 70-2023 430.26: a demand factor of 80 % on the motors' 72.6 A gives 58.08 A; 10 A of
    // non-continuous other load is added at 100 % (430.24(3)): 68.08 A. The permission is shown.
    [Fact]
    public void DemandFactorOnTheMotorsShareOnly()
    {
        var required = Result<decimal>.Of(134.6m, new Step("Required feeder ampacity", "134.6 A", "NEC 430.24", "sum"));
        var adjusted = RunningSets.Adjusted(required, 124.6m, 72.6m, [], 80m, "Letter EL-1");
        Assert.Equal(68.08m, adjusted.Value);
        Assert.Contains(adjusted.Steps, s => s.Rule == "NEC 430.26" && s.Note.Contains("Letter EL-1"));
    }

    private static readonly Gen<List<InterlockedMotor>> Interlocked =
        Gen.Select(Gen.Int[0, 2], Gen.Int[1, 3], Gen.Int[1, 40], Gen.Int[1, 3])
            .Select((g, set, amps, count) => new InterlockedMotor($"M{g}{set}{amps}", $"I{g}", set.ToString(), amps, count))
            .List[1, 7];

    /// <summary>430.24 counted for one set of motors running: 125 % of the largest plus the rest.</summary>
    private static decimal Counted(IEnumerable<(decimal Amps, int Count)> running)
    {
        var list = running.ToList();
        return list.Count == 0 ? 0m : list.Sum(m => m.Amps * m.Count) + 0.25m * list.Max(m => m.Amps);
    }

    // Property (issue 15): an interlocked group never counts more than its larger running set, and
    // never less: the result equals the largest 430.24 total over every combination that can run
    // (one set of each interlock, all free motors), worked out by trying them all.
    [Fact]
    public void InterlockCountsExactlyTheLargestRunningCombination() =>
        Gen.Select(Interlocked, Gen.Int[0, 3], Gen.Int[1, 60]).Sample((locked, freeCount, freeAmps) =>
        {
            var free = Enumerable.Range(0, freeCount).Select(i => ((decimal)freeAmps - i, 1)).ToList();
            var (amps, _) = RunningSets.MotorShare(free.Sum(f => f.Item1), free.Count == 0 ? 0m : free.Max(f => f.Item1), locked);
            var groups = locked.GroupBy(m => m.Interlock).Select(g => g.GroupBy(m => m.Set).Select(s => s.ToList()).ToList()).ToList();
            var best = 0m;
            void Try(int i, List<(decimal, int)> running)
            {
                if (i == groups.Count)
                {
                    best = Math.Max(best, Counted(running));
                    return;
                }

                foreach (var set in groups[i]) Try(i + 1, [.. running, .. set.Select(m => (m.FullLoadAmps, m.Count))]);
            }

            Try(0, free);
            Assert.Equal(best, amps);
            var everything = Counted(free.Concat(locked.Select(m => (m.FullLoadAmps, m.Count))));
            Assert.True(amps <= everything);
        }, iter: 3000);
}

/// <summary>430.53 (A)-(D) and 430.110(C), against hand calculations (values of Tables 430.248, 430.250, 430.251(A)/(B) as in the shared reference).</summary>
public class GroupCircuitTests
{
    private static GroupMotor Motor(string tag, decimal hp, decimal flc, decimal? max, decimal? nameplate = null) => new(tag, hp, flc, nameplate, max);

    // NFPA 70-2023 430.53(A) (from memory): motors of 1 hp or less, each 6 A or less, on a 120 V
    // circuit protected at 20 A or less. Two 1/4 hp 115 V fans, 5.8 A each (Table 430.248).
    [Fact]
    public void SmallMotorsOn120VoltsAllow20Amps()
    {
        var r = GroupCircuits.MaximumProtection(BranchGroupKind.SmallMotors, [Motor("EF-1", 0.25m, 5.8m, 15m), Motor("EF-2", 0.25m, 5.8m, 15m)], [], 120m, null, fuse: false);
        Assert.Equal(20m, r.Value!.Value.Maximum);
        Assert.Null(r.Value.Value.Broken);
    }

    // 430.53(A): on a 208 V circuit the limit is 15 A; a 1/3 hp motor at 115 V draws 7.2 A (Table 430.248), over 6 A.
    [Fact]
    public void SmallMotorsLimits()
    {
        Assert.Equal(15m, GroupCircuits.MaximumProtection(BranchGroupKind.SmallMotors, [Motor("A", 0.25m, 3.2m, 10m)], [], 208m, null, false).Value!.Value.Maximum);
        var broken = GroupCircuits.MaximumProtection(BranchGroupKind.SmallMotors, [Motor("A", 1m / 3m, 7.2m, 20m)], [], 120m, null, false).Value!.Value.Broken;
        Assert.Contains("6 A", broken);
        // The nameplate counts when larger (the conservative reading of "full-load rating").
        Assert.NotNull(GroupCircuits.MaximumProtection(BranchGroupKind.SmallMotors, [Motor("A", 0.25m, 5.8m, 15m, nameplate: 6.2m)], [], 120m, null, false).Value!.Value.Broken);
        Assert.NotNull(GroupCircuits.MaximumProtection(BranchGroupKind.SmallMotors, [Motor("A", 1.5m, 3m, 15m)], [], 480m, null, false).Value!.Value.Broken);
    }

    // 430.53(B): 10 hp (14 A) and 5 hp (7.6 A) at 460 V on an inverse-time breaker: 430.52 gives
    // 250 % x 14 = 35 A and 250 % x 7.6 = 19 A -> 20 A (next standard size, 430.52(C)(1)(a)); the smallest governs: 20 A.
    [Fact]
    public void SmallestProtectedTakesTheSmallestMaximum()
    {
        var r = GroupCircuits.MaximumProtection(BranchGroupKind.SmallestProtected, [Motor("P-1", 10m, 14m, 35m), Motor("P-2", 5m, 7.6m, 20m)], [], 480m, null, false);
        Assert.Equal(20m, r.Value!.Value.Maximum);
        Assert.Contains(r.Steps, s => s.Rule.StartsWith("NEC 430.53(B)"));
    }

    // 430.53(C)(4): 35 A (the 10 hp motor's 430.52 maximum) + 7.6 + 7.6 = 50.2 A, not exceeded: 50 A
    // (Table 240.6(A)). With 8 AWG at 60 C (40 A) the sum is above the ampacity, so no 240.4(B) raise.
    // With 4 AWG (70 A at 60 C) the sum is below it: up to 70 A (240.4(B)).
    [Fact]
    public void ListedGroupAddsTheOthersAndMayRiseToTheConductors()
    {
        GroupMotor[] motors = [Motor("P-1", 10m, 14m, 35m), Motor("P-2", 5m, 7.6m, 20m), Motor("P-3", 5m, 7.6m, 20m)];
        Assert.Equal(50m, GroupCircuits.MaximumProtection(BranchGroupKind.ListedGroup, motors, [], 480m, 40m, false).Value!.Value.Maximum);
        var raised = GroupCircuits.MaximumProtection(BranchGroupKind.ListedGroup, motors, [], 480m, 70m, false);
        Assert.Equal(70m, raised.Value!.Value.Maximum);
        Assert.Contains(raised.Steps, s => s.Rule == "NEC 430.53(C)(4), 240.4(B)");
    }

    // 430.53(D)(1) and (D)(2): from 10 AWG (30 A), a tap over 25 ft carries 30 A; 25 ft or less, 10 A.
    [Fact]
    public void TapConductors()
    {
        Assert.Equal(30m, GroupCircuits.TapAmpacity(30m, 40m).Value);
        Assert.Equal(30m, GroupCircuits.TapAmpacity(30m, null).Value);
        Assert.Equal(10m, GroupCircuits.TapAmpacity(30m, 25m).Value);
    }

    // 430.110(C)(1) and (C)(2), hand calculation: two 20 hp 460 V motors, 27 A each (Table 430.250)
    // and 145 A locked-rotor each (Table 430.251(B)). Summed 54 A -> the 50 hp row (65 A; 40 hp is 52 A);
    // summed 290 A -> the 40 hp row (290 A). The larger: 50 hp, not the 40 hp the nameplates add up to.
    // Ampere rating 115 % x 54 = 62.1 A.
    [Fact]
    public void GroupDisconnectByEquivalentHorsepower()
    {
        var r = Disconnects.ForGroup(54m, 290m, 460m, Phases.Three);
        Assert.Equal(50m, r.Value!.Value.MinimumHorsepower);
        Assert.Equal(62.1m, r.Value.Value.MinimumAmps);
    }

    // Single-phase: two 1/4 hp 115 V fans, 5.8 A each (Table 430.248), each counted at the 1/2 hp row
    // of Table 430.251(A) (58.8 A; the table starts there). 11.6 A -> the 3/4 hp row (13.8 A);
    // 117.6 A -> the 1-1/2 hp row (120 A). Equivalent: 1-1/2 hp; amperes 13.34 A.
    [Fact]
    public void SinglePhaseGroupDisconnect()
    {
        var r = Disconnects.ForGroup(11.6m, 117.6m, 115m, Phases.Single);
        Assert.Equal(1.5m, r.Value!.Value.MinimumHorsepower);
        Assert.Equal(13.34m, r.Value.Value.MinimumAmps);
    }
}
