using System.Diagnostics;
using MotorLang.Server.Tests;

namespace MotorLang.Bench;

/// <summary>
/// `open`: one very large document opened in the real server process (`motorlang lsp`): time from
/// didOpen to its first diagnostics, and the process's peak resident set (Linux). The list is the
/// generator's, grown to the size asked for. Invented data, for measurement only.
/// </summary>
internal static class LargeOpen
{
    public static async Task Run(int megabytes, string motorlang)
    {
        var motors = (int)(megabytes * 1_000_000L / 215); // the generator writes about 215 bytes a motor
        var text = MotorListGenerator.Generate(motors);
        var (started, client) = await ServerProcess.StartAsync(motorlang);
        using var process = started;
        const string uri = "file:///bench/large.motors";
        var clock = Stopwatch.StartNew();
        await client.Open(uri, text);
        var published = await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(10));
        var elapsed = clock.Elapsed;
        var status = File.ReadAllLines($"/proc/{process.Id}/status");
        string Field(string name) => status.First(l => l.StartsWith(name + ":", StringComparison.Ordinal)).Split(':')[1].Trim();
        // The server's processor time (user + system, in clock ticks of 1/100 s) tells more than the wall clock on a busy machine.
        var stat = File.ReadAllText($"/proc/{process.Id}/stat");
        var fields = stat[(stat.LastIndexOf(')') + 2)..].Split(' ');
        var cpu = (long.Parse(fields[11]) + long.Parse(fields[12])) / 100.0;
        Console.WriteLine($"{text.Length / 1e6:0.0} MB ({motors:N0} motors): first diagnostics after {elapsed.TotalSeconds:0.0} s " +
                          $"({published.Diagnostics.Length} shown); server processor time {cpu:0.0} s; peak resident {Field("VmHWM")}, now {Field("VmRSS")}");
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await process.WaitForExitAsync();
    }
}
