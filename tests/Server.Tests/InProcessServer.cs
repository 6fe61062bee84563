using Nerdbank.Streams;

namespace MotorLang.Server.Tests;

/// <summary>The server and a client connected in memory by a duplex stream pair, with no debounce.</summary>
public sealed class InProcessServer : IAsyncDisposable
{
    private InProcessServer(LspClient client, Task<int> server, StringWriter log)
    {
        Client = client;
        Server = server;
        Log = log;
    }

    public LspClient Client { get; }
    public Task<int> Server { get; }
    public StringWriter Log { get; }

    public static async Task<InProcessServer> StartAsync(object? options = null, string? rootUri = null, object? capabilities = null)
    {
        var (serverSide, clientSide) = FullDuplexStream.CreatePair();
        var log = new StringWriter();
        var server = LanguageServer.RunAsync(serverSide, serverSide, TextWriter.Synchronized(log), TimeSpan.Zero);
        var client = new LspClient(clientSide, clientSide);
        await client.InitializeAsync(options: options, rootUri: rootUri, capabilities: capabilities);
        return new InProcessServer(client, server, log);
    }

    public async ValueTask DisposeAsync()
    {
        try
        {
            await Client.Request<object?>("shutdown", null);
            await Client.Notify("exit");
            await Server.WaitAsync(TimeSpan.FromSeconds(10));
        }
        catch (Exception)
        {
            // A test that broke the connection has already failed or meant to.
        }

        await Client.DisposeAsync();
    }
}
