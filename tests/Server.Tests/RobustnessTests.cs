using MotorLang.Server.Protocol;
using StreamJsonRpc;

namespace MotorLang.Server.Tests;

/// <summary>Bad documents and bad requests get answers, never a dead server.</summary>
public class RobustnessTests
{
    [Fact]
    public async Task BinaryAndHugeDocumentsGetADiagnostic()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        await client.Open("file:///bin.motors", "feeder F 480V 3ph\n\0\u0001\u0002\u00ff");
        Assert.Equal("P019", Assert.Single((await client.DiagnosticsAsync("file:///bin.motors", 1)).Diagnostics).Code);

        var huge = new string('#', Parser.DocumentParser.MaxChars + 10);
        await client.Open("file:///huge.motors", huge);
        Assert.Equal("P018", Assert.Single((await client.DiagnosticsAsync("file:///huge.motors", 1)).Diagnostics).Code);
    }

    [Fact]
    public async Task RequestsForUnopenedDocumentsAreErrorsAndTheServerCarriesOn()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        var error = await Assert.ThrowsAsync<RemoteInvocationException>(() =>
            client.Request<Hover?>("textDocument/hover", new TextDocumentPositionParams(new TextDocumentIdentifier("file:///nope.motors"), new Position(0, 0))));
        Assert.Equal(ErrorCodes.RequestFailed, error.ErrorCode);

        // A malformed notification is logged, not fatal.
        await client.Notify("textDocument/didChange", new { textDocument = new { uri = "file:///nope.motors" } });
        await client.Open("file:///ok.motors", "feeder F 480V 3ph\n");
        Assert.NotNull(await client.DiagnosticsAsync("file:///ok.motors", 1));
    }

    [Fact]
    public async Task RenameRefusesAClashAndRenamesEveryReference()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        const string text = "feeder A 480V 3ph\nfeeder B 480V 3ph\n  from A\n  motor M 5hp\n  motor N 5hp\n    like M\n";
        await client.Open("file:///r.motors", text);
        var at = new TextDocumentPositionParams(new TextDocumentIdentifier("file:///r.motors"), new Position(3, 8));
        var prepared = await client.Request<PrepareRenameResult>("textDocument/prepareRename", at);
        Assert.Equal("M", prepared.Placeholder);

        var edit = await client.Request<WorkspaceEdit>("textDocument/rename", new RenameParams(at.TextDocument, at.Position, "PUMP-1"));
        Assert.Equal([3, 5], edit.Changes["file:///r.motors"].Select(e => e.Range.Start.Line).Order());

        var clash = await Assert.ThrowsAsync<RemoteInvocationException>(() =>
            client.Request<WorkspaceEdit>("textDocument/rename", new RenameParams(at.TextDocument, at.Position, "a")));
        Assert.Contains("already used", clash.Message);

        var refs = await client.Request<Location[]>("textDocument/references", new ReferenceParams(at.TextDocument, new Position(2, 7), new ReferenceContext(true)));
        Assert.Equal(2, refs.Length);
        var definition = await client.Request<Location>("textDocument/definition", new TextDocumentPositionParams(at.TextDocument, new Position(2, 7)));
        Assert.Equal(0, definition.Range.Start.Line);
    }

    [Fact]
    public async Task OutlineFoldingSemanticTokensInlayHintsAndCodeLenses()
    {
        await using var server = await InProcessServer.StartAsync(options: new { motorlang = new { codeLens = true } });
        var client = server.Client;
        var uri = "file:///o.motors";
        var doc = new TextDocumentIdentifier(uri);
        await client.Open(uri, "project \"P\"\n  ambient 40C\nfeeder A \"Main\" 480V 3ph\n  motor M 15hp  # pump\n    wire 10 AWG\n  load L 5A\n");
        await client.DiagnosticsAsync(uri, 1);

        var symbols = await client.Request<DocumentSymbol[]>("textDocument/documentSymbol", new DocumentSymbolParams(doc));
        Assert.Equal(["P", "A"], symbols.Select(s => s.Name));
        Assert.Equal(["M", "L"], symbols[1].Children!.Select(s => s.Name));

        var folds = await client.Request<FoldingRange[]>("textDocument/foldingRange", new FoldingRangeParams(doc));
        Assert.Contains(folds, f => f.StartLine == 2 && f.EndLine == 5);

        var tokens = await client.Request<SemanticTokens>("textDocument/semanticTokens/full", new SemanticTokensParams(doc));
        Assert.Equal([0, 0, 7, 0, 0], tokens.Data[..5]); // "project" is a keyword at 0:0

        var hints = await client.Request<InlayHint[]>("textDocument/inlayHint", new InlayHintParams(doc, new Protocol.Range(new Position(0, 0), new Position(9, 0))));
        Assert.Equal("FLC 21 A · min 10 AWG · max 60 A", Assert.Single(hints).Label);

        var lenses = await client.Request<CodeLens[]>("textDocument/codeLens", new CodeLensParams(doc));
        Assert.StartsWith("load 26 A", Assert.Single(lenses).Command!.Title);

        await client.Notify("workspace/didChangeConfiguration", new { settings = new { motorlang = new { inlayHints = new { fullLoadCurrent = false, minimumWire = false }, codeLens = false } } });
        Assert.Empty(await client.Request<InlayHint[]>("textDocument/inlayHint", new InlayHintParams(doc, new Protocol.Range(new Position(0, 0), new Position(9, 0)))));
        Assert.Empty(await client.Request<CodeLens[]>("textDocument/codeLens", new CodeLensParams(doc)));

        var formatting = await client.Request<Protocol.TextEdit[]>("textDocument/formatting", new DocumentFormattingParams(doc, null));
        Assert.Empty(formatting);
        var workspace = await client.Request<SymbolInformation[]>("workspace/symbol", new WorkspaceSymbolParams("m"));
        Assert.Contains(workspace, s => s.Name == "M" && s.ContainerName == "A");
    }
}
