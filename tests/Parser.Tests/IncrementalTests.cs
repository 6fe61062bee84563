using MotorLang.Parser.Formatting;

namespace MotorLang.Parser.Tests;

/// <summary>Re-reading one edited comment line instead of the whole document.</summary>
public class IncrementalTests
{
    private const string Text = "# header\r\nfeeder F 480V 3ph  # main\r\n  # about M\r\n  motor M 15hp\r\n\r\n";

    [Theory]
    [InlineData(0, "# header, edited 😀")]
    [InlineData(2, "  # about M, and more")]
    [InlineData(4, "   ")]
    [InlineData(4, "# new comment")]
    public void ACommentEditKeepsTheModelAndPrintsTheNewText(int line, string newLine)
    {
        var before = DocumentParser.Parse(Text);
        var lines = Text.Split("\r\n");
        lines[line] = newLine;
        var after = string.Join("\r\n", lines);
        var reparsed = DocumentParser.ReparseCommentLine(before, after, line);
        Assert.NotNull(reparsed);
        Assert.Same(before.Model, reparsed!.Model);
        Assert.Equal(after, reparsed.Tree.Print());
        Assert.True(Fingerprint.Same(DocumentParser.Parse(after), reparsed));
        Assert.Equal(DocumentParser.Parse(after).Diagnostics, reparsed.Diagnostics);
    }

    [Theory]
    [InlineData(1, "feeder F 480V 3ph  # main, edited")]   // a statement line
    [InlineData(2, "  motor N 5hp")]                        // a comment that became a statement
    [InlineData(2, "  # about M\n  # split")]               // a new line break
    [InlineData(0, "<<<<<<< HEAD")]                          // a conflict marker
    [InlineData(4, "  \"open string")]                      // a blank line that became an error
    public void AnythingElseIsReadInFull(int line, string newLine)
    {
        var before = DocumentParser.Parse(Text);
        var lines = Text.Split("\r\n");
        lines[line] = newLine;
        Assert.Null(DocumentParser.ReparseCommentLine(before, string.Join("\r\n", lines), line));
    }
}
