using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Wye-delta and part-winding leads, drive output conductors, bypasses and marked maximum devices through the analyzer.</summary>
public class StartingLeadFindingTests
{
    private static string Motor(params string[] lines) => Text(["feeder F 480V 3ph", .. lines]);

    // NFPA 70-2023 430.22(C). 100 hp 460 V design B (75 °C terminations, 110.14(C)(1)(a)(4)): Table 430.250 124 A.
    // Line side 125 % = 155 A: 2/0 AWG (175 A). Leads 72 % = 89.28 A: 4 AWG carries 85 A, too small; 3 AWG 100 A.
    // Trap: 4 AWG is far above the 58 % the leads carry (71.9 A); the code's 72 % (with the 125 %) is what counts.
    [Fact]
    public void WyeDeltaLeadsAt72Percent()
    {
        string Text(string leads) => Motor("  motor M 100hp 460V", "    design B", "    starting wye-delta", "    wire 2/0 AWG", leads);
        var text = Text("    motor-leads 4 AWG");
        var f = Single(text, FindingCodes.MotorLeadsUndersized);
        Assert.Contains("430.22(C) requires 89.28 A", f.Message);
        Assert.Contains("motor-leads 3 AWG", ApplyFix(text, f));
        Assert.DoesNotContain(Analyzer.Analyze(Text("    motor-leads 3 AWG")).Findings, x => x.Code == FindingCodes.MotorLeadsUndersized);
        var result = Analyzer.Analyze(text).Motors.Values.Single();
        Assert.Equal(89.28m, result.LeadAmpacity!.Value);
        Assert.Equal("3 AWG", result.MinimumLeads!.Value.ToString());
    }

    // NFPA 70-2023 430.22(D): 62.5 % × 124 A = 77.5 A for each winding set; 6 AWG at 75 °C carries 65 A, 4 AWG 85 A.
    [Fact]
    public void PartWindingSetsAt62Point5Percent()
    {
        var text = Motor("  motor M 100hp 460V", "    design B", "    starting part-winding", "    wire 2/0 AWG", "    motor-leads 6 AWG");
        var f = Single(text, FindingCodes.MotorLeadsUndersized);
        Assert.Contains("430.22(D) requires 77.5 A", f.Message);
        Assert.Contains("motor-leads 4 AWG", ApplyFix(text, f));
    }

    // NFPA 70-2023 430.122(B): output conductors at 125 % of the motor's FLC. 50 hp 460 V (65 A) on a drive rated 55 A
    // input: the branch needs 125 % × 55 = 68.75 A (4 AWG at 60 °C, 70 A, passes 430.122(A)), but the output conductors
    // need 125 % × 65 = 81.25 A. With no 'motor-leads' the leads are the branch wire, and 4 AWG is too small: 3 AWG (85 A).
    [Fact]
    public void DriveOutputConductorsTakenToBeTheBranchWire()
    {
        var text = Motor("  motor M 50hp 460V", "    starting drive 55A", "    wire 4 AWG");
        Assert.DoesNotContain(Analyzer.Analyze(text).Findings, x => x.Code == FindingCodes.WireUndersized);
        var f = Single(text, FindingCodes.MotorLeadsUndersized);
        Assert.Contains("taken to be the branch wire 4 AWG", f.Message);
        Assert.Contains("430.122(B) requires 81.25 A", f.Message);
        Assert.Contains("    motor-leads 3 AWG\n", ApplyFix(text, f));
    }

    // NFPA 70-2023 430.122(C), the published worked example above: 30 hp 480 V (40 A), drive input 36 A, with a bypass:
    // 50 A. Design B: 10 AWG at 75 °C carries 35 A (too small), 8 AWG 50 A. The message names 430.122(C).
    [Fact]
    public void BypassRaisesTheBranchConductors()
    {
        string Text(string wire) => Motor("  motor M 30hp 460V", "    design B", "    starting drive 36A", "    drive-bypass", wire);
        var f = Single(Text("    wire 10 AWG"), FindingCodes.WireUndersized);
        Assert.Contains("NEC 430.122(C) requires 50 A", f.Message);
        Assert.Contains("wire 8 AWG", ApplyFix(Text("    wire 10 AWG"), f));
        Assert.DoesNotContain(Analyzer.Analyze(Text("    wire 8 AWG")).Findings, x => x.Code is FindingCodes.WireUndersized or FindingCodes.MotorLeadsUndersized);
    }

    // NFPA 70-2023 430.130(A)(2): 40 A motor, inverse-time breaker 250 % = 100 A, but the drive's marking says 60 A.
    // Trap: 70 A is well within 430.52 and must still be reported; size writes 60 A.
    [Fact]
    public void DriveMarkedMaximumIsNeverExceeded()
    {
        string Text(string protection) => Motor("  motor M 30hp 460V", "    starting drive 36A", "    drive-max-protection 60A", protection);
        var text = Text("    protection inverse-time-breaker 70A");
        var f = Single(text, FindingCodes.AboveDriveMaximum);
        Assert.Contains("430.130(A)(2)", f.Message);
        Assert.Contains("protection inverse-time-breaker 60A", ApplyFix(text, f));
        Assert.DoesNotContain(FindingCodes.ProtectionTooLarge, Analyzer.Analyze(text).Findings.Select(x => x.Code));
        Assert.Contains("    protection inverse-time-breaker 60A\n", SizeAll.Apply(Text("")));
    }

    [Fact]
    public void DriveAndLeadStatementsOnAFullVoltageMotorAreUnused()
    {
        var findings = Analyzer.Analyze(With(11, "    overload 16A\n    motor-leads 12 AWG\n    drive-bypass\n    drive-max-protection 30A")).Findings;
        Assert.Equal(3, findings.Count(f => f.Code == FindingCodes.NotUsedHere));
        Assert.DoesNotContain(findings, f => f.Code == FindingCodes.MotorLeadsUndersized);
    }

    // A motor on its own circuit lists no 430.53 conditions as not checked (they are checked on 'branch-group'
    // circuits, whose motors list the listing conditions); the 430.122(B) exception is named in the output
    // conductors' step, since it is never applied.
    [Fact]
    public void SharedCircuitsAreNotCheckedAndTheOutputExceptionIsNamed()
    {
        var plain = CircuitCoverage.For(Analyzer.Analyze(Text(Base)).Motors.Values.Single()).NotChecked.Select(n => n.Rule).ToList();
        Assert.DoesNotContain(plain, r => r.StartsWith("430.53", StringComparison.Ordinal));
        var grouped = Analyzer.Analyze(Text([Base[0], "  branch-group listed-group", .. Base[1..]])).Motors.Values.Single();
        Assert.Contains("430.53(A)(2), 430.53(B), 430.53(C)(1)–(3)", CircuitCoverage.For(grouped).NotChecked.Select(n => n.Rule));
        var drive = Analyzer.Analyze(Motor("  motor M 30hp 460V", "    starting drive 36A")).Motors.Values.Single();
        Assert.Contains("exception", drive.LeadAmpacity!.Steps.Single().Note);
    }
}
