using System.Text;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>
/// Data-driven feature tests: each file under Fixtures/ is a document with a "$0" cursor; its
/// ".expected" file holds the hover, completion list or fixed document. Run with
/// UPDATE_SNAPSHOTS=1 to write new expectations, then review them.
/// </summary>
public class FixtureTests
{
    public static TheoryData<string> Files(string kind) =>
        new(Directory.GetFiles(Path.Combine(Fixture.Root, "tests", "Server.Tests", "Fixtures", kind), "*.motors").Select(Path.GetFileName).OfType<string>().Order());

    public static TheoryData<string> HoverFiles() => Files("hover");
    public static TheoryData<string> CompletionFiles() => Files("completion");
    public static TheoryData<string> CodeActionFiles() => Files("codeaction");

    [Theory]
    [MemberData(nameof(HoverFiles))]
    public async Task Hover(string name) => await Check("hover", name, async (client, uri, cursor) =>
    {
        var hover = await client.Request<Hover?>("textDocument/hover", new TextDocumentPositionParams(new TextDocumentIdentifier(uri), cursor));
        return hover?.Contents.Value ?? "(no hover)";
    });

    [Theory]
    [MemberData(nameof(CompletionFiles))]
    public async Task Completion(string name) => await Check("completion", name, async (client, uri, cursor) =>
    {
        var list = await client.Request<CompletionList>("textDocument/completion", new CompletionParams(new TextDocumentIdentifier(uri), cursor));
        return string.Join("\n", list.Items.OrderBy(i => i.SortText, StringComparer.Ordinal).Take(12)
            .Select(i => i.Detail is null ? i.Label : $"{i.Label}  ({i.Detail})")) + "\n";
    });

    [Theory]
    [MemberData(nameof(CodeActionFiles))]
    public async Task CodeAction(string name) => await Check("codeaction", name, async (client, uri, cursor) =>
    {
        var actions = await client.Request<CodeAction[]>("textDocument/codeAction",
            new CodeActionParams(new TextDocumentIdentifier(uri), new Protocol.Range(cursor, cursor), new CodeActionContext([], null)));
        var text = (await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(uri))).Text;
        var sb = new StringBuilder();
        foreach (var action in actions)
        {
            var edits = action.Edit!.Changes[uri].Select(e => new Parser.Text.TextEdit(
                new Parser.Text.SourceRange(new(e.Range.Start.Line, e.Range.Start.Character), new(e.Range.End.Line, e.Range.End.Character)), e.NewText));
            sb.Append($"## {action.Kind}: {action.Title}\n").Append(Parser.Text.TextEdits.Apply(text, edits)).Append('\n');
        }

        return sb.ToString();
    });

    private static async Task Check(string kind, string name, Func<LspClient, string, Position, Task<string>> act)
    {
        var dir = Path.Combine(Fixture.Root, "tests", "Server.Tests", "Fixtures", kind);
        var fixture = Fixture.Parse(await File.ReadAllTextAsync(Path.Combine(dir, name)));
        await using var server = await InProcessServer.StartAsync();
        var uri = $"file:///fixtures/{name}";
        await server.Client.Open(uri, fixture.Text);
        await server.Client.DiagnosticsAsync(uri, 1);
        var actual = await act(server.Client, uri, fixture.Cursor);
        var expectedPath = Path.Combine(dir, Path.ChangeExtension(name, ".expected"));
        if (Environment.GetEnvironmentVariable("UPDATE_SNAPSHOTS") == "1") await File.WriteAllTextAsync(expectedPath, actual);
        Assert.True(File.Exists(expectedPath), $"no expectation at {expectedPath}; run with UPDATE_SNAPSHOTS=1 and review it");
        Assert.Equal(await File.ReadAllTextAsync(expectedPath), actual);
    }
}
