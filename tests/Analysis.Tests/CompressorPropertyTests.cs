using CsCheck;
using MotorLang.Analysis.Fixes;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Analysis.Tests;

/// <summary>"Size everything" on generated compressors: the protection it writes is never above a marked maximum.</summary>
public class CompressorPropertyTests
{
    private static readonly Gen<(string Text, decimal Mop)> Compressor =
        Gen.Select(
                Gen.OneOfConst("    rated-load 18.6A\n", "    rated-load 52A\n    selection-current 55A\n", "    rated-load 7A\n", ""),
                Gen.OneOfConst("", "    min-ampacity 28A\n", "    min-ampacity 70A\n"),
                Gen.Int[10, 120],
                Gen.OneOfConst("", "    protection inverse-time-breaker 200A\n", "    protection dual-element-fuse\n", "    protection non-time-delay-fuse 15A\n"),
                Gen.OneOfConst("", "    hard-start\n", "    wire 14 AWG\n", "    locked-rotor 300A\n    disconnect 30A\n"))
            .Select((rla, mca, mop, prot, extra) => (Text: $"  compressor C-{{0}}\n{rla}{mca}    max-protection {mop}A\n{prot}{extra}", Mop: (decimal)mop));

    [Fact]
    public void SizeNeverWritesProtectionAboveTheMarkedMaximum() =>
        Gen.Select(Gen.OneOfConst("480V 3ph", "208V 3ph", "230V 1ph"), Compressor.Array[1, 3])
            .Sample((supply, compressors) =>
            {
                var text = $"feeder F {supply}\n" + string.Concat(compressors.Select((c, i) => string.Format(c.Text, i)));
                var analysis = Analyzer.Analyze(SizeAll.Apply(text));
                Assert.Empty(analysis.Parse.Diagnostics);
                foreach (var (c, i) in compressors.Select((c, i) => (c, i)))
                {
                    var result = analysis.Motors.Values.Single(m => m.Tag == $"C-{i}");
                    if (result.ProtectionRating is { } written) Assert.True(written <= c.Mop, $"C-{i}: {written} A written above the marked {c.Mop} A");
                    if (result.MaximumProtection?.Value is { } max) Assert.True(max <= c.Mop);
                }

                Assert.DoesNotContain(analysis.Findings, f => f.Severity == Severity.Error && f.Fix is not null);
            }, iter: 150);
}
