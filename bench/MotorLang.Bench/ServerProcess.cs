using System.Diagnostics;
using MotorLang.Server.Tests;

namespace MotorLang.Bench;

/// <summary>The real server process (`motorlang lsp`, no debounce unless asked) with an initialized client: what the process-level benchmarks drive.</summary>
public static class ServerProcess
{
    public static async Task<(Process Process, LspClient Client)> StartAsync(string motorlang, int debounceMs = 0)
    {
        var info = new ProcessStartInfo("dotnet", ["exec", motorlang, "lsp", "--debounce-ms", debounceMs.ToString(System.Globalization.CultureInfo.InvariantCulture)])
        {
            RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        var process = Process.Start(info)!;
        // Its log is drained and dropped, so a chatty server never blocks on a full pipe.
        process.ErrorDataReceived += (_, _) => { };
        process.BeginErrorReadLine();
        var client = new LspClient(process.StandardInput.BaseStream, process.StandardOutput.BaseStream);
        await client.InitializeAsync(Environment.ProcessId);
        return (process, client);
    }
}
