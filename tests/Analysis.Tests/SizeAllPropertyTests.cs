using CsCheck;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Analysis.Tests;

/// <summary>"Size everything" over generated motor lists: never adds an error, settles in one go, leaves only what it cannot fix.</summary>
public class SizeAllPropertyTests
{
    private static readonly Gen<string> MotorList =
        Gen.Select(
                Gen.OneOfConst("208V 3ph", "230V 3ph", "480V 3ph", "575V 3ph", "230V 1ph"),
                Gen.OneOfConst("", "  ambient 40C\n", "  ambient 50C\n  ccc 6\n", "  conductor al THHN 75C\n"),
                Gen.Select(Gen.OneOfConst("1/2hp", "2hp", "5hp", "10hp", "15hp", "40hp", "100hp"),
                        Gen.OneOfConst("", "    nameplate 11A\n", "    nameplate 11A\n    service-factor 1.15\n"),
                        Gen.OneOfConst("", "    wire 14 AWG\n", "    wire 6 AWG\n", "    wire 250 kcmil\n"),
                        Gen.OneOfConst("", "    protection dual-element-fuse\n", "    protection inverse-time-breaker 600A\n", "    protection instantaneous-trip-breaker 30A\n"),
                        Gen.OneOfConst("", "    ground 14 AWG\n", "    overload 2A\n", "    length 300ft\n", "    design B\n    efficiency premium\n"))
                    .Select((hp, np, wire, prot, extra) => $"{hp}\n{np}{wire}{prot}{extra}")
                    .Array[1, 5])
            .Select((supply, settings, motors) =>
                $"project \"Generated\"\n{settings}\nfeeder F-1 {supply}\n"
                + string.Concat(motors.Select((m, i) => $"  motor M-{i} {m}")));

    [Fact]
    public void SizingEverythingAddsNoErrorsAndIsIdempotent() =>
        MotorList.Sample(text =>
        {
            var once = SizeAll.Apply(text);
            var analysis = Analyzer.Analyze(once);
            Assert.Empty(analysis.Parse.Diagnostics);
            Assert.Equal(once, SizeAll.Apply(once));
            // What is left are findings no edit can settle: a motor its feeder cannot supply, or one with no table current.
            var leftover = analysis.Findings.Where(f => f.Severity == Severity.Error
                                                        && f.Code is not (FindingCodes.VoltageMismatch or FindingCodes.NeedsNameplate));
            Assert.Empty(leftover);
        }, iter: 200);
}
