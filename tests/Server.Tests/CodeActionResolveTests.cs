using MotorLang.Server.Protocol;
using StreamJsonRpc;

namespace MotorLang.Server.Tests;

/// <summary>"Size everything" is offered without its edit to clients that resolve actions, and computed when picked.</summary>
public class CodeActionResolveTests
{
    private const string Uri = "file:///resolve/pump.motors";
    private const string Text = "feeder F 480V 3ph\n  motor M 15hp\n";

    private static readonly object Resolving = new { textDocument = new { codeAction = new { resolveSupport = new { properties = new[] { "edit" } } } } };

    [Fact]
    public async Task TheEditIsComputedOnResolveAndEqualsTheDirectOne()
    {
        await using var direct = await InProcessServer.StartAsync();
        await using var lazy = await InProcessServer.StartAsync(capabilities: Resolving);
        var expected = (await SizeEverything(direct.Client)).Edit;
        Assert.NotNull(expected);

        var offered = await SizeEverything(lazy.Client);
        Assert.Null(offered.Edit);
        Assert.NotNull(offered.Data);
        var resolved = await lazy.Client.Request<CodeAction>("codeAction/resolve", offered);
        Assert.Equal(expected!.Changes[Uri].Single(), resolved.Edit!.Changes[Uri].Single());
    }

    [Fact]
    public async Task ResolvingAfterAnEditAnswersContentModified()
    {
        await using var server = await InProcessServer.StartAsync(capabilities: Resolving);
        var offered = await SizeEverything(server.Client);
        var at = new Position(1, 12);
        await server.Client.Change(Uri, 2, new TextDocumentContentChangeEvent(new Protocol.Range(at, at), "0"));
        await server.Client.DiagnosticsAsync(Uri, 2);
        var error = await Assert.ThrowsAsync<RemoteInvocationException>(() => server.Client.Request<CodeAction>("codeAction/resolve", offered));
        Assert.Equal(ErrorCodes.ContentModified, error.ErrorCode);
    }

    private static async Task<CodeAction> SizeEverything(LspClient client)
    {
        await client.Open(Uri, Text);
        await client.DiagnosticsAsync(Uri, 1);
        var actions = await client.Request<CodeAction[]>("textDocument/codeAction",
            new CodeActionParams(new TextDocumentIdentifier(Uri), new Protocol.Range(new(0, 0), new(0, 0)), new CodeActionContext([], ["source.fixAll"])));
        return Assert.Single(actions);
    }
}
