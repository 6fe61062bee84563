using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>Published diagnostics always describe the text the server holds, whatever version numbers the client sends.</summary>
public class DiagnosticOrderTests
{
    [Fact]
    public async Task AnOlderVersionNumberSentLaterIsAppliedAndItsDiagnosticsPublished()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        const string uri = "file:///order.motors";
        const string clean = "feeder F 480V 3ph\n  motor M 5hp\n";
        const string broken = "feeder F 480V 3ph\n  motor M 5hp\n  bogus line here\n";
        await client.Open(uri, clean);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromSeconds(10));

        await client.Change(uri, 5, new TextDocumentContentChangeEvent(null, clean));
        var five = await client.DiagnosticsAsync(uri, 5, TimeSpan.FromSeconds(10));

        // The client goes back to version 3 with other text: the server applies it (the text
        // it holds is version 3's) and must publish that text's diagnostics.
        await client.Change(uri, 3, new TextDocumentContentChangeEvent(null, broken));
        var three = await client.DiagnosticsAsync(uri, 3, TimeSpan.FromSeconds(10));
        var held = await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(uri));
        Assert.Equal((3, broken), (held.Version, held.Text));

        // The same text opened fresh gives the same findings: the published ones describe the held text.
        await client.Open("file:///fresh.motors", broken);
        var fresh = await client.DiagnosticsAsync("file:///fresh.motors", 1, TimeSpan.FromSeconds(10));
        Assert.Equal(fresh.Diagnostics.Select(d => (d.Code, d.Range)), three.Diagnostics.Select(d => (d.Code, d.Range)));
        Assert.NotEqual(five.Diagnostics.Select(d => d.Code), three.Diagnostics.Select(d => d.Code));
    }
}
