using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>Formatting through the server never deletes text it could not read, nor rewrites a line with a diagnostic.</summary>
public class FormattingSafetyTests
{
    [Theory]
    [InlineData("feeder F-1 480V 3ph\n  motor M-1 5hp\0\n    wire 12 AWG\n")]
    [InlineData("\uFEFFfeeder F-1 480v 3ph\r\n  motor  M-1 5 HP\r\n\0")]
    public async Task AnUnreadableDocumentGetsNoEditsFromDocumentOrRangeFormatting(string text)
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        const string uri = "file:///nul.motors";
        await client.Open(uri, text);
        Assert.Equal("P019", Assert.Single((await client.DiagnosticsAsync(uri, 1)).Diagnostics).Code);
        var doc = new TextDocumentIdentifier(uri);

        var whole = await client.Request<Protocol.TextEdit[]?>("textDocument/formatting", new DocumentFormattingParams(doc, null));
        Assert.Empty(whole ?? []);
        var range = await client.Request<Protocol.TextEdit[]?>("textDocument/rangeFormatting",
            new DocumentRangeFormattingParams(doc, new Protocol.Range(new Position(0, 0), new Position(2, 0)), null));
        Assert.Empty(range ?? []);
    }

    [Fact]
    public async Task FormattingLeavesALineWithADiagnosticAlone()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        const string uri = "file:///dup.motors";
        // Line 3 reuses the tag of line 2 (P013); line 4 is clean and gets formatted.
        await client.Open(uri, "feeder F 480V 3ph\n  motor M-1 5hp\n  motor m-1  5 HP\n  motor M-2  5 HP\n");
        await client.DiagnosticsAsync(uri, 1);

        var edits = await client.Request<Protocol.TextEdit[]>("textDocument/formatting", new DocumentFormattingParams(new TextDocumentIdentifier(uri), null));
        var edit = Assert.Single(edits);
        Assert.Equal(3, edit.Range.Start.Line);
        Assert.Equal("  motor M-2 5hp\n", edit.NewText);
    }
}
