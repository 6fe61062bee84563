using System.Diagnostics;
using System.Globalization;
using MotorLang.Server.Protocol;
using MotorLang.Server.Tests;

namespace MotorLang.Bench;

/// <summary>
/// The real server process as an editor drives it while someone types: keystrokes sent at a fixed
/// interval, never waiting for diagnostics, with the shipped debounce (`typing`); and blocks of
/// lines pasted and taken out again, each waited for (`paste`). Linux (memory read from /proc).
/// </summary>
public static class TypingSession
{
    /// <summary>What is typed: a new motor of ten lines (invented), each line after the first started by Enter with the editor's indentation.</summary>
    private static readonly string[] Block =
    [
        "  motor T-{0} \"Typed pump {0}\" 15hp",
        "    nameplate 18.9A",
        "    service-factor 1.15",
        "    length 120ft",
        "    wire 10 AWG",
        "    ground 10 AWG",
        "    protection inverse-time-breaker 60A",
        "    overload 21.7A",
        "    design B",
        "    code-letter G",
    ];

    /// <summary>
    /// Types a new motor block (<paramref name="values"/> false), or retypes values inside existing
    /// lines (true: each keystroke a digit typed into a motor's length, or taken out again), in
    /// <paramref name="sessions"/> sessions at different places of the list.
    /// </summary>
    public static async Task Typing(int motors, string motorlang, bool values = false, int keystrokes = 180, int intervalMs = 30, int debounceMs = 150, int sessions = 3)
    {
        var (started, client) = await ServerProcess.StartAsync(motorlang, debounceMs);
        using var process = started;
        var text = MotorListGenerator.Generate(motors);
        const string uri = "file:///bench/typing.motors";
        await client.Open(uri, text);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
        var version = 1;
        Console.WriteLine($"{motors} motors, {text.Length / 1024} K characters; {keystrokes} keystrokes {intervalMs} ms apart, debounce {debounceMs} ms, " +
                          (values ? "digits typed into and taken out of motors' lengths" : "typing a new motor block"));
        for (var session = 0; session < sessions; session++)
        {
            await Task.Delay(TimeSpan.FromSeconds(4));
            var resting = Memory.Read(process.Id);
            // At a blank line between two motors, spread over the list.
            var lines = text.Split('\n');
            var at = BlankBefore(lines, lines.Length * (session + 1) / (sessions + 1));
            var keys = values ? ValueKeystrokes(lines, at, keystrokes) : Keystrokes(session, at, keystrokes);
            using var sampler = new Memory.Sampler(process.Id);
            var clock = Stopwatch.StartNew();
            var sent = TimeSpan.Zero;
            for (var i = 0; i < keys.Count; i++)
            {
                var due = TimeSpan.FromMilliseconds(i * intervalMs);
                if (due > clock.Elapsed) await Task.Delay(due - clock.Elapsed);
                text = MotorLang.Server.Documents.TextChanges.Apply(text, [keys[i]]);
                sent = clock.Elapsed;
                await client.Change(uri, ++version, keys[i]);
            }

            await client.DiagnosticsAsync(uri, version, TimeSpan.FromMinutes(2));
            var latency = clock.Elapsed - sent;
            var peak = sampler.Stop();
            Console.WriteLine($"session {session + 1}: last keystroke -> its diagnostics {latency.TotalMilliseconds:0} ms " +
                              $"(debounce {debounceMs} + {latency.TotalMilliseconds - debounceMs:0}); resident at rest {resting.Resident >> 20} MB " +
                              $"({resting.Private >> 20} MB private), peak while typing {peak.Resident >> 20} MB ({peak.Private >> 20} MB private): " +
                              $"{(double)peak.Resident / resting.Resident:0.00}x ({(double)peak.Private / resting.Private:0.00}x private)");
        }

        var copy = await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(uri));
        if (copy.Text != text) throw new InvalidOperationException("the server's text differs from the client's");
        await Stop(client, process);
    }

    public static async Task Paste(int motors, string motorlang, int pastes = 20)
    {
        var (started, client) = await ServerProcess.StartAsync(motorlang);
        using var process = started;
        var text = MotorListGenerator.Generate(motors);
        const string uri = "file:///bench/paste.motors";
        await client.Open(uri, text);
        await client.DiagnosticsAsync(uri, 1, TimeSpan.FromMinutes(2));
        await Task.Delay(TimeSpan.FromSeconds(4));
        var version = 1;
        var pasted = new List<double>();
        var removed = new List<double>();
        for (var i = 0; i < pastes; i++)
        {
            var lines = text.Split('\n');
            var at = BlankBefore(lines, (int)((long)lines.Length * (i * 7 % pastes + 1) / (pastes + 1)));
            // Nine lines: a motor of eight and the blank line after it.
            var block = string.Join("\n", Block.Take(8).Select(l => string.Format(CultureInfo.InvariantCulture, l, 1000 + i))) + "\n\n";
            var paste = new TextDocumentContentChangeEvent(new Server.Protocol.Range(new Position(at, 0), new Position(at, 0)), block);
            pasted.Add(await Timed(paste));
            var undo = new TextDocumentContentChangeEvent(new Server.Protocol.Range(new Position(at, 0), new Position(at + 9, 0)), "");
            removed.Add(await Timed(undo));
        }

        Console.WriteLine($"{motors} motors, debounce 0: a 9-line paste -> diagnostics {Percentiles(pasted)}; taking it out again {Percentiles(removed)}");
        var copy = await client.Request<DocumentTextResult>("motorlang/documentText", new TextDocumentIdentifier(uri));
        if (copy.Text != text) throw new InvalidOperationException("the server's text differs from the client's");
        await Stop(client, process);

        async Task<double> Timed(TextDocumentContentChangeEvent change)
        {
            text = MotorLang.Server.Documents.TextChanges.Apply(text, [change]);
            var clock = Stopwatch.StartNew();
            await client.Change(uri, ++version, change);
            await client.DiagnosticsAsync(uri, version, TimeSpan.FromMinutes(2));
            return clock.Elapsed.TotalMilliseconds;
        }
    }

    /// <summary>The keystrokes that type the block on line <paramref name="line"/> (a blank line), cut at <paramref name="count"/>.</summary>
    private static List<TextDocumentContentChangeEvent> Keystrokes(int session, int line, int count)
    {
        var keys = new List<TextDocumentContentChangeEvent>();
        var column = 0;
        void Key(string typed)
        {
            var at = new Position(line, column);
            keys.Add(new TextDocumentContentChangeEvent(new Server.Protocol.Range(at, at), typed));
            if (typed.StartsWith('\n'))
            {
                line++;
                column = typed.Length - 1;
            }
            else
            {
                column += typed.Length;
            }
        }

        for (var round = 0; keys.Count < count; round++)
        {
            foreach (var (template, index) in Block.Select((l, i) => (l, i)))
            {
                var content = string.Format(CultureInfo.InvariantCulture, template, 100 * session + round);
                var indent = content.Length - content.TrimStart().Length;
                if (index == 0 && round == 0) Key(content[..indent]);
                else Key("\n" + content[..indent]);
                foreach (var c in content[indent..]) Key(c.ToString());
            }
        }

        return keys.Take(count).ToList();
    }

    /// <summary>Digits typed into the lengths of the motors after line <paramref name="from"/>, each taken out again by the next keystroke.</summary>
    private static List<TextDocumentContentChangeEvent> ValueKeystrokes(string[] lines, int from, int count)
    {
        var lengthLines = QuickTiming.LengthLines(lines).Where(l => l > from).ToArray();
        var keys = new List<TextDocumentContentChangeEvent>();
        for (var i = 0; keys.Count < count; i++)
        {
            var at = new Position(lengthLines[i / 2 % lengthLines.Length], QuickTiming.LengthPrefix.Length);
            keys.Add(i % 2 == 0
                ? new TextDocumentContentChangeEvent(new Server.Protocol.Range(at, at), ((i / 2) % 9 + 1).ToString(CultureInfo.InvariantCulture))
                : new TextDocumentContentChangeEvent(new Server.Protocol.Range(at, at with { Character = at.Character + 1 }), ""));
        }

        return keys;
    }

    private static int BlankBefore(string[] lines, int from)
    {
        for (var i = from; i < lines.Length - 1; i++)
        {
            if (lines[i].Trim().Length == 0 && lines[i + 1].TrimStart().StartsWith("motor ", StringComparison.Ordinal)) return i;
        }

        throw new InvalidOperationException("no blank line before a motor");
    }

    private static string Percentiles(List<double> ms)
    {
        var sorted = ms.Order().ToList();
        return $"median {sorted[sorted.Count / 2]:0} ms, p95 {sorted[(int)Math.Ceiling(sorted.Count * 0.95) - 1]:0} ms, max {sorted[^1]:0} ms";
    }

    private static async Task Stop(LspClient client, Process process)
    {
        await client.Request<object?>("shutdown", null);
        await client.Notify("exit");
        await process.WaitForExitAsync();
    }

    /// <summary>The process's resident set and its private part, read from /proc.</summary>
    private static class Memory
    {
        public static (long Resident, long Private) Read(int pid)
        {
            try
            {
                var status = File.ReadAllLines($"/proc/{pid}/status");
                long Field(string name) => long.Parse(status.First(l => l.StartsWith(name + ":", StringComparison.Ordinal)).Split(':')[1].Trim().Split(' ')[0], CultureInfo.InvariantCulture) * 1024;
                return (Field("VmRSS"), Field("RssAnon"));
            }
            catch (IOException)
            {
                return (0, 0);
            }
        }

        /// <summary>Reads the memory every few milliseconds on its own thread and keeps the highest figures.</summary>
        public sealed class Sampler : IDisposable
        {
            private readonly Thread _thread;
            private volatile bool _stop;
            private (long Resident, long Private) _peak;

            public Sampler(int pid)
            {
                _thread = new Thread(() =>
                {
                    while (!_stop)
                    {
                        var now = Read(pid);
                        _peak = (Math.Max(_peak.Resident, now.Resident), Math.Max(_peak.Private, now.Private));
                        Thread.Sleep(5);
                    }
                }) { IsBackground = true };
                _thread.Start();
            }

            public (long Resident, long Private) Stop()
            {
                _stop = true;
                _thread.Join();
                return _peak;
            }

            public void Dispose() => Stop();
        }
    }
}
