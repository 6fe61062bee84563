using MotorLang.Parser.Formatting;
using static MotorLang.Parser.Tests.TestSupport;

namespace MotorLang.Parser.Tests;

public class FormatterTests
{
    [Fact]
    public void CanonicalIndentationSpacingUnitsAndKeywordCase()
    {
        var input = Lines(
            "PROJECT   \"Demo\"",
            "    Ambient 40 c",
            "FEEDER MCC-1   480v  3PH   # main",
            "   wire 3/0awg",
            "   Protection Inverse-Time-Breaker 200a",
            "   motor P-1 \"Pump\" 15 HP",
            "         wire 250mcm",
            "         raceway pvc-40",
            "         design b");
        var expected = Lines(
            "project \"Demo\"",
            "  ambient 40C",
            "feeder MCC-1 480V 3ph      # main",
            "  wire 3/0 AWG",
            "  protection inverse-time-breaker 200A",
            "  motor P-1 \"Pump\" 15hp",
            "    wire 250 kcmil",
            "    raceway PVC",
            "    design B");
        var r = Formatter.Format(input);
        Assert.True(r.Verified);
        Assert.Equal(expected, r.Text);
    }

    [Fact]
    public void EndOfLineCommentsKeepTheirColumnWhileTheCodeFits()
    {
        var r = Formatter.Format(Lines("feeder A 480V 3ph", "  wire   10awg        # a", "  ground 250MCM # b"));
        Assert.Equal(Lines("feeder A 480V 3ph", "  wire 10 AWG         # a", "  ground 250 kcmil  # b"), r.Text);
    }

    [Fact]
    public void AtMostOneBlankLineAndNoneAtTheEdges()
    {
        var r = Formatter.Format("\n\nfeeder A 480V 3ph\n\n\n\n  motor M 5hp\n\n\n");
        Assert.Equal("feeder A 480V 3ph\n\n  motor M 5hp\n", r.Text);
    }

    [Fact]
    public void LineEndingsAreKept()
    {
        var r = Formatter.Format("feeder A 480v 3ph\r\n  motor M 5 hp\n    wire 10awg\r\n");
        Assert.Equal("feeder A 480V 3ph\r\n  motor M 5hp\n    wire 10 AWG\r\n", r.Text);
    }

    [Fact]
    public void CommentLinesTakeTheIndentationOfTheNextStatement()
    {
        var r = Formatter.Format(Lines("feeder A 480V 3ph", "# about the motor", "      motor M 5hp", "# tail"));
        Assert.Equal(Lines("feeder A 480V 3ph", "  # about the motor", "  motor M 5hp", "# tail"), r.Text);
    }

    [Fact]
    public void BrokenLinesAndTheirChildrenAreLeftExactlyAsTheyAre()
    {
        var input = Lines("feeder A 480V 3ph", "     moter  M 5hp", "        wire   10awg", "  length  5 ft", "  wire   10awg");
        var r = Formatter.Format(input);
        Assert.Equal(Lines("feeder A 480V 3ph", "     moter  M 5hp", "        wire   10awg", "  length 5ft", "  wire 10 AWG"), r.Text);
    }

    [Fact]
    public void RangeFormattingTouchesOnlyThoseLines()
    {
        var input = Lines("feeder A 480v 3ph", "  wire 10awg", "  ground 10awg");
        var r = Formatter.Format(DocumentParser.Parse(input), 1, 1);
        Assert.Equal(Lines("feeder A 480v 3ph", "  wire 10 AWG", "  ground 10awg"), r.Text);
        Assert.Single(r.Edits);
    }

    [Fact]
    public void EditsReproduceTheFormattedText()
    {
        var input = Lines("feeder A 480v 3ph", "", "", "  wire 10awg");
        var r = Formatter.Format(input);
        Assert.Equal(r.Text, Text.TextEdits.Apply(input, r.Edits));
    }

    [Fact]
    public void FormattingIsIdempotentOnTheExamples()
    {
        foreach (var file in Directory.GetFiles(Path.Combine(RepoRoot, "examples"), "*.motors"))
        {
            var once = Formatter.Format(File.ReadAllText(file));
            Assert.True(once.Verified, file);
            Assert.False(Formatter.Format(once.Text).Changed, file);
        }
    }

    [Fact]
    public void ConflictRegionsAreLeftAlone()
    {
        var input = Lines("feeder A 480v 3ph", "<<<<<<< a", "  wire 10awg", "=======", "  wire 8awg", ">>>>>>> b");
        Assert.Equal(Lines("feeder A 480V 3ph", "<<<<<<< a", "  wire 10awg", "=======", "  wire 8awg", ">>>>>>> b"), Formatter.Format(input).Text);
    }
}
