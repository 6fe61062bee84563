using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Text;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Several motors on one branch circuit (430.53), 430.55, 430.110(C), 430.24 Exception No. 3 and 430.26 on a motor list.</summary>
public class GroupCircuitFindingTests
{
    // Two 1/4 hp 115 V fans (5.8 A each, NFPA 70-2023 Table 430.248) on one 120 V, 20 A circuit under 430.53(A).
    private static string Fans(string device = "20A", string disconnect = "30A 1-1/2hp", string tapWire = "14 AWG", string tapLength = "12ft", string volts = "120V") => Text(
        $"feeder BC-7 \"Bench fans\" {volts} 1ph",
        "  branch-group small-motors",
        "  wire 12 AWG",
        "  ground 12 AWG",
        $"  protection inverse-time-breaker {device}",
        $"  disconnect {disconnect}",
        "  motor EF-1 \"Bench fan\" 1/4hp",
        "    nameplate 5.2A",
        "    overload 5.9A",
        $"    wire {tapWire}",
        "    ground 14 AWG",
        $"    length {tapLength}",
        "  motor EF-2 \"Bench fan\" 1/4hp",
        "    like EF-1");

    // The trap: on its own branch circuit a 5.8 A motor may have at most 250 % -> 14.5 A -> 15 A
    // (430.52(C)(1)(a)), so 20 A would be M102. On a 430.53(A) circuit 20 A at 120 V is permitted.
    [Fact]
    public void TwentyAmpsOnASmallMotorCircuitIsLegal()
    {
        var analysis = Analyzer.Analyze(Fans());
        Assert.Empty(analysis.Parse.Diagnostics);
        Assert.DoesNotContain(analysis.Findings, f => f.Severity is Severity.Error or Severity.Warning);
        Assert.DoesNotContain(analysis.Findings, f => f.Code == FindingCodes.NotWritten); // no device asked for on the taps
    }

    // 430.53(A): 25 A is above the 20 A a 120 V circuit may have; the fix writes 20 A.
    [Fact]
    public void M160_AboveTheSmallMotorLimit()
    {
        var text = Fans(device: "25A");
        var f = Single(text, FindingCodes.GroupProtectionTooLarge);
        Assert.Contains("430.53(A)", f.Message);
        Assert.Contains("protection inverse-time-breaker 20A", ApplyFix(text, f));
    }

    // 430.53(A): on a 208 V circuit the limit is 15 A.
    [Fact]
    public void M160_FifteenAmpsAbove120Volts()
    {
        var f = Single(Fans(volts: "208V"), FindingCodes.GroupProtectionTooLarge);
        Assert.Contains("15 A", f.Message);
    }

    // 430.53(A)(1): a 1/2 hp 115 V motor draws 9.8 A (Table 430.248), over 6 A.
    [Fact]
    public void M161_MotorOverSixAmps()
    {
        var text = Fans().Replace("  motor EF-2 \"Bench fan\" 1/4hp", "  motor EF-2 \"Bench fan\" 1/2hp");
        var f = Single(text, FindingCodes.GroupNotPermitted);
        Assert.Contains("6 A", f.Message);
    }

    // 430.53(D)(1): a tap longer than 25 ft carries the circuit conductors' ampacity: 12 AWG at 60 C
    // is 20 A (Table 310.16), 14 AWG only 15 A; the fix writes 12 AWG.
    [Fact]
    public void M162_LongTapBelowTheCircuitConductors()
    {
        var text = Fans(tapLength: "40ft");
        var findings = Analyzer.Analyze(text).Findings.Where(f => f.Code == FindingCodes.GroupTapUndersized).ToList();
        Assert.Equal(2, findings.Count); // EF-1, and EF-2 through 'like' (fixed on EF-1)
        Assert.Contains("430.53(D)(1)", findings[0].Message);
        Assert.Contains("wire 12 AWG", ApplyFix(text, findings[0]));
    }

    // 430.110(C): two 1/4 hp fans: 11.6 A -> 3/4 hp (Table 430.248), locked-rotor 2 x 58.8 A -> 1-1/2 hp
    // (Table 430.251(A)): a 1 hp switch is too small, though each fan alone needs only 1/4 hp.
    [Fact]
    public void M163_GroupDisconnectBelowTheEquivalentHorsepower()
    {
        var text = Fans(disconnect: "30A 1hp");
        var f = Single(text, FindingCodes.GroupDisconnectTooSmall);
        Assert.Contains("1-1/2 hp", f.Message);
        Assert.Contains("disconnect 30A 1-1/2hp", ApplyFix(text, f));
    }

    // A kW rating: 0.75 kW / 0.746 = 1.005 hp, under the 1-1/2 hp equivalent (common practice, no source, for the conversion).
    [Fact]
    public void M163_GroupDisconnectInKilowatts()
    {
        var f = Single(Fans(disconnect: "30A 0.75kW"), FindingCodes.GroupDisconnectTooSmall);
        Assert.Contains("0.75 kW", f.Message);
        Assert.Empty(Analyzer.Analyze(Fans(disconnect: "30A 1.5kW")).Findings.Where(x => x.Code == FindingCodes.GroupDisconnectTooSmall));
    }

