using MotorLang.Server.Protocol;
using StreamJsonRpc;

namespace MotorLang.Server.Tests;

/// <summary>
/// Editor services across the files of a plant (a copy of examples/harbor-cannery): definition,
/// references and rename of a tag reach every file; the hover of a switchboard feeder counts the
/// MCC files below it; a file deleted on disk has its diagnostics cleared.
/// </summary>
public sealed class PlantEditorTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-plant-editor-").FullName;

    public PlantEditorTests()
    {
        foreach (var f in Directory.GetFiles(Path.Combine(Fixture.Root, "examples", "harbor-cannery"), "*.motors"))
            File.Copy(f, Path.Combine(_dir, Path.GetFileName(f)));
    }

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Uri(string name) => new System.Uri(Path.Combine(_dir, name)).AbsoluteUri;

    private string Text(string name) => File.ReadAllText(Path.Combine(_dir, name));

    /// <summary>The position of the first <paramref name="word"/> on the first line containing <paramref name="line"/>.</summary>
    private Position At(string name, string line, string word)
    {
        var lines = Text(name).Split('\n');
        var i = Array.FindIndex(lines, l => l.Contains(line, StringComparison.Ordinal));
        return new Position(i, lines[i].IndexOf(word, StringComparison.Ordinal) + 1);
    }

    private async Task<InProcessServer> OpenAsync(string name)
    {
        var server = await InProcessServer.StartAsync();
        await server.Client.Open(Uri(name), Text(name));
        await server.Client.DiagnosticsAsync(Uri(name), 1);
        return server;
    }

    [Fact]
    public async Task DefinitionOfFromAndLikeIsInTheFileThatDefinesTheTag()
    {
        await using var server = await OpenAsync("mcc-3-cold-store.motors");
        var doc = new TextDocumentIdentifier(Uri("mcc-3-cold-store.motors"));
        var feeder = await server.Client.Request<Location?>("textDocument/definition", new TextDocumentPositionParams(doc, At("mcc-3-cold-store.motors", "from SWBD-1", "SWBD-1")));
        Assert.Equal(Uri("switchboard.motors"), feeder!.Uri);
        Assert.Equal(At("switchboard.motors", "feeder SWBD-1", "SWBD-1").Line, feeder.Range.Start.Line);

        var motor = await server.Client.Request<Location?>("textDocument/definition", new TextDocumentPositionParams(doc, At("mcc-3-cold-store.motors", "like P-102", "P-102")));
        Assert.Equal(Uri("mcc-1-retort.motors"), motor!.Uri);
        Assert.Equal(At("mcc-1-retort.motors", "motor P-102", "P-102").Line, motor.Range.Start.Line);
    }

    [Fact]
    public async Task ReferencesAndRenameReachEveryFile()
    {
        await using var server = await OpenAsync("switchboard.motors");
        var doc = new TextDocumentIdentifier(Uri("switchboard.motors"));
        var position = At("switchboard.motors", "feeder SWBD-1", "SWBD-1");
        var references = await server.Client.Request<Location[]>("textDocument/references", new ReferenceParams(doc, position, new ReferenceContext(false)));
        // 'from SWBD-1' in the three MCC files and in PP-1 of the switchboard file.
        Assert.Equal(
            ["mcc-1-retort.motors", "mcc-2-filling.motors", "mcc-3-cold-store.motors", "switchboard.motors"],
            references.Select(r => Path.GetFileName(new System.Uri(r.Uri).LocalPath)).Order(StringComparer.Ordinal));

        var edit = await server.Client.Request<WorkspaceEdit>("textDocument/rename", new RenameParams(doc, position, "MSB-1"));
        Assert.Equal(4, edit.Changes.Count);
        Assert.Equal(2, edit.Changes[Uri("switchboard.motors")].Length);
        foreach (var (uri, edits) in edit.Changes)
        {
            var text = File.ReadAllText(new System.Uri(uri).LocalPath).Split('\n');
            Assert.All(edits, e => Assert.Equal("SWBD-1", text[e.Range.Start.Line][e.Range.Start.Character..e.Range.End.Character]));
            Assert.All(edits, e => Assert.Equal("MSB-1", e.NewText));
        }

        // A tag written in another file is taken: the refusal names that file.
        var refused = await Assert.ThrowsAsync<RemoteInvocationException>(() =>
            server.Client.Request<WorkspaceEdit>("textDocument/rename", new RenameParams(doc, position, "MCC-2")));
        Assert.Contains("mcc-2-filling.motors", refused.Message);
    }

    [Fact]
    public async Task TheSwitchboardHoverCountsTheMotorsInTheMccFiles()
    {
        await using var server = await OpenAsync("switchboard.motors");
        var doc = new TextDocumentIdentifier(Uri("switchboard.motors"));
        var hover = await server.Client.Request<Hover?>("textDocument/hover", new TextDocumentPositionParams(doc, At("switchboard.motors", "feeder SWBD-1", "SWBD-1")));
        // README's tour: 203 A of calculated load in the plant (alone, only its lighting panel).
        Assert.Contains("203", hover!.Contents.Value);
        Assert.Equal(At("switchboard.motors", "feeder SWBD-1", "SWBD-1").Line, hover.Range!.Start.Line);
    }

    [Fact]
    public async Task AFileDeletedOnDiskHasItsDiagnosticsClearedAndThePlantAnalysedWithoutIt()
    {
        await using var server = await OpenAsync("mcc-1-retort.motors");
        var mcc3 = Uri("mcc-3-cold-store.motors");
        Assert.Contains((await server.Client.DiagnosticsAsync(mcc3)).Diagnostics, d => d.Code == "P013");
        Assert.Contains((await server.Client.DiagnosticsAsync(Uri("mcc-1-retort.motors"))).Diagnostics, d => d.Code == "P030");

        File.Delete(new System.Uri(mcc3).LocalPath);
        await server.Client.Notify("workspace/didChangeWatchedFiles", new DidChangeWatchedFilesParams([new FileEvent(mcc3, 3)]));
        await server.Client.DiagnosticsWhere(mcc3, p => p.Diagnostics.Length == 0);
        // Without MCC-3 nothing reuses P-101.
        await server.Client.DiagnosticsWhere(Uri("mcc-1-retort.motors"), p => p.Diagnostics.All(d => d.Code != "P030"));
    }

    /// <summary>
    /// An edit in one file re-publishes only the files whose diagnostics changed: a closed file whose
    /// findings are the same is not sent again (the client already shows them), the edited file is.
    /// </summary>
    [Fact]
    public async Task AnEditSendsOnlyTheFilesWhoseDiagnosticsChanged()
    {
        const string edited = "mcc-1-retort.motors";
        await using var server = await OpenAsync(edited);
        var others = new[] { "mcc-2-filling.motors", "mcc-3-cold-store.motors", "switchboard.motors" };
        foreach (var f in others) await server.Client.DiagnosticsAsync(Uri(f));
        var before = others.ToDictionary(f => f, f => server.Client.Publications(Uri(f)));
        Assert.All(before.Values, n => Assert.Equal(1, n));

        // Words typed into the comment at the top (no line moves: MCC-3's `like P-102` points into
        // this file, so moving lines would rightly change its related locations): nothing changes anywhere else.
        await server.Client.Change(Uri(edited), 2, new TextDocumentContentChangeEvent(new Protocol.Range(new Position(0, 2), new Position(0, 2)), "checked: "));
        await server.Client.DiagnosticsAsync(Uri(edited), 2);
        // P-101's wire cut to 14 AWG: only MCC-1's file gains a finding. Its
        // publication comes after every file of the comment's run, which shares the one publishing queue.
        var (wireLine, wireColumn) = (At(edited, "wire 10 AWG", "10").Line, At(edited, "wire 10 AWG", "10").Character - 1);
        await server.Client.Change(Uri(edited), 3, new TextDocumentContentChangeEvent(new Protocol.Range(new Position(wireLine, wireColumn), new Position(wireLine, wireColumn + 2)), "14"));
        var now = await server.Client.DiagnosticsAsync(Uri(edited), 3);
        Assert.Contains(now.Diagnostics, d => d.Code == "M101");

        Assert.Equal(3, server.Client.Publications(Uri(edited)));
        foreach (var f in others) Assert.True(before[f] == server.Client.Publications(Uri(f)), $"{f} sent again");
    }
}
