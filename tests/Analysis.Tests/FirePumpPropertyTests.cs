using CsCheck;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Domain;

namespace MotorLang.Analysis.Tests;

/// <summary>"Size everything" over generated lists with fire pumps: never an overload on a fire pump, never a device below 695.4.</summary>
public class FirePumpPropertyTests
{
    private static readonly Gen<string> Pump =
        Gen.Select(
                Gen.OneOfConst("15hp", "50hp", "100hp", "150hp 460V", "7-1/2hp"),
                Gen.OneOfConst("", "    code-letter G\n", "    code-letter J\n    design B\n", "    locked-rotor 900A\n", "    code-letter V\n"),
                Gen.OneOfConst("", "    overload 40A\n", "    protection inverse-time-breaker 100A\n", "    protection dual-element-fuse\n",
                    "    protection instantaneous-trip-breaker 200A\n", "    protection non-time-delay-fuse 2000A\n"),
                Gen.OneOfConst("", "    length 200ft\n", "    wire 6 AWG\n", "    like K-9\n"))
            .Select((hp, lr, prot, extra) => $"  motor P-{{0}} {hp}\n    fire-service pump\n{lr}{prot}{extra}");

    private static readonly Gen<string> Other = Gen.OneOfConst(
        "  motor J-{0} 3hp\n    fire-service jockey\n    nameplate 4.5A\n",
        "  motor J-{0} 2hp\n    fire-service pressure-maintenance\n    overload 2A\n",
        "  load L-{0} 3A\n    fire-service accessory\n",
        "  load L-{0} 5kVA\n",
        "  motor J-{0} 10hp\n");

    private static readonly Gen<string> List =
        Gen.Select(
                Gen.OneOfConst("480V 3ph", "208V 3ph", "575V 3ph"),
                Gen.OneOfConst("", "  protection inverse-time-breaker 100A\n", "  wire 2 AWG\n  length 100ft\n"),
                Pump.Array[1, 2], Other.Array[0, 3])
            .Select((supply, feeder, pumps, others) =>
                $"feeder F-1 {supply}\n{feeder}  motor K-9 5hp\n    nameplate 7A\n    overload 8A\n"
                + string.Concat(others.Select((o, i) => string.Format(o, i)))
                + string.Concat(pumps.Select((p, i) => string.Format(p, i))));

    [Fact]
    public void AfterSizingEverythingNoFirePumpHasAnOverloadOrATooSmallDevice() =>
        List.Sample(text =>
        {
            var sized = SizeAll.Apply(text);
            var analysis = Analyzer.Analyze(sized);
            Assert.Empty(analysis.Parse.Diagnostics);
            foreach (var m in analysis.Motors.Values.Where(m => m.FireService == FireServiceRole.FirePump))
            {
                // An overload line written on the fire pump itself is commented out; an inherited one keeps its M113.
                if (m.Motor.Like is null) Assert.Null(m.Overload);
                Assert.DoesNotContain(analysis.Findings, f => f.Code == FindingCodes.OverloadMissing && f.Range.Start.Line == m.Motor.Header.Line.Index);
                if (m.FirePumpMinimumProtection?.Value is { } min && m.ProtectionRating is { } rating && !m.FirePumpListedDevice)
                    Assert.True(rating >= min, $"{m.Tag}: {rating} A < {min} A\n{sized}");
            }

            foreach (var f in analysis.Feeders.Values.Where(f => f.SuppliesFirePump))
            {
                if (f.FirePumpMinimumProtection?.Value is { } min && f.ProtectionRating is { } rating)
                    Assert.True(rating >= min, $"{f.Tag}: {rating} A < {min} A\n{sized}");
            }

            Assert.DoesNotContain(analysis.Findings, f => f.Code is FindingCodes.FirePumpProtectionTooSmall or FindingCodes.ProtectionTooLarge or FindingCodes.FeederProtectionTooLarge);
        }, iter: 150);
}
