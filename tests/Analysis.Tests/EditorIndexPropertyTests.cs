using CsCheck;
using MotorLang.Analysis.Editing;
using MotorLang.Parser;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Hover and inlay hints find their motor or feeder by binary search over the ordered blocks; on any
/// list (comments, blank lines, loads, broken lines, odd indentation) they must find exactly what a
/// plain scan of every result finds.
/// </summary>
public sealed class EditorIndexPropertyTests
{
    private static readonly string[] Pieces =
    [
        "feeder F-{0} 480V 3ph", "  length 100ft", "  wire 3/0 AWG", "  motor M-{0} 10hp", "    wire 12 AWG", "    overload 15A",
        "  load L-{0} 20A", "    continuous", "# a comment", "", "  motor M-{0} 5hp", "      nameplate 7.6A", "  motro X 5hp", "   wire 10 AWG",
        "compressor C-{0}", "  compressor C-{0}", "    rated-load 20A",
    ];

    private static readonly Gen<string> Lists = Gen.Int[0, Pieces.Length - 1].Array[0, 80].Select(picks =>
        string.Join("\n", picks.Select((p, i) => string.Format(Pieces[p], i))));

    [Fact]
    public void HoverFindsTheSameCircuitAsAScan()
    {
        Lists.Sample(text =>
        {
            var analysis = Analyzer.Analyze(DocumentParser.Parse(text));
            for (var line = 0; line < analysis.Parse.Tree.Lines.Length; line++)
            {
                var motor = analysis.Motors.Values.FirstOrDefault(m => line >= m.Motor.Header.Line.Index && line <= m.Motor.LastLine);
                // A load's own lines explain nothing of their own (no hover), even where the feeder
                // has statements written after the load.
                var onLoad = analysis.Parse.Model.Feeders.SelectMany(f => f.Loads).Any(l => line >= l.Header.Line.Index && line <= l.LastLine);
                var feeder = motor is null && !onLoad
                    ? analysis.Feeders.Values.FirstOrDefault(f => line >= f.Feeder.Header.Line.Index && line <= f.Feeder.LastOwnLine)
                    : null;
                var view = Breakdown.At(analysis, new TextPosition(line, 0));
                var expected = motor?.Tag ?? feeder?.Tag;
                Assert.Equal(expected, view?.Title.Split(" — ")[0]);
            }
        }, iter: 300);
    }

    [Fact]
    public void InlayWindowHoldsExactlyTheMotorsWhoseHeadersItCovers()
    {
        Gen.Select(Lists, Gen.Int[0, 90], Gen.Int[0, 40]).Sample((text, first, span) =>
        {
            var analysis = Analyzer.Analyze(DocumentParser.Parse(text));
            var last = first + span;
            var scanned = analysis.Motors.Values
                .Where(m => m.Motor.Header.Line.Index >= first && m.Motor.Header.Line.Index <= last)
                .OrderBy(m => m.Motor.Header.Line.Index).Select(m => m.Tag);
            Assert.Equal(scanned, Breakdown.MotorsOnLines(analysis, first, last).Select(m => m.Tag));
        }, iter: 500);
    }
}
