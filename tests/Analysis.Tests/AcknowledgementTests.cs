using MotorLang.Analysis.Findings;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// `# acknowledge CODE: reason` directives. The base motor (13 A nameplate, SF 1.15) with a 17 A
/// overload is above the 430.32(A)(1) limit (125 % x 13 A = 16.25 A) but within 430.32(C)
/// (140 % x 13 A = 18.2 A), so it gets M205, the case a directive is meant for.
/// </summary>
public class AcknowledgementTests
{
    private const string Reason = "trips on starting at 16.25 A; 430.32(C) permits up to 18.2 A";

    private static AnalysisResult Analyze(string text) => Analyzer.Analyze(text);

    private static string[] Codes(AnalysisResult r) => r.Findings.Select(Describe).ToArray();

    [Fact]
    public void WithoutADirectiveTheFindingIsReported()
    {
        Assert.Equal(["12:14-12:17 M205"], Codes(Analyze(With(11, "    overload 17A"))));
    }

    [Fact]
    public void ADirectiveAtTheEndOfTheLineAcknowledgesTheFindingWithItsReason()
    {
        var result = Analyze(With(11, $"    overload 17A  # acknowledge M205: {Reason}"));
        Assert.Empty(result.Findings);
        var ack = Assert.Single(result.Acknowledged);
        Assert.Equal("M205", ack.Finding.Code);
        Assert.Equal(Reason, ack.Reason);
        Assert.Equal(11, ack.Directive.Start.Line);
    }

    [Fact]
    public void ADirectiveOnTheLinesAboveAcknowledgesTheNextStatement()
    {
        var lines = Base.ToList();
        lines.Insert(11, $"    # acknowledge M205: {Reason}");
        lines.Insert(12, "    # the starter was chosen before the motor was changed");
        lines.Insert(13, "");
        lines[14] = "    overload 17A";
        var result = Analyze(Text([.. lines]));
        Assert.Empty(result.Findings);
        Assert.Equal(14, Assert.Single(result.Acknowledged).Finding.Range.Start.Line);
    }

    [Fact]
    public void AnErrorCanBeAcknowledgedSoTheListNoLongerHasErrors()
    {
        var result = Analyze(With(11, "    overload 19A # acknowledge M103: owner's engineer accepted, letter 2026-04"));
        Assert.False(result.HasErrors);
        Assert.Equal("M103", Assert.Single(result.Acknowledged).Finding.Code);
    }

    [Fact]
    public void AnAcknowledgementThatNoLongerMatchesIsReportedAndItsFixRemovesIt()
    {
        // 16 A is within 430.32(A)(1), so there is no M205 on the line any more. The code is at columns 34-37.
        var text = With(11, $"    overload 16A   # acknowledge M205: {Reason}");
        var result = Analyze(text);
        var stale = Assert.Single(result.Findings);
        Assert.Equal("12:34-12:38 M320", Describe(stale));
        Assert.Equal(Parser.Diagnostics.Severity.Warning, stale.Severity);
        Assert.Empty(result.Acknowledged);
        Assert.Equal(Text(Base), ApplyFix(text, stale));

        // One that matches one code and not another acknowledges the one and reports the other.
        var mixed = Analyze(With(11, $"    overload 17A # acknowledge M205, M101: {Reason}"));
        Assert.Equal(["12:38-12:42 M320"], Codes(mixed));
        Assert.Single(mixed.Acknowledged);
    }

    [Fact]
    public void AStaleDirectiveOnItsOwnLineIsRemovedWhole()
    {
        var lines = Base.ToList();
        lines.Insert(11, $"    # acknowledge M205: {Reason}");
        var text = Text([.. lines]);
        var stale = Assert.Single(Analyze(text).Findings);
        Assert.Equal("M320", stale.Code);
        Assert.Contains("line 13", stale.Message);
        Assert.Equal(Text(Base), ApplyFix(text, stale));
    }

    [Fact]
    public void AWrongCodeIsReportedAndAcknowledgesNothing()
    {
        var unknown = Analyze(With(11, $"    overload 17A # acknowledge M999: {Reason}"));
        Assert.Equal(["12:14-12:17 M205", "12:32-12:36 M321"], Codes(unknown));
        Assert.Contains("'M999' is not a finding code", unknown.Findings[1].Message);

        var parse = Analyze(With(11, $"    overload 17A # acknowledge P001: {Reason}"));
        Assert.Contains("cannot be acknowledged", parse.Findings.Single(f => f.Code == "M321").Message);

        var none = Analyze(With(11, $"    overload 17A # acknowledge: {Reason}"));
        Assert.Equal(["12:14-12:17 M205", "12:18-12:93 M321"], Codes(none));
    }

    [Fact]
    public void ADirectiveWithoutAReasonIsReportedAndAcknowledgesNothing()
    {
        foreach (var directive in new[] { "# acknowledge M205", "# acknowledge M205:", "# acknowledge M205:   " })
        {
            var result = Analyze(With(11, $"    overload 17A {directive}"));
            Assert.Equal(["M205", "M322"], result.Findings.Select(f => f.Code));
            Assert.Contains("needs its reason", result.Findings[1].Message);
            Assert.Empty(result.Acknowledged);
        }
    }

    [Fact]
    public void OrdinaryCommentsThatMentionTheWordAreNotDirectives()
    {
        var result = Analyze(With(11, "    overload 17A # acknowledged by the owner, see M205"));
        Assert.Equal(["12:14-12:17 M205"], Codes(result));
    }

    [Fact]
    public void AnUpdateAfterEditingTheDirectiveJudgesLikeAFullAnalysis()
    {
        // An edit inside a comment leaves the model as it was; the directive must still take effect.
        var before = Parser.DocumentParser.Parse(With(11, "    overload 17A # note"));
        var first = Analyzer.Analyze(before);
        var edited = With(11, $"    overload 17A # acknowledge M205: {Reason}");
        var reparsed = Parser.DocumentParser.ReparseLine(before, edited, 11)!;
        var updated = Analyzer.Update(first, reparsed)!;
        Assert.Empty(updated.Findings);
        Assert.Single(updated.Acknowledged);
    }
}
