using System.Diagnostics;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>
/// The real executable leaves no diagnostics socket or debugger pipe in TMPDIR (the runtime makes them
/// at start-up unless told not to), and keeps them when DOTNET_EnableDiagnostics=1 asks for them.
/// </summary>
public sealed class DiagnosticEndpointTests : IDisposable
{
    private readonly string _tmp = Directory.CreateTempSubdirectory("motorlang-tmpdir-").FullName;

    public void Dispose() => Directory.Delete(_tmp, recursive: true);

    private async Task<string[]> EndpointsWhileServing(string? enableDiagnostics)
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "motorlang.dll");
        var info = new ProcessStartInfo("dotnet", ["exec", dll, "lsp"])
        {
            RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        info.Environment["TMPDIR"] = _tmp;
        foreach (var name in new[] { "DOTNET_EnableDiagnostics", "COMPlus_EnableDiagnostics", "DOTNET_EnableDiagnostics_IPC", "DOTNET_EnableDiagnostics_Debugger" })
            info.Environment.Remove(name);
        if (enableDiagnostics is not null) info.Environment["DOTNET_EnableDiagnostics"] = enableDiagnostics;
        using var process = Process.Start(info)!;
        process.ErrorDataReceived += (_, _) => { };
        process.BeginErrorReadLine();
        try
        {
            await using var client = new LspClient(process.StandardInput.BaseStream, process.StandardOutput.BaseStream);
            // Answering initialize means start-up is long over: whatever the runtime made is in TMPDIR now.
            await client.InitializeAsync().WaitAsync(TimeSpan.FromSeconds(60));
            return Directory.GetFileSystemEntries(_tmp).Select(Path.GetFileName).Where(n => n!.StartsWith("dotnet-diagnostic-", StringComparison.Ordinal) || n.StartsWith("clr-debug-pipe-", StringComparison.Ordinal)).Select(n => n!).ToArray();
        }
        finally
        {
            if (!process.HasExited) process.Kill(entireProcessTree: true);
        }
    }

    [Fact]
    public async Task NoDiagnosticsSocketOrDebugPipeIsLeftOpen() => Assert.Empty(await EndpointsWhileServing(null));

    [Fact]
    public async Task DOTNET_EnableDiagnostics_1_KeepsThemForProfiling()
    {
        var endpoints = await EndpointsWhileServing("1");
        Assert.Contains(endpoints, n => n.StartsWith("dotnet-diagnostic-", StringComparison.Ordinal) && n.EndsWith("-socket", StringComparison.Ordinal));
        Assert.Contains(endpoints, n => n.StartsWith("clr-debug-pipe-", StringComparison.Ordinal) && n.EndsWith("-in", StringComparison.Ordinal));
    }

    [Fact]
    public async Task DOTNET_EnableDiagnostics_0_MakesNone() => Assert.Empty(await EndpointsWhileServing("0"));
}
