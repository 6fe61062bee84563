using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>Capacitors on motor circuits (460.8(A), 460.9) and wye-delta overloads, through the analyzer.</summary>
public class CapacitorFindingTests
{
    // 25 hp 460 V on 480 V: Table 430.250 34 A. Branch: 125 % × 34 = 42.5 A → 6 AWG at 60 °C (55 A). Nameplate 30 A, SF 1.15.
    private static string Motor(params string[] lines) => Text([
        "feeder F 480V 3ph",
        "  motor M 25hp 460V",
        "    nameplate 30A",
        "    service-factor 1.15",
        "    wire 6 AWG",
        .. lines]);

    // NFPA 70-2023 460.8(A). 16.6 kvar at 480 V: 16600 / (√3 × 480) = 19.97 A; 135 % = 26.96 A. Motor conductors
    // 6 AWG copper THWN at its 75 °C insulation rating: 65 A / 3 = 21.67 A (Table 310.16). 26.96 A governs: 12 AWG at
    // 60 °C terminations carries 20 A (too small), 10 AWG 30 A.
    [Fact]
    public void CapacitorWireUndersized()
    {
        var text = Motor("    capacitor 16.6kvar 480V line-side", "    capacitor-wire 12 AWG", "    overload 37A");
        var f = Single(text, FindingCodes.CapacitorWireUndersized);
        Assert.Contains("26.96 A", f.Message);
        Assert.Contains("capacitor-wire 10 AWG", ApplyFix(text, f));
        Assert.Empty(Analyzer.Analyze(Motor("    capacitor 16.6kvar 480V line-side", "    capacitor-wire 10 AWG", "    overload 37A")).Findings
            .Where(x => x.Code is FindingCodes.CapacitorWireUndersized or FindingCodes.CannotCheck));
    }

    // No capacitor-wire written: size adds the minimum, 10 AWG as above.
    [Fact]
    public void SizeAddsTheCapacitorWire()
    {
        var sized = SizeAll.Apply(Motor("    capacitor 16.6kvar 480V line-side", "    overload 37A"));
        Assert.Contains("    capacitor-wire 10 AWG\n", sized);
    }

    // NFPA 70-2023 460.9 trap: the general rule (125 % × 30 A nameplate = 37.5 A) would pass a 37 A overload; with the
    // capacitor on the load side and its improved current 26 A, the limit is 125 % × 26 = 32.5 A (430.32(C): 140 % × 26
    // = 36.4 A), so 37 A is above even the 430.32(C) maximum.
    [Fact]
    public void LoadSideCapacitorSetsTheOverloadFromTheImprovedCurrent()
    {
        var text = Motor("    capacitor 16.6kvar 480V load-side", "    capacitor-wire 10 AWG", "    improved-current 26A", "    overload 37A");
        var f = Single(text, FindingCodes.OverloadTooLarge);
        Assert.Contains("460.9", f.Message);
        Assert.Contains("overload 32.5A", ApplyFix(text, f));
        // The same motor with the capacitor on the line side: 37 A is within 37.5 A.
        Assert.DoesNotContain(Analyzer.Analyze(Motor("    capacitor 16.6kvar 480V line-side", "    capacitor-wire 10 AWG", "    overload 37A")).Findings,
            x => x.Code is FindingCodes.OverloadTooLarge or FindingCodes.OverloadAboveRunningLimit);
    }

    // Without the improved current MotorLang cannot check or propose the overload, says so in words, and size writes none.
    [Fact]
    public void WithoutTheImprovedCurrentTheOverloadIsNotCheckedNorWritten()
    {
        var written = Single(Motor("    capacitor 16.6kvar 480V", "    capacitor-wire 10 AWG", "    overload 37A"), FindingCodes.CapacitorOverloadBasis);
        Assert.Contains("improved power factor", written.Message);
        Assert.Contains("cannot compute", written.Message);
        var missing = Motor("    capacitor 16.6kvar 480V", "    capacitor-wire 10 AWG");
        Assert.Null(Single(missing, FindingCodes.CapacitorOverloadBasis).Fix);
        Assert.DoesNotContain("overload", SizeAll.Apply(missing).Split('\n').Where(l => l.TrimStart().StartsWith("overload", StringComparison.Ordinal)));
        // The hover's overload section says why, in the 460.9 words.
        var result = Analyzer.Analyze(missing).Motors.Values.Single();
        Assert.Contains("improved power factor", result.OverloadLimit!.Unavailable);
    }

    // A capacitor brings 460.8(B), 460.8(C) and 460.7 into the motor's not-checked list; a motor without one does not.
    [Fact]
    public void CapacitorRowsAreNotChecked()
    {
        var with = CircuitCoverage.For(Analyzer.Analyze(Motor("    capacitor 20A line-side")).Motors.Values.Single()).NotChecked.Select(n => n.Rule).ToList();
        var without = CircuitCoverage.For(Analyzer.Analyze(Motor()).Motors.Values.Single()).NotChecked.Select(n => n.Rule).ToList();
        foreach (var rule in new[] { "460.8(B)", "460.8(C)", "460.7" })
        {
            Assert.Contains(rule, with);
            Assert.DoesNotContain(rule, without);
        }
    }

    [Fact]
    public void CapacitorStatementsWithoutACapacitorAreUnused()
    {
        var findings = Analyzer.Analyze(Motor("    improved-current 26A", "    capacitor-wire 10 AWG", "    overload 37A")).Findings;
        Assert.Equal(2, findings.Count(f => f.Code == FindingCodes.NotUsedHere));
    }

    // 50 hp 460 V wye-delta: Table 430.250 65 A; nameplate 60 A, SF 1.15 → 430.32(A)(1) 75 A on the line, and in the
    // delta leads 75 / √3 = 43.30 A (430.22(C) Informational Note: the leads carry 58 %, 1/√3 exactly).
    private static string WyeDeltaMotor(string overload) => Text(
        "feeder F 480V 3ph",
        "  motor M 50hp 460V",
        "    nameplate 60A",
        "    service-factor 1.15",
        "    starting wye-delta",
        overload);

    [Fact]
    public void WyeDeltaOverloadInTheDeltaLeadsIsHeldTo1OverRoot3()
    {
        // 70 A is within 75 A on the line side but above 430.32(C) in the leads (140 % × 60 / √3 = 48.50 A).
        var text = WyeDeltaMotor("    overload 70A delta-leads");
        var f = Single(text, FindingCodes.OverloadTooLarge);
        Assert.Contains("delta leads", f.Message);
        Assert.Contains("overload 43.3A delta-leads", ApplyFix(text, f));
        Assert.DoesNotContain(Analyzer.Analyze(WyeDeltaMotor("    overload 70A line-leads")).Findings,
            x => x.Code is FindingCodes.OverloadTooLarge or FindingCodes.OverloadAboveRunningLimit);
        // No location written: the leads are assumed, the stricter case.
        Single(WyeDeltaMotor("    overload 70A"), FindingCodes.OverloadTooLarge);
        // A missing overload is proposed at the delta-leads value, with its location written.
        Assert.Contains("    overload 43.3A delta-leads\n", SizeAll.Apply(WyeDeltaMotor("")));
    }

    [Fact]
    public void OverloadLocationOnAMotorThatIsNotWyeDeltaIsUnused()
    {
        var f = Single(With(11, "    overload 16A line-leads"), FindingCodes.NotUsedHere);
        Assert.Contains("wye-delta", f.Message);
    }
}
