using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Parser.Diagnostics;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Article 695 fire pumps. The motor throughout: 100 hp, 460 V rated, on a 480 V system.
/// Full-load current 124 A (NFPA 70-2023 Table 430.250, 460 V column). Code letter G: 5.6–6.29
/// kVA/hp (Table 430.7(B)), so locked-rotor current at the rated voltage is at most
/// 6.29 × 1000 × 100 / (460 × √3) = 629 000 / 796.74 = 789.46 A; Table 430.251(B) gives 725 A
/// for 100 hp at 460 V; the larger, 789.46 A, is used.
/// </summary>
public class FirePumpTests
{
    private static string Pump(string protection = "    protection inverse-time-breaker 800A", string extra = "", string feederLength = "  length 0ft") => Text(
        "feeder FP-1 480V 3ph",
        feederLength,
        "  wire 4/0 AWG",
        "  ground 2/0 AWG",
        "  protection inverse-time-breaker 800A",
        "  motor FP-101 \"Fire pump\" 100hp 460V",
        "    fire-service pump",
        "    code-letter G",
        "    wire 2/0 AWG",
        "    ground 1/0 AWG",
        protection + extra);

    // NEC 695.4(B)(2)(a)(1): carry 789.46 A indefinitely → next standard rating, 800 A (Table 240.6(A)).
    [Fact]
    public void M112_FirePumpDeviceBelowLockedRotorMinimum()
    {
        var text = Pump("    protection inverse-time-breaker 150A");
        var f = Single(text, FindingCodes.FirePumpProtectionTooSmall);
        Assert.Equal("11:37-11:41 M112", Describe(f));
        Assert.Contains("800 A", f.Message);
        Assert.Contains("789.46 A", f.Message);
        Assert.Contains("695.4(B)(2)(a)(1)", f.Message);
        Assert.Contains("protection inverse-time-breaker 800A", ApplyFix(text, f));
    }

    // The 430.52 maximum (250 % × 124 A = 310 A → 350 A) must never flag a fire pump's device, however large.
    [Fact]
    public void NoArticle430MaximumOnAFirePump()
    {
        var findings = Analyzer.Analyze(Pump("    protection inverse-time-breaker 1200A")).Findings;
        Assert.DoesNotContain(findings, f => f.Code is FindingCodes.ProtectionTooLarge or FindingCodes.FeederProtectionTooLarge or FindingCodes.FirePumpProtectionTooSmall);
        Assert.Empty(Analyzer.Analyze(Pump()).Findings.Where(f => f.Severity == Severity.Error));
    }

    // NEC 695.6(D): no automatic overload protection; the fix comments the line out and loses nothing.
    [Fact]
    public void M113_OverloadOnAFirePump_And_NeverM203()
    {
        var text = Pump(extra: "\n    overload 150A");
        var f = Single(text, FindingCodes.FirePumpOverload);
        Assert.Equal("12:14-12:18 M113", Describe(f));
        var fixedText = ApplyFix(text, f);
        Assert.Contains("    # overload 150A\n", fixedText);
        Assert.DoesNotContain(Analyzer.Analyze(Pump()).Findings, x => x.Code == FindingCodes.OverloadMissing);
    }

    // size never adds an overload or a smaller device to a fire pump; it adds the 695.4 minimum (800 A).
    [Fact]
    public void SizeAllOnABareFirePumpWritesTheMinimumAndNoOverload()
    {
        var text = Text("feeder FP-1 480V 3ph", "  motor FP-101 100hp 460V", "    fire-service pump", "    code-letter G");
        var sized = SizeAll.Apply(text);
        Assert.Contains("    protection inverse-time-breaker 800A", sized);
        Assert.DoesNotContain("overload", sized);
        // Feeder: 789.46 A is all it supplies → 800 A (695.4(B)(2)(a)(1), Table 240.6(A)).
        Assert.Contains("  protection inverse-time-breaker 800A", sized);
    }

    // Feeder: fire pump 789.46 A LRC + jockey 3 hp 460 V LRC 32 A (Table 430.251(B)) + accessory 2 A
    // = 823.46 A → next standard rating 1000 A (Table 240.6(A)). No 430.62 maximum applies (M108 never).
    [Fact]
    public void M112_FeederSupplyingFirePumpCarriesTheSumOfLockedRotorCurrents()
    {
        var text = Text(
            "feeder FP-1 480V 3ph",
            "  length 0ft",
            "  wire 4/0 AWG",
            "  protection inverse-time-breaker 200A",
            "  motor FP-101 100hp 460V",
            "    fire-service pump",
            "    code-letter G",
            "  motor JP-1 3hp 460V",
            "    fire-service jockey",
            "  load L-1 2A",
            "    fire-service accessory");
        var f = Single(text, FindingCodes.FirePumpProtectionTooSmall);
        Assert.Equal("4:35-4:39 M112", Describe(f));
        Assert.Contains("1000 A", f.Message);
        Assert.DoesNotContain(Analyzer.Analyze(text).Findings, x => x.Code == FindingCodes.FeederProtectionTooLarge);
        Assert.Contains("protection inverse-time-breaker 1000A", ApplyFix(text, f));
    }

