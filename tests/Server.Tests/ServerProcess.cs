using System.Diagnostics;

namespace MotorLang.Server.Tests;

/// <summary>The real `motorlang lsp` process, talked to over its stdio pipes.</summary>
public sealed class ServerProcess : IAsyncDisposable
{
    private ServerProcess(Process process, LspClient client)
    {
        Process = process;
        Client = client;
    }

    public Process Process { get; }
    public LspClient Client { get; }

    public static ServerProcess Start()
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "motorlang.dll");
        var info = new ProcessStartInfo("dotnet", ["exec", dll, "lsp", "--debounce-ms", "0"])
        {
            RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        var process = Process.Start(info)!;
        process.ErrorDataReceived += (_, _) => { };
        process.BeginErrorReadLine();
        return new ServerProcess(process, new LspClient(process.StandardInput.BaseStream, process.StandardOutput.BaseStream));
    }

    public async Task<int> WaitForExitAsync(TimeSpan timeout)
    {
        using var cts = new CancellationTokenSource(timeout);
        await Process.WaitForExitAsync(cts.Token);
        return Process.ExitCode;
    }

    public async ValueTask DisposeAsync()
    {
        await Client.DisposeAsync();
        if (!Process.HasExited) Process.Kill(entireProcessTree: true);
        Process.Dispose();
    }
}
