using MotorLang.Parser.Formatting;
using static MotorLang.Parser.Tests.TestSupport;

namespace MotorLang.Parser.Tests;

/// <summary>
/// What the formatter must never do: drop text it could not read, rewrite a line that carries a
/// diagnostic, or give up on a file it can format.
/// </summary>
public class FormatSafetyTests
{
    private const string WithNul = "feeder F-1 480V 3ph\n  motor M-1 5hp\0\n    wire 12 AWG\n";

    [Theory]
    [InlineData(WithNul)]
    [InlineData("\uFEFFfeeder F-1 480v 3ph\r\n\0")]
    [InlineData("\0")]
    [InlineData("\n\n\0\n\n")]
    public void AnUnreadableDocumentIsLeftExactlyAsItIs(string text)
    {
        var parsed = DocumentParser.Parse(text);
        Assert.Contains(parsed.Diagnostics, d => d.Code == Diagnostics.SyntaxCodes.BinaryContent);

        var whole = Formatter.Format(parsed);
        Assert.Equal(text, whole.Text);
        Assert.Empty(whole.Edits);
        var range = Formatter.Format(parsed, 0, 2);
        Assert.Equal(text, range.Text);
        Assert.Empty(range.Edits);
    }

    [Fact]
    public void TheSelfCheckSeesTextThatWasNotRead()
    {
        // An unreadable document has no statements; comparing models alone would call it equal to an empty one.
        Assert.False(Fingerprint.Same(DocumentParser.Parse(WithNul), DocumentParser.Parse("")));
        Assert.False(Fingerprint.Same(DocumentParser.Parse(WithNul), DocumentParser.Parse(WithNul.Replace("12", "10"))));
        Assert.True(Fingerprint.Same(DocumentParser.Parse(WithNul), DocumentParser.Parse(WithNul)));
    }

    [Theory]
    // P007: the string has no closing quote.
    [InlineData("project  \"Unclosed\nfeeder F 480v 3ph\n", 0, "P007")]
    // P013: the tag is used twice.
    [InlineData("feeder F 480V 3ph\n  motor M-1 5hp\n  motor m-1  5 HP\n", 2, "P013")]
    // P014: 'like' names no motor.
    [InlineData("feeder F 480V 3ph\n  motor M-1 5hp\n    LIKE   Q-9\n", 2, "P014")]
    // P005: indentation that does not match the block's.
    [InlineData("feeder F 480V 3ph\n  length 40ft\n motor M-1   5 HP\n    wire 10awg\n", 2, "P005")]
    // P016: a 'like' cycle.
    [InlineData("feeder F 480V 3ph\n  motor A 5hp\n    Like   B\n  motor B 5hp\n    like A\n", 2, "P016")]
    public void ALineWithADiagnosticStaysByteIdentical(string text, int line, string code)
    {
        var parsed = DocumentParser.Parse(text);
        Assert.Contains(parsed.Diagnostics, d => d.Code == code && d.Range.Start.Line == line);

        var r = Formatter.Format(parsed);
        Assert.True(r.Verified);
        var before = text.Split('\n');
        var after = r.Text.Split('\n');
        Assert.Equal(before.Length, after.Length);
        Assert.Equal(before[line], after[line]);
        // The same diagnostics, on the same lines, after formatting.
        Assert.Equal(parsed.Diagnostics.Select(d => (d.Code, d.Range)), DocumentParser.Parse(r.Text).Diagnostics.Select(d => (d.Code, d.Range)));
    }

    [Fact]
    public void LinesWithoutDiagnosticsAroundABrokenOneAreStillFormatted()
    {
        var r = Formatter.Format(Lines("feeder F 480V 3ph", "  motor M-1 5hp", "  motor m-1  5 HP", "  motor M-2  5 HP"));
        Assert.Equal(Lines("feeder F 480V 3ph", "  motor M-1 5hp", "  motor m-1  5 HP", "  motor M-2 5hp"), r.Text);
    }

    [Fact]
    public void AFeederWithMotorsAtOneAndAtTwoSpacesFormatsWithoutChangingWhatIsBroken()
    {
        // The second motor sits under the first (2 > 1), where a motor is misplaced (P012). Moving
        // the first motor to two spaces would silently make the second one valid: a change of meaning.
        var input = Lines("feeder F 480V 3ph", " motor A  5 HP", "  motor B 5hp", "    wire 10awg");
        var parsed = DocumentParser.Parse(input);
        Assert.Contains(parsed.Diagnostics, d => d.Code == "P012" && d.Range.Start.Line == 2);

        var r = Formatter.Format(parsed);
        Assert.True(r.Verified);
        Assert.Equal(Lines("feeder F 480V 3ph", " motor A 5hp", "  motor B 5hp", "    wire 10awg"), r.Text);
        Assert.Equal(r.Text, Formatter.Format(r.Text).Text);
        Assert.Equal(Codes(input), Codes(r.Text));
    }

    [Fact]
    public void AnExampleWithOneMotorOutOfLineStillFormats()
    {
        var text = File.ReadAllText(Path.Combine(RepoRoot, "examples", "cabinet-shop.motors"));
        var shifted = text.Replace("\n  motor SAW-1", "\n motor SAW-1", StringComparison.Ordinal)
            .Replace("ambient 30C", "ambient   30 c", StringComparison.Ordinal);
        Assert.NotEqual(text, shifted);

        var r = Formatter.Format(shifted);
        Assert.True(r.Verified);
        Assert.True(r.Changed);
        Assert.Contains("\n  ambient 30C\n", r.Text);
        Assert.Contains("\n motor SAW-1 ", r.Text);
        Assert.Equal(r.Text, Formatter.Format(r.Text).Text);
        Assert.Equal(Codes(shifted), Codes(r.Text));
    }

    [Fact]
    public void AValidListWithAnyIndentationFormats()
    {
        var input = Lines("project \"P\"", "   ambient 40C", "feeder F 480V 3ph", " wire 10awg", " motor A 5hp", "      wire 10awg",
            "    # about B", " motor B 5hp", "# tail");
        Assert.Empty(DocumentParser.Parse(input).Diagnostics);
        var r = Formatter.Format(input);
        Assert.True(r.Verified);
        Assert.Equal(Lines("project \"P\"", "  ambient 40C", "feeder F 480V 3ph", "  wire 10 AWG", "  motor A 5hp", "    wire 10 AWG",
            "  # about B", "  motor B 5hp", "# tail"), r.Text);
    }
}
