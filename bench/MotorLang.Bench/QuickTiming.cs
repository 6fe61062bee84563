using System.Diagnostics;
using MotorLang.Analysis;
using MotorLang.Parser;
using MotorLang.Parser.Formatting;

namespace MotorLang.Bench;

/// <summary>
/// `time N`: a quick look at each stage between full benchmark runs, with allocations and GC
/// pause time. Not a measurement to quote; bench/README.md quotes BenchmarkDotNet.
/// </summary>
public static class QuickTiming
{
    public static void Run(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        Console.WriteLine($"{motors} motors, {text.Length / 1024} KiB");
        for (var i = 0; i < 5; i++)
        {
            var pause = GC.GetTotalPauseDuration();
            var parsed = Stage("parse", () => DocumentParser.Parse(text));
            Stage("format", () => Formatter.Format(parsed));
            var analysis = Stage("analyze", () => Analyzer.Analyze(parsed));
            var lines = text.Split('\n');
            var line = Array.FindIndex(lines, l => l.StartsWith("    length ", StringComparison.Ordinal));
            lines[line] = lines[line].Replace("length 9", "length 8").Replace("length 1", "length 2");
            var edited = string.Join('\n', lines);
            var reread = Stage("re-read one line", () => DocumentParser.ReparseLine(parsed, edited, line)!);
            Stage("update", () => Analyzer.Update(analysis, reread)!);
            Console.WriteLine($"  gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms");
        }
    }

    /// <summary>
    /// `memory N`: what the server keeps for one open N-motor list — the text, the parse and the
    /// analysis — measured as the managed heap retained after full collections.
    /// </summary>
    public static Task ServerMemory(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var m0 = GC.GetTotalMemory(forceFullCollection: true);
        var parsed = MotorLang.Parser.DocumentParser.Parse(text);
        var m1 = GC.GetTotalMemory(forceFullCollection: true);
        var analysis = MotorLang.Analysis.Analyzer.Analyze(parsed);
        var m2 = GC.GetTotalMemory(forceFullCollection: true);
        Console.WriteLine($"retained for one open list: text {text.Length * 2 >> 20} MB, parse {(m1 - m0) >> 20} MB, analysis {(m2 - m1) >> 20} MB; " +
                          $"total {(text.Length * 2 + m2 - m0) >> 20} MB ({analysis.Findings.Length} findings)");
        GC.KeepAlive(analysis);
        return Task.CompletedTask;
    }

