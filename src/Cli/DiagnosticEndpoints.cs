namespace MotorLang.Cli;

/// <summary>
/// The .NET runtime opens a diagnostics socket (dotnet-diagnostic-PID-KEY-socket) and two debugger
/// pipes (clr-debug-pipe-PID-KEY-in/out) in TMPDIR before Main runs, unless DOTNET_EnableDiagnostics=0
/// is in the environment; no runtimeconfig.json setting turns them off (the runtime documents the
/// environment variable only). So, unless the user set one of the diagnostics variables, the process
/// removes its own endpoints first thing: nothing can connect to them by name from then on. To
/// profile or debug, start motorlang with DOTNET_EnableDiagnostics=1 and they stay.
/// </summary>
public static class DiagnosticEndpoints
{
    /// <summary>Any of these in the environment means the user chose, and the endpoints are left as the runtime made them.</summary>
    public static readonly string[] Switches =
        ["DOTNET_EnableDiagnostics", "COMPlus_EnableDiagnostics", "DOTNET_EnableDiagnostics_IPC", "DOTNET_EnableDiagnostics_Debugger"];

    public static void RemoveUnlessRequested()
    {
        if (OperatingSystem.IsWindows() || Switches.Any(s => Environment.GetEnvironmentVariable(s) is not null)) return;
        var folder = Environment.GetEnvironmentVariable("TMPDIR") is { Length: > 0 } tmp ? tmp : "/tmp";
        var pid = Environment.ProcessId;
        foreach (var pattern in (string[])[$"dotnet-diagnostic-{pid}-*-socket", $"clr-debug-pipe-{pid}-*-in", $"clr-debug-pipe-{pid}-*-out"])
        {
            try
            {
                foreach (var endpoint in Directory.EnumerateFiles(folder, pattern)) File.Delete(endpoint);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // Best effort: a folder we cannot list or an endpoint already gone changes nothing for the user.
            }
        }
    }
}
