using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Tests;

public class ScannerTests
{
    [Theory]
    [InlineData("")]
    [InlineData("\n")]
    [InlineData("project \"A\"\r\n  ambient 40C\r\n")]
    [InlineData("project \"A\"\n  ambient 40C")]
    [InlineData("\uFEFFproject \"A\"\n")]
    [InlineData("  \t  \n# only a comment   \n\n\n")]
    [InlineData("feeder F \"unterminated 480V 3ph\n")]
    [InlineData("mixed\r\nendings\nhere\r\n")]
    public void PrintingTheTreeGivesBackTheInput(string text)
    {
        Assert.Equal(text, DocumentParser.Parse(text).Tree.Print());
    }

    [Fact]
    public void EmptyFileHasOneEmptyLineAndNoDiagnostics()
    {
        var r = DocumentParser.Parse("");
        Assert.Single(r.Tree.Lines);
        Assert.Empty(r.Diagnostics);
        Assert.Empty(r.Model.Feeders);
    }

    [Fact]
    public void LineEndingsAreKeptPerLine()
    {
        var r = DocumentParser.Parse("a\r\nb\nc");
        Assert.Equal(["\r\n", "\n", ""], r.Tree.Lines.Select(l => l.LineEnding));
    }

    [Fact]
    public void BomIsRecordedAndNotPartOfTheFirstLine()
    {
        var r = DocumentParser.Parse("\uFEFFproject \"A\"\n");
        Assert.True(r.Tree.HasBom);
        Assert.Equal(0, r.Tree.Lines[0].Tokens[0].Column);
        Assert.NotNull(r.Model.Project);
    }

    [Fact]
    public void ColumnsCountUtf16CodeUnits()
    {
        // "😀" is two UTF-16 code units, as LSP counts positions by default.
        var r = DocumentParser.Parse("feeder F1 \"😀 °\" 480V 3ph\n");
        var tokens = r.Tree.Lines[0].Tokens;
        Assert.Equal(10, tokens[2].Column);
        Assert.Equal(6, tokens[2].Length);
        Assert.Equal(17, tokens[3].Column);
        Assert.Equal("😀 °", tokens[2].StringValue);
    }

    [Fact]
    public void CommentsAreSeparateFromTokensAndTrailingBlanksAreTrivia()
    {
        var line = DocumentParser.Parse("  wire 10 AWG   # sized for drop   \n").Tree.Lines[0];
        Assert.Equal(["wire", "10", "AWG"], line.Tokens.Select(t => t.Text));
        Assert.Equal("# sized for drop", line.Comment!.Value.Text);
        Assert.Equal(16, line.Comment!.Value.Column);
    }

    [Fact]
    public void StringsKeepHashesAndEscapedQuotes()
    {
        var line = DocumentParser.Parse("project \"Line #3 \\\"north\\\"\" # note\n").Tree.Lines[0];
        Assert.Equal("Line #3 \"north\"", line.Tokens[1].StringValue);
        Assert.Equal("# note", line.Comment!.Value.Text);
    }

    [Fact]
    public void ConflictMarkersGiveOneDiagnosticPerConflict()
    {
        var text = TestSupport.Lines(
            "feeder F1 480V 3ph",
            "<<<<<<< ours",
            "  motor M1 5hp",
            "=======",
            "  motor M1 7.5hp",
            ">>>>>>> theirs",
            "  motor M2 3hp",
            "<<<<<<< ours",
            "  length 10ft",
            "=======",
            ">>>>>>> theirs");
        var r = DocumentParser.Parse(text);
        Assert.Equal(["2:1-2:13 P011", "8:1-8:13 P011"], r.Diagnostics.Select(TestSupport.Describe));
        Assert.Equal(["M2"], r.Model.Motors.Select(m => m.Tag!.Value));
        Assert.True(r.Tree.Lines[2].InConflict);
        Assert.Equal(LineKind.ConflictMarker, r.Tree.Lines[3].Kind);
    }

    [Fact]
    public void BinaryContentGetsOneDiagnosticAndPrintsBack()
    {
        var text = "project \"A\"\n\0\u0001\u0002garbage";
        var r = DocumentParser.Parse(text);
        Assert.Equal(["1:1-1:1 P019"], r.Diagnostics.Select(TestSupport.Describe));
        Assert.Equal(text, r.Tree.Print());
    }
}
