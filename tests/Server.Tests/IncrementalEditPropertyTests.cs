using CsCheck;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>Random sequences of incremental edits keep the server's copy identical to the client's.</summary>
public class IncrementalEditPropertyTests
{
    private static readonly Gen<string> Inserted = Gen.OneOfConst("", "x", " ", "\n", "\r\n", "😀", "°", "泵", "  motor M 5hp\n", "\"", "# c", "ab\ncd", "#", "  # note ", "1");

    /// <summary>An edit as (start fraction, length fraction, text): positions are derived from the current text when applied.</summary>
    private static readonly Gen<(double Start, double Length, string Text)[]> Edits =
        Gen.Select(Gen.Double[0, 1], Gen.Double[0, 0.2], Inserted).Array[1, 25];

    [Fact]
    public async Task ServerCopyMatchesTheClientAfterRandomEdits()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        var run = 0;
        await Edits.SampleAsync(async edits =>
        {
            var uri = $"file:///edits/{Interlocked.Increment(ref run)}.motors";
            var text = "feeder F \"泵站 😀\" 480V 3ph\r\n  motor M-1 15hp\r\n    wire 10 AWG\n";
            await client.Open(uri, text);
            var version = 1;
            foreach (var (startFraction, lengthFraction, insert) in edits)
            {
                var start = (int)(startFraction * text.Length);
                var end = Math.Min(text.Length, start + (int)(lengthFraction * text.Length));
                // Never split a surrogate pair or a CRLF: a real editor never produces such a range.
                while (start > 0 && start < text.Length && (char.IsLowSurrogate(text[start]) || (text[start] == '\n' && text[start - 1] == '\r'))) start--;
                while (end < text.Length && end > 0 && (char.IsLowSurrogate(text[end]) || (text[end] == '\n' && text[end - 1] == '\r'))) end++;
                end = Math.Max(start, end);
                var range = new Protocol.Range(PositionOf(text, start), PositionOf(text, end));
                text = text[..start] + insert + text[end..];
                await client.Change(uri, ++version, new TextDocumentContentChangeEvent(range, insert));
            }

            var copy = await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(uri));
            Assert.Equal(version, copy.Version);
            Assert.Equal(text, copy.Text);

            // Whatever path the server took (a comment-line edit reuses the previous analysis), the
            // diagnostics are those of a fresh analysis of the same text.
            var published = await client.DiagnosticsAsync(uri, version);
            var fresh = Analysis.Analyzer.Analyze(text).Findings;
            Assert.Equal(fresh.Select(f => $"{f.Code} {f.Range}"), published.Diagnostics.Select(d => $"{d.Code} {d.Range.Start.Line + 1}:{d.Range.Start.Character + 1}-{d.Range.End.Line + 1}:{d.Range.End.Character + 1}"));
            await client.Notify("textDocument/didClose", new DidCloseTextDocumentParams(new TextDocumentIdentifier(uri)));
        }, iter: 100, threads: 1);
    }

    private static readonly string[] Examples =
        Directory.GetFiles(Path.Combine(Fixture.Root, "examples"), "*.motors").Order().Select(File.ReadAllText).ToArray();

    private static readonly Gen<string> Typed = Gen.OneOfConst("", "1", "0", "x", " ", "A", "hp", "AWG", "😀", "°", "泵", "\"", "#");

    /// <summary>
    /// Edits inside one line, each waited for, so that every change takes the one-line path (the
    /// previous version is analysed): the server's text and diagnostics equal a fresh analysis.
    /// Ranges may run past the line's end (the protocol clamps them) but never split a character.
    /// </summary>
    [Fact]
    public async Task OneLineEditsAppliedOnTheLastAnalysisMatchAFreshAnalysis()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        var run = 0;
        await Gen.Select(Gen.Int[0, Examples.Length - 1], Gen.Select(Gen.Double[0, 1], Gen.Double[0, 1.2], Gen.Int[0, 3], Typed).Array[1, 8])
            .SampleAsync(async session =>
            {
                var uri = $"file:///lines/{Interlocked.Increment(ref run)}.motors";
                var text = Examples[session.Item1];
                await client.Open(uri, text);
                await client.DiagnosticsAsync(uri, 1);
                var version = 1;
                foreach (var (linePick, startPick, length, insert) in session.Item2)
                {
                    var lines = text.Split('\n');
                    var line = Math.Min(lines.Length - 1, (int)(linePick * lines.Length));
                    var content = lines[line].TrimEnd('\r');
                    var start = Math.Min((int)(startPick * content.Length), content.Length);
                    while (start > 0 && start < content.Length && char.IsLowSurrogate(content[start])) start--;
                    var end = start + length;
                    while (end < content.Length && char.IsLowSurrogate(content[end])) end++;
                    var clampedEnd = Math.Min(end, content.Length);
                    lines[line] = content[..start] + insert + content[clampedEnd..] + (lines[line].EndsWith('\r') ? "\r" : "");
                    text = string.Join('\n', lines);
                    await client.Change(uri, ++version, new TextDocumentContentChangeEvent(new Protocol.Range(new(line, start), new(line, end)), insert));
                    var published = await client.DiagnosticsAsync(uri, version);
                    var fresh = Analysis.Analyzer.Analyze(text).Findings;
                    Assert.Equal(fresh.Select(f => $"{f.Code} {f.Range} {f.Message}"),
                        published.Diagnostics.Select(d => $"{d.Code} {d.Range.Start.Line + 1}:{d.Range.Start.Character + 1}-{d.Range.End.Line + 1}:{d.Range.End.Character + 1} {d.Message}"));
                }

                var copy = await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(uri));
                Assert.Equal(text, copy.Text);
                await client.Notify("textDocument/didClose", new DidCloseTextDocumentParams(new TextDocumentIdentifier(uri)));
            }, iter: 60, threads: 1);
    }

    /// <summary>The LSP position of an offset, counted independently of the server's code: lines end at "\n".</summary>
    private static Position PositionOf(string text, int offset)
    {
        var line = 0;
        var lineStart = 0;
        for (var i = 0; i < offset; i++)
        {
            if (text[i] != '\n') continue;
            line++;
            lineStart = i + 1;
        }

        var column = offset - lineStart;
        // A position inside "\r\n" is the end of the line's content.
        if (offset > 0 && offset <= text.Length && offset - 1 >= lineStart && text[offset - 1] == '\r' && offset < text.Length && text[offset] == '\n') column--;
        return new Position(line, column);
    }
}