    // 430.110(C)(2): 115 % x 11.6 A = 13.34 A; a 10 A switch is too small, the fix writes 15 A.
    [Fact]
    public void M163_GroupDisconnectAmpereRating()
    {
        var text = Fans(disconnect: "10A 1-1/2hp");
        var f = Single(text, FindingCodes.GroupDisconnectTooSmall);
        Assert.Contains("13.34 A", f.Message);
        Assert.Contains("disconnect 15A 1-1/2hp", ApplyFix(text, f));
    }

    // The hover on the circuit shows the group rule and the disconnect with their references.
    [Fact]
    public void HoverShowsTheGroupRules()
    {
        var analysis = Analyzer.Analyze(Fans());
        var view = Breakdown.At(analysis, new TextPosition(0, 2))!;
        var protection = view.Sections.Single(s => s.Heading == "Branch circuit protection (several motors)");
        Assert.Contains(protection.Steps, s => s.Rule == "NEC 430.53(A)");
        var disconnect = view.Sections.Single(s => s.Heading == "Disconnecting means (several motors)");
        Assert.Contains(disconnect.Steps, s => s.Rule.StartsWith("NEC 430.110(C)(1)"));
        var tap = Breakdown.At(analysis, new TextPosition(6, 4))!;
        Assert.Contains(tap.Sections, s => s.Heading == "Tap conductors");
    }

    // 430.53(C)(4): 10 hp (14 A, 35 A inverse-time maximum) + two 5 hp (7.6 A) at 460 V:
    // 35 + 15.2 = 50.2 -> 50 A. 430.24: 125 % x 14 + 15.2 = 32.7 A -> 8 AWG (40 A at 60 C).
    private static string Listed(string device) => Text(
        "feeder G-1 \"Conveyor group\" 480V 3ph",
        "  branch-group listed-group",
        "  wire 8 AWG",
        "  ground 10 AWG",
        $"  protection inverse-time-breaker {device}",
        "  motor C-1 10hp",
        "    nameplate 13A",
        "    overload 14.9A",
        "    wire 8 AWG",
        "    ground 10 AWG",
        "  motor C-2 5hp",
        "    nameplate 7A",
        "    overload 8A",
        "    wire 8 AWG",
        "    ground 10 AWG",
        "  motor C-3 5hp",
        "    like C-2");

    // The trap: the largest motor's own 430.52 maximum is 35 A, so 50 A would be M102 on its own
    // circuit; on a listed group circuit 50 A is the limit, and 60 A is above it.
    [Fact]
    public void ListedGroupLimit()
    {
        Assert.DoesNotContain(Analyzer.Analyze(Listed("50A")).Findings, f => f.Severity == Severity.Error);
        var text = Listed("60A");
        var f = Single(text, FindingCodes.GroupProtectionTooLarge);
        Assert.Contains("50 A", f.Message);
        Assert.Contains("protection inverse-time-breaker 50A", ApplyFix(text, f));
    }

    // 430.53: an instantaneous-trip breaker may not protect a circuit of several motors.
    [Fact]
    public void M161_OnlyFusesOrInverseTimeBreakers()
    {
        var f = Single(Listed("50A").Replace("protection inverse-time-breaker 50A", "protection instantaneous-trip-breaker 50A listed-combination"), FindingCodes.GroupNotPermitted);
        Assert.Contains("inverse-time", f.Message);
    }

    // 430.24 Exception No. 3 and 430.26: two 40 hp pumps (52 A, Table 430.250) never run together,
    // a 5 hp (7.6 A) runs with either: 125 % x 52 + 7.6 = 72.6 A (not the 124.6 A of all three);
    // with a 90 % demand factor granted: 65.34 A.
    private static string Pumps(params string[] feederLines) => Text([
        "feeder MCC-H 480V 3ph",
        .. feederLines,
        "  motor HP-1A 40hp",
        "    interlock HPU 1",
        "  motor HP-1B 40hp",
        "    interlock HPU 2",
        "  motor CP-1 5hp"]);

    [Fact]
    public void InterlockedPumpsCountTheLargerSet()
    {
        var analysis = Analyzer.Analyze(Pumps());
        var feeder = analysis.Feeders.Values.Single();
        Assert.Equal(72.6m, feeder.RequiredAmpacity!.Value);
        Assert.Equal(111.6m, feeder.CalculatedLoad); // the running load still counts every motor
        Assert.Contains(feeder.RequiredAmpacity.Steps, s => s.Rule == "NEC 430.24 Exception No. 3" && s.Note.Contains("runs: HP-1A"));
        Assert.DoesNotContain(analysis.Findings, f => f.Code == FindingCodes.InterlockAlone);
    }