    /// <summary>
    /// `process N path/to/motorlang.dll`: the real server process (as an editor starts it) with an
    /// N-motor list open: its resident set and managed heap after the first diagnostics, after 200
    /// value edits, and once it has been idle for two seconds. Linux (reads /proc).
    /// </summary>
    public static async Task ServerProcessMemory(int motors, string motorlang)
    {
        var info = new ProcessStartInfo("dotnet", ["exec", motorlang, "lsp", "--debounce-ms", "0"])
        {
            RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        using var process = Process.Start(info)!;
        process.ErrorDataReceived += (_, _) => { };
        process.BeginErrorReadLine();
        var client = new MotorLang.Server.Tests.LspClient(process.StandardInput.BaseStream, process.StandardOutput.BaseStream);
        await client.InitializeAsync(Environment.ProcessId);
        Console.WriteLine($"started: {Memory(process)}");
        var text = MotorListGenerator.Generate(motors);
        const string uri = "file:///bench/process.motors";
        await client.Open(uri, text);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
        Console.WriteLine($"after open ({motors} motors): {Memory(process)}");
        await Task.Delay(TimeSpan.FromSeconds(4));
        Console.WriteLine($"after open and 4 s idle: {Memory(process)}, managed heap {await Heap(client) >> 20} MB");
        var lines = text.Split('\n');
        var lengthLines = Enumerable.Range(0, lines.Length).Where(i => lines[i].StartsWith("    length ", StringComparison.Ordinal)).ToArray();
        for (var version = 2; version < 202; version++)
        {
            var at = new MotorLang.Server.Protocol.Position(lengthLines[version * 37 % lengthLines.Length], "    length ".Length);
            await client.Change(uri, version, new MotorLang.Server.Protocol.TextDocumentContentChangeEvent(
                new MotorLang.Server.Protocol.Range(at, at with { Character = at.Character + 1 }), (version % 9 + 1).ToString()));
            await client.DiagnosticsAsync(uri, version, TimeSpan.FromMinutes(2));
        }

        Console.WriteLine($"after 200 value edits: {Memory(process)}, collector {await client.Request<System.Text.Json.JsonElement>("motorlang/gcMemory", new { })}, managed heap {await Heap(client) >> 20} MB");
        await Task.Delay(TimeSpan.FromSeconds(4));
        Console.WriteLine($"after 4 s idle: {Memory(process)}, collector {await client.Request<System.Text.Json.JsonElement>("motorlang/gcMemory", new { })}");
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await process.WaitForExitAsync();
    }

    private static string Memory(Process process)
    {
        var status = File.ReadAllLines($"/proc/{process.Id}/status");
        string Field(string name) => status.First(l => l.StartsWith(name + ":", StringComparison.Ordinal)).Split(':')[1].Trim();
        return $"resident {Field("VmRSS")} (peak {Field("VmHWM")})";
    }

    private static async Task<long> Heap(MotorLang.Server.Tests.LspClient client) => await client.Request<long>("motorlang/heapBytes", new { });

    /// <summary>`parses N`: 30 parses of one list, for profiling.</summary>
    public static void Parses(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var times = new List<double>();
        var pause = GC.GetTotalPauseDuration();
        for (var i = 0; i < 30; i++)
        {
            var sw = Stopwatch.StartNew();
            DocumentParser.Parse(text);
            times.Add(sw.Elapsed.TotalMilliseconds);
        }

        times.Sort();
        Console.WriteLine($"parse: min {times[0]:0.0} ms, median {times[15]:0.0} ms, gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds / 30:0.0} ms each");
    }

    /// <summary>`analyses N`: 30 full analyses of one parsed list, for profiling.</summary>
    public static void Analyses(int motors)
    {
        var parsed = DocumentParser.Parse(MotorListGenerator.Generate(motors));
        var times = new List<double>();
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var pause = GC.GetTotalPauseDuration();
        for (var i = 0; i < 30; i++)
        {
            var sw = Stopwatch.StartNew();
            Analyzer.Analyze(parsed);
            times.Add(sw.Elapsed.TotalMilliseconds);
        }

        times.Sort();
        Console.WriteLine($"analysis: min {times[0]:0.0} ms, median {times[15]:0.0} ms, {(GC.GetAllocatedBytesForCurrentThread() - bytes) / 30 >> 20} MB each, " +
                          $"gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds / 30:0.0} ms each");
    }

    /// <summary>`updates N`: 200 one-line value edits through the parser and analysis alone (no server), timed each.</summary>
    public static void Updates(int motors)
    {
        var text = MotorListGenerator.Generate(motors);
        var analysis = Analyzer.Analyze(text);
        var lines = text.Split('\n');
        var lengthLines = Enumerable.Range(0, lines.Length).Where(i => lines[i].StartsWith("    length ", StringComparison.Ordinal)).ToArray();
        var times = new List<double>();
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var pause = GC.GetTotalPauseDuration();
        for (var i = 0; i < 200; i++)
        {
            var line = lengthLines[i * 37 % lengthLines.Length];
            lines[line] = "    length " + (i % 9 + 1) + lines[line]["    length ".Length..][1..];
            var edited = string.Join('\n', lines);
            var sw = Stopwatch.StartNew();
            var reread = DocumentParser.ReparseLine(analysis.Parse, edited, line) ?? throw new InvalidOperationException("not incremental");
            analysis = Analyzer.Update(analysis, reread) ?? throw new InvalidOperationException("no update");
            times.Add(sw.Elapsed.TotalMilliseconds);
        }

        times.Sort();
        Console.WriteLine($"re-read + update: p50 {times[99]:0.00} ms, p95 {times[189]:0.00} ms, max {times[^1]:0.00} ms, " +
                          $"{(GC.GetAllocatedBytesForCurrentThread() - bytes) / 200 / 1024} KiB per edit (text included), gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms");
    }

    /// <summary>
    /// `edits N`: the in-process server on an N-motor list, debounce zero; 300 one-character value
    /// edits, each timed from sending the change to receiving its diagnostics, as percentiles.
    /// </summary>
    public static async Task ServerEdits(int motors)
    {
        var (serverSide, clientSide) = Nerdbank.Streams.FullDuplexStream.CreatePair();
        var server = MotorLang.Server.LanguageServer.RunAsync(serverSide, serverSide, TextWriter.Null, TimeSpan.Zero);
        var client = new MotorLang.Server.Tests.LspClient(clientSide, clientSide);
        await client.InitializeAsync();
        var text = MotorListGenerator.Generate(motors);
        const string uri = "file:///bench/edits.motors";
        var opens = int.TryParse(Environment.GetEnvironmentVariable("OPENS"), out var o) ? o : 5;
        for (var i = 0; i < opens; i++)
        {
            var openWatch = Stopwatch.StartNew();
            var other = $"file:///bench/open{i}.motors";
            await client.Open(other, text);
            await client.DiagnosticsAsync(other, 1, TimeSpan.FromMinutes(2));
            Console.Write($"open → diagnostics {openWatch.Elapsed.TotalMilliseconds:0} ms; ");
            await client.Notify("textDocument/didClose", new MotorLang.Server.Protocol.DidCloseTextDocumentParams(new MotorLang.Server.Protocol.TextDocumentIdentifier(other)));
        }

        Console.WriteLine();
        await client.Open(uri, text);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
        var lines = text.Split('\n');
        var lengthLines = Enumerable.Range(0, lines.Length).Where(i => lines[i].StartsWith("    length ", StringComparison.Ordinal)).ToArray();
        var times = new List<double>();
        var slowest = new List<(double Ms, double Gc)>();
        var faults = MinorFaults();
        var pause = GC.GetTotalPauseDuration();
        for (var version = 2; version < 302; version++)
        {
            var line = lengthLines[version * 37 % lengthLines.Length];
            var at = new MotorLang.Server.Protocol.Position(line, "    length ".Length);
            var change = new MotorLang.Server.Protocol.TextDocumentContentChangeEvent(
                new MotorLang.Server.Protocol.Range(at, at with { Character = at.Character + 1 }), (version % 9 + 1).ToString());
            var gcBefore = GC.GetTotalPauseDuration();
            var sw = Stopwatch.StartNew();
            await client.Change(uri, version, change);
            await client.DiagnosticsAsync(uri, version, TimeSpan.FromMinutes(2));
            times.Add(sw.Elapsed.TotalMilliseconds);
            slowest.Add((sw.Elapsed.TotalMilliseconds, (GC.GetTotalPauseDuration() - gcBefore).TotalMilliseconds));
        }

        if (Environment.GetEnvironmentVariable("SHOW_SLOWEST") is not null)
            Console.WriteLine($"page faults during the edits: {MinorFaults() - faults}; resident set now {Environment.WorkingSet >> 20} MB");
        if (Environment.GetEnvironmentVariable("SHOW_SLOWEST") is not null)
            Console.WriteLine("slowest (ms, of which gc): " + string.Join(", ", slowest.Select((x, i) => (x, i)).OrderByDescending(p => p.x.Ms).Take(20).Select(p => $"#{p.i} {p.x.Ms:0.0}/{p.x.Gc:0.0}")));

        times.Sort();
        double P(double q) => times[(int)Math.Min(times.Count - 1, Math.Ceiling(q * times.Count) - 1)];
        Console.WriteLine($"{motors} motors, 300 value edits → diagnostics: p50 {P(0.5):0.0} ms, p95 {P(0.95):0.0} ms, max {times[^1]:0.0} ms; " +
                          $"gc pause {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:0} ms in all");
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await server;
    }

    /// <summary>Minor page faults of this process so far (Linux; 0 elsewhere).</summary>
    private static long MinorFaults()
    {
        try
        {
            var stat = File.ReadAllText("/proc/self/stat");
            return long.Parse(stat[(stat.LastIndexOf(')') + 2)..].Split(' ')[7]);
        }
        catch (IOException)
        {
            return 0;
        }
    }

    private static T Stage<T>(string name, Func<T> work)
    {
        var bytes = GC.GetAllocatedBytesForCurrentThread();
        var sw = Stopwatch.StartNew();
        var result = work();
        Console.Write($"{name} {sw.Elapsed.TotalMilliseconds:0.0} ms ({(GC.GetAllocatedBytesForCurrentThread() - bytes) >> 20} MB); ");
        return result;
    }
}
