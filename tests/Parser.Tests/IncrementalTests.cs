using CsCheck;
using MotorLang.Parser.Formatting;

namespace MotorLang.Parser.Tests;

/// <summary>Re-reading one edited line instead of the whole document gives exactly what a full parse gives.</summary>
public class IncrementalTests
{
    private const string Text = "# header\r\nfeeder F 480V 3ph  # main\r\n  # about M\r\n  motor M 15hp\r\n    wire 10 AWG\r\n\r\n";

    [Theory]
    [InlineData(0, "# header, edited 😀")]
    [InlineData(2, "  # about M, and more")]
    [InlineData(5, "   ")]
    [InlineData(5, "# new comment")]
    public void ACommentEditKeepsTheModelAndPrintsTheNewText(int line, string newLine)
    {
        var (before, after, reparsed) = Edit(line, newLine);
        Assert.NotNull(reparsed);
        Assert.Same(before.Model, reparsed!.Model);
        Assert.Null(reparsed.Edit);
        AssertSameAsFullParse(after, reparsed);
    }

    [Theory]
    [InlineData(1, "feeder F 208V 3ph  # main, edited")]      // a feeder header, same tag
    [InlineData(3, "  motor M 20hp")]                          // a motor header, same tag
    [InlineData(4, "    wire 8 AWG")]                          // a statement
    [InlineData(4, "    wire 8 AWGX")]                         // a statement that now has an error
    [InlineData(4, "    WIRE 2x 250mcm  # two sets")]          // keyword case, an alias and a new comment
    public void AValueEditCopiesOnlyItsFeederAndEqualsAFullParse(int line, string newLine)
    {
        var (before, after, reparsed) = Edit(line, newLine);
        Assert.NotNull(reparsed);
        Assert.NotNull(reparsed!.Edit);
        Assert.Same(before.Model, reparsed.Edit!.Before);
        Assert.Same(before.Model.Feeders[0], reparsed.Edit.OldFeeder);
        Assert.Same(reparsed.Model.Feeders[0], reparsed.Edit.NewFeeder);
        AssertSameAsFullParse(after, reparsed);
    }

    [Theory]
    [InlineData(1, "feeder G 480V 3ph  # main")]   // a changed tag
    [InlineData(3, "  motor  M 15hp")]             // a tag that moved
    [InlineData(4, "    ground 10 AWG")]           // a changed keyword
    [InlineData(4, "   wire 10 AWG")]              // a changed indentation
    [InlineData(4, "\twire 10 AWG")]               // a tab
    [InlineData(2, "  motor N 5hp")]               // a comment that became a statement
    [InlineData(4, "    # wire 10 AWG")]           // a statement that became a comment
    [InlineData(2, "  # about M\n  # split")]      // a new line break
    [InlineData(0, "<<<<<<< HEAD")]                // a conflict marker
    [InlineData(5, "  \"open string")]             // a blank line that became an error
    public void AnythingElseIsReadInFull(int line, string newLine) => Assert.Null(Edit(line, newLine).Reparsed);

    [Fact]
    public void AWrongLineNumberIsNoticed()
    {
        var before = DocumentParser.Parse(Text);
        var after = Text.Replace("wire 10 AWG", "wire 8 AWG");
        Assert.Null(DocumentParser.ReparseLine(before, after, 3));
        Assert.Null(DocumentParser.ReparseLine(before, after, 99));
    }

    private static readonly string[] Documents =
        Directory.GetFiles(Path.Combine(TestSupport.RepoRoot, "examples"), "*.motors").Order().Select(File.ReadAllText).ToArray();

    private static readonly Gen<string> Inserted = Gen.OneOfConst(
        "", "1", "0", "x", " ", "hp", "A", "AWG", "kcmil", "ft", "\"", "#", "😀", "°", "B", "1/0", "-", "2x ", "\t", "\r", "M-1", "like", "<<<<<<<");

    [Fact]
    public void RandomOneLineEditsEqualAFullParse()
    {
        var incremental = 0;
        Gen.Select(Gen.Int[0, Documents.Length - 1], Gen.Select(Gen.Double[0, 1], Gen.Double[0, 1], Gen.Double[0, 0.5], Inserted).Array[1, 10])
            .Sample(session =>
            {
                var text = Documents[session.Item1];
                var parsed = DocumentParser.Parse(text);
                foreach (var (linePick, startPick, lengthPick, insert) in session.Item2)
                {
                    var lines = text.Split('\n');
                    var index = Math.Min(lines.Length - 1, (int)(linePick * lines.Length));
                    var content = lines[index];
                    var start = (int)(startPick * content.Length);
                    var end = Math.Min(content.Length, start + (int)(lengthPick * content.Length));
                    while (start > 0 && start < content.Length && char.IsLowSurrogate(content[start])) start--;
                    while (end < content.Length && char.IsLowSurrogate(content[end])) end++;
                    lines[index] = content[..start] + insert + content[end..];
                    text = string.Join('\n', lines);
                    var reparsed = DocumentParser.ReparseLine(parsed, text, index);
                    if (reparsed is not null)
                    {
                        Interlocked.Increment(ref incremental);
                        AssertSameAsFullParse(text, reparsed);
                    }

                    parsed = reparsed ?? DocumentParser.Parse(text);
                }
            }, iter: 300);
        Assert.True(incremental > 300, $"only {incremental} edits took the one-line path");
    }

    private static (ParseResult Before, string After, ParseResult? Reparsed) Edit(int line, string newLine)
    {
        var before = DocumentParser.Parse(Text);
        var lines = Text.Split("\r\n");
        lines[line] = newLine;
        var after = string.Join("\r\n", lines);
        return (before, after, DocumentParser.ReparseLine(before, after, line));
    }

    private static void AssertSameAsFullParse(string text, ParseResult reparsed)
    {
        var full = DocumentParser.Parse(text);
        Assert.Equal(text, reparsed.Tree.Print());
        Assert.Equal(text, reparsed.Tree.Text);
        Assert.Equal(SnapshotTests.Dump(full), SnapshotTests.Dump(reparsed));
        Assert.Equal(full.Diagnostics.AsEnumerable(), reparsed.Diagnostics.AsEnumerable());
        Assert.True(Fingerprint.Same(full, reparsed));
        Assert.Equal(Formatter.Format(full).Text, Formatter.Format(reparsed).Text);
    }
}