    [Fact]
    public void DemandFactorOnlyWithItsPermission()
    {
        var analysis = Analyzer.Analyze(Pumps("  demand-factor 90% \"Authority letter EL-0417\""));
        Assert.Equal(65.34m, analysis.Feeders.Values.Single().RequiredAmpacity!.Value);
        var f = analysis.Findings.Single(x => x.Code == FindingCodes.DemandFactorApplied);
        Assert.Contains("EL-0417", f.Message);
        var hover = Breakdown.At(analysis, new TextPosition(0, 2))!;
        Assert.Contains(hover.Sections.SelectMany(s => s.Steps), s => s.Rule == "NEC 430.26" && s.Note.Contains("EL-0417"));
        // Without the permission written the line is not read, and nothing is reduced by it.
        var bare = Analyzer.Analyze(Pumps("  demand-factor 90%"));
        Assert.Contains(bare.Parse.Diagnostics, d => d.Code == "P002");
        Assert.Equal(72.6m, bare.Feeders.Values.Single().RequiredAmpacity!.Value);
    }

    // An interlock with one member interlocks nothing: said, and every motor counts (124.6 A).
    [Fact]
    public void M167_InterlockAlone()
    {
        var text = Pumps().Replace("    interlock HPU 2\n", "    interlock HUP 2\n");
        Assert.Equal(2, Analyzer.Analyze(text).Findings.Count(f => f.Code == FindingCodes.InterlockAlone));
        Assert.Equal(124.6m, Analyzer.Analyze(text).Feeders.Values.Single().RequiredAmpacity!.Value);
    }

    // A feeder above the pumps' feeder applies the exception too.
    [Fact]
    public void InterlockCountsOnTheFeedersAbove()
    {
        var text = Text("feeder SWBD 480V 3ph") + Pumps().Replace("feeder MCC-H 480V 3ph\n", "feeder MCC-H 480V 3ph\n  from SWBD\n");
        var analysis = Analyzer.Analyze(text);
        Assert.All(analysis.Feeders.Values, f => Assert.Equal(72.6m, f.RequiredAmpacity!.Value));
    }

    // 430.55 with 430.32(A)(1)/(C): nameplate 7 A, SF 1.15: 125 % = 8.75 A, 140 % = 9.8 A.
    private static string Combined(string rating) => Text(
        "feeder F 480V 3ph",
        "  motor P 5hp",
        "    nameplate 7A",
        "    service-factor 1.15",
        $"    protection dual-element-fuse {rating} combined-overload");

    [Fact]
    public void CombinedDeviceIsHeldToTheOverloadLimits()
    {
        var ok = Analyzer.Analyze(Combined("8A")).Findings;
        Assert.DoesNotContain(ok, f => f.Code is FindingCodes.OverloadMissing or FindingCodes.ProtectionMayTrip
            or FindingCodes.CombinedDeviceTooLarge or FindingCodes.CombinedDeviceAboveRunningLimit);
        Assert.Single(Analyzer.Analyze(Combined("9A")).Findings, f => f.Code == FindingCodes.CombinedDeviceAboveRunningLimit);
        // The trap: 10 A is far inside the 430.52 maximum (175 % x 7.6 = 13.3 -> 15 A) but above the 9.8 A an overload may be.
        var large = Analyzer.Analyze(Combined("10A")).Findings;
        Assert.Single(large, f => f.Code == FindingCodes.CombinedDeviceTooLarge);
        Assert.DoesNotContain(large, f => f.Code == FindingCodes.ProtectionTooLarge);
    }

    // 430.53(B): the 5 hp motor's 430.52 maximum is 250 % x 7.6 = 19 -> 20 A (430.52(C)(1)(a)); the
    // circuit may have no more, although the 10 hp motor alone would allow 35 A.
    [Fact]
    public void M160_SmallestProtected()
    {
        var text = Listed("25A").Replace("branch-group listed-group", "branch-group smallest-protected");
        var f = Single(text, FindingCodes.GroupProtectionTooLarge);
        Assert.Contains("430.53(B)", f.Message);
        Assert.Contains("protection inverse-time-breaker 20A", ApplyFix(text, f));
    }

    // A motor-compressor on a group circuit: Article 440 governs (440.22(B)), so the device is not checked (M210), never passed.
    [Fact]
    public void CompressorOnAGroupIsNotChecked()
    {
        var text = Listed("50A") + "  compressor RTU-1 460V\n    rated-load 10A\n";
        var findings = Analyzer.Analyze(text).Findings;
        Assert.Contains(findings, f => f.Code == FindingCodes.OutsideScope && f.Message.Contains("440.22(B)"));
        Assert.DoesNotContain(findings, f => f.Code == FindingCodes.GroupProtectionTooLarge);
    }

    // A fire pump supply counts every motor: no interlock reduction (695.6(C) sizes it for all it carries).
    [Fact]
    public void NoInterlockOnAFirePumpSupply()
    {
        var text = Pumps() + "  motor FP-1 50hp\n    fire-service pump\n";
        var analysis = Analyzer.Analyze(text);
        Assert.Contains(analysis.Findings, f => f.Code == FindingCodes.CannotCheck && f.Message.Contains("fire pump"));
        Assert.DoesNotContain(analysis.Feeders.Values.Single().RequiredAmpacity!.Steps, s => s.Rule == "NEC 430.24 Exception No. 3");
    }
}
