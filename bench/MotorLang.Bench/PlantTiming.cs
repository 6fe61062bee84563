using System.Diagnostics;
using MotorLang.Server.Protocol;
using MotorLang.Server.Tests;

namespace MotorLang.Bench;

/// <summary>
/// `plant`: a generated plant of many files (a switchboard plant file, then MCC files that each take
/// one feeder of the generator's motors `from SWBD-1`), timed through the real executable:
/// `motorlang check` of the folder (wall clock, process start-up included), then the real server
/// process: opening one MCC file until its diagnostics (the plant loaded, every file published),
/// and value edits in that file until the plant's diagnostics are published again, with the
/// server's peak resident set. Invented data, for measurement only.
/// </summary>
internal static class PlantTiming
{
    public static async Task Run(int files, int motorsPerFile, string motorlang)
    {
        var dir = Directory.CreateTempSubdirectory("motorlang-bench-plant-").FullName;
        try
        {
            Write(dir, files, motorsPerFile);
            Console.WriteLine($"plant of {files} MCC files × {motorsPerFile} motors and a switchboard file ({files * motorsPerFile:N0} motors, " +
                              $"{Directory.GetFiles(dir).Sum(f => new FileInfo(f).Length) / 1e6:0.0} MB)");
            var before = ChildrenCpu();
            var checks = Enumerable.Range(0, 5).Select(_ => Check(motorlang, dir)).Order().ToList();
            var cpu = (ChildrenCpu() - before) / 5;
            Console.WriteLine($"check: median {checks[2]:0} ms wall (min {checks[0]:0}, max {checks[4]:0}), process start-up included; " +
                              $"{cpu * 1000:0} ms processor time per run");
            await Server(motorlang, dir);
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }

    public static void Write(string dir, int files, int motorsPerFile)
    {
        for (var i = 1; i <= files; i++)
        {
            var text = MotorListGenerator.Generate(motorsPerFile, motorsPerFile, withErrors: true, seed: i);
            // One feeder per file, supplied from the switchboard, with tags of its own.
            text = text[text.IndexOf("feeder ", StringComparison.Ordinal)..]
                .Replace("feeder MCC-0 \"Motor control center 0\" 480V 3ph\n", $"feeder MCC-{i} \"Motor control center {i}\" 480V 3ph\n  from SWBD-1\n")
                .Replace("  motor M-", $"  motor M{i}-")
                .Replace("  load L-0 ", $"  load L-{i} ");
            File.WriteAllText(Path.Combine(dir, $"mcc-{i:000}.motors"), $"# Synthetic MCC file {i} for benchmarks\n" + text);
        }

        File.WriteAllText(Path.Combine(dir, "switchboard.motors"),
            "# Synthetic plant for benchmarks (the plant file)\nproject \"Synthetic plant\"\n  plant\n  code NEC-2023\n  ambient 30C\n" +
            "  conductor cu THHN 75C\n  raceway EMT\n\nfeeder SWBD-1 \"Main switchboard\" 480V 3ph\n  wire 8x 500 kcmil\n  protection inverse-time-breaker\n");
    }

    /// <summary>Processor time (user + system, seconds) of this process's finished children, from /proc (Linux): a busy machine stretches the wall clock, not this.</summary>
    private static double ChildrenCpu()
    {
        var stat = File.ReadAllText("/proc/self/stat");
        var fields = stat[(stat.LastIndexOf(')') + 2)..].Split(' ');
        return (long.Parse(fields[13]) + long.Parse(fields[14])) / 100.0;
    }

    private static double Cpu(int pid)
    {
        var stat = File.ReadAllText($"/proc/{pid}/stat");
        var fields = stat[(stat.LastIndexOf(')') + 2)..].Split(' ');
        return (long.Parse(fields[11]) + long.Parse(fields[12])) / 100.0;
    }

    private static double Check(string motorlang, string dir)
    {
        var info = new ProcessStartInfo("dotnet", ["exec", motorlang, "check", "-q", dir])
        {
            RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        var clock = Stopwatch.StartNew();
        using var p = Process.Start(info)!;
        var output = p.StandardOutput.ReadToEndAsync();
        var error = p.StandardError.ReadToEndAsync();
        p.WaitForExit();
        var ms = clock.Elapsed.TotalMilliseconds;
        if (p.ExitCode is not (0 or 1)) throw new InvalidOperationException($"check failed ({p.ExitCode}): {error.Result}");
        _ = output.Result;
        return ms;
    }

    private static async Task Server(string motorlang, string dir)
    {
        var (started, client) = await ServerProcess.StartAsync(motorlang);
        using var process = started;
        var file = Path.Combine(dir, "mcc-002.motors");
        var uri = new Uri(file).AbsoluteUri;
        var switchboard = new Uri(Path.Combine(dir, "switchboard.motors")).AbsoluteUri;
        var text = File.ReadAllText(file);

        var clock = Stopwatch.StartNew();
        await client.Open(uri, text);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(5));
        Console.WriteLine($"server: didOpen of one MCC file to its diagnostics (plant loaded and analysed, {Directory.GetFiles(dir).Length} files published): {clock.Elapsed.TotalMilliseconds:0} ms");
        await client.DiagnosticsAsync(switchboard, null, TimeSpan.FromMinutes(1));

        // A value edit: the length of the file's first motor, so its branch and the drop from the source change.
        var lines = text.Split('\n');
        var line = Array.FindIndex(lines, l => l.StartsWith("    length ", StringComparison.Ordinal));
        var times = new List<double>();
        var cpuBefore = Cpu(process.Id);
        for (var v = 2; v < 62; v++)
        {
            var old = lines[line];
            lines[line] = $"    length {30 + v % 2}ft";
            var change = new TextDocumentContentChangeEvent(new MotorLang.Server.Protocol.Range(new Position(line, 0), new Position(line, old.Length)), lines[line]);
            clock.Restart();
            await client.Change(uri, v, change);
            // The plant's files are published in its order, the switchboard (the plant file) first, so the edited file's comes last.
            await client.DiagnosticsAsync(uri, v, TimeSpan.FromMinutes(1));
            times.Add(clock.Elapsed.TotalMilliseconds);
        }

        var cpuPerEdit = (Cpu(process.Id) - cpuBefore) / times.Count;
        times.Sort();
        double P(double q) => times[(int)Math.Min(times.Count - 1, Math.Round(q * (times.Count - 1)))];
        var status = File.ReadAllLines($"/proc/{process.Id}/status");
        string Field(string name) => status.First(l => l.StartsWith(name + ":", StringComparison.Ordinal)).Split(':')[1].Trim();
        Console.WriteLine($"server: value edit in the MCC file to the plant's updated diagnostics (that file and the switchboard's), {times.Count} edits: " +
                          $"median {P(0.5):0} ms, p95 {P(0.95):0} ms, max {times[^1]:0} ms; server processor time {cpuPerEdit * 1000:0} ms per edit");
        Console.WriteLine($"server: peak resident {Field("VmHWM")}, right after the edits {Field("VmRSS")}");
        // The server trims its heap after two idle seconds (MemoryTrimmer): the resting figure.
        await Task.Delay(TimeSpan.FromSeconds(6));
        status = File.ReadAllLines($"/proc/{process.Id}/status");
        Console.WriteLine($"server: six idle seconds later {Field("VmRSS")} resident, managed heap {await client.Request<long>("motorlang/heapBytes", null) / 1e6:0} MB");
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await process.WaitForExitAsync();
    }
}