    // NEC 695.6(C): 125 % × (124 A + 4.8 A, Table 430.250) + 100 % × 2 A = 163 A, more than
    // 430.24's 125 % × 124 + 4.8 + 2 = 161.8 A. 1/0 AWG Cu at 75 °C carries 150 A (Table 310.16).
    [Fact]
    public void M114_FirePumpFeederConductors()
    {
        var text = Text(
            "feeder FP-1 480V 3ph",
            "  wire 1/0 AWG",
            "  protection inverse-time-breaker 1000A",
            "  motor FP-101 100hp 460V",
            "    fire-service pump",
            "    code-letter G",
            "  motor JP-1 3hp 460V",
            "    fire-service pressure-maintenance",
            "  load L-1 2A",
            "    fire-service accessory");
        var f = Single(text, FindingCodes.FirePumpConductorsUndersized);
        Assert.Equal("2:8-2:15 M114", Describe(f));
        Assert.Contains("NEC 695.6(C) requires 163 A", f.Message);
        Assert.Contains("wire 2/0 AWG", ApplyFix(text, f));
    }

    // NEC 695.7. 2/0 Cu in steel (Chapter 9 Table 9): R 0.10, XL 0.054 Ω/1000 ft.
    // Starting at PF 0.35: Ze = 0.10 × 0.35 + 0.054 × 0.93675 = 0.085584; √3 × 789.46 A × 0.085584 = 117.03 V per 1000 ft.
    //   700 ft: 81.92 V = 17.07 % of 480 V > 15 % (695.7(A)).   500 ft: 58.51 V = 12.19 %.
    // Running at 115 % × 124 = 142.6 A, PF 0.85: Ze = 0.085 + 0.054 × 0.52678 = 0.113446; √3 × 142.6 × Ze = 28.02 V per 1000 ft.
    //   700 ft: 19.61 V = 4.09 %; 850 ft: 23.82 V = 4.96 %; the limit is 5 % of 460 V = 23 V = 4.79 % of 480 V (695.7(B)).
    [Theory]
    [InlineData("500ft", false, false)]
    [InlineData("700ft", true, false)]
    [InlineData("850ft", true, true)]
    public void M115_M116_FirePumpVoltage(string length, bool starting, bool running)
    {
        var findings = Analyzer.Analyze(Pump(extra: $"\n    length {length}")).Findings;
        Assert.Equal(starting, findings.Any(f => f.Code == FindingCodes.FirePumpStartingDrop && f.Severity == Severity.Error));
        Assert.Equal(running, findings.Any(f => f.Code == FindingCodes.FirePumpRunningDrop && f.Severity == Severity.Error));
        Assert.DoesNotContain(findings, f => f.Code == FindingCodes.FirePumpDropPartlyChecked);
    }

    [Fact]
    public void FirePumpVoltageFigures()
    {
        var analysis = Analyzer.Analyze(Pump(extra: "\n    length 700ft"));
        var v = analysis.Motors.Values.Single().FirePumpVoltage!.Value!.Value;
        Assert.Equal(17.07m, Math.Round(v.StartingPercent, 2));
        Assert.Equal(4.09m, Math.Round(v.RunningPercent, 2));
        Assert.Equal(4.79m, Math.Round(v.RunningLimitPercent, 2));
    }

    // A check that cannot be made is said: no branch length, or a feeder with no length.
    [Fact]
    public void M206_FirePumpVoltageNotFullyChecked()
    {
        Assert.Equal("6:3-6:8 M206", Describe(Single(Pump(), FindingCodes.FirePumpDropPartlyChecked)));
        var f = Single(Pump(extra: "\n    length 100ft", feederLength: "  # no length"), FindingCodes.FirePumpDropPartlyChecked);
        Assert.Contains("FP-1", f.Message);
    }

    // A device stated as listed for fire pump service is accepted, with a note that its curve was not checked.
    [Fact]
    public void M302_ListedDeviceAccepted()
    {
        var text = Pump("    protection inverse-time-breaker 400A fire-pump-listed");
        var findings = Analyzer.Analyze(text).Findings;
        Assert.DoesNotContain(findings, f => f.Code == FindingCodes.FirePumpProtectionTooSmall);
        var f = Single(text, FindingCodes.FirePumpListedDevice);
        Assert.Equal(Severity.Information, f.Severity);
        Assert.Contains("curve was not checked", f.Message);
    }

    // What is not checked is said on the circuit: a fire pump lists the Article 695 rules MotorLang leaves out, an ordinary motor does not.
    [Fact]
    public void FirePumpCircuitsSayWhatIsNotChecked()
    {
        var analysis = Analyzer.Analyze(Pump());
        var motor = Coverage.CircuitCoverage.For(analysis.Motors.Values.Single());
        Assert.Contains(motor.NotChecked, n => n.Rule == "695.3");
        Assert.Contains(motor.Applied, a => a.Rule == "695.4(B)(2)(a)(1)");
        Assert.Contains(Coverage.CircuitCoverage.For(analysis.Feeders.Values.Single()).NotChecked, n => n.Rule == "695.6(A), 695.6(B)");
        var plain = Analyzer.Analyze(Text(Base));
        Assert.DoesNotContain(Coverage.CircuitCoverage.For(plain.Motors.Values.Single()).NotChecked, n => n.Rule.StartsWith("695", StringComparison.Ordinal));
    }
}
