using System.Diagnostics;
using System.Text.Json;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>
/// One engine, two front ends: the real server process and the real `motorlang check --format json`
/// give every file of a plant the same findings (code, range, message), whichever of its files are
/// open; an edit in one file of the plant changes the diagnostics of another it did not open.
/// </summary>
public sealed class PlantEndToEndTests : IDisposable
{
    private readonly string _dir;

    public PlantEndToEndTests()
    {
        // A copy of the example plant in a folder of its own, so that edits written to disk stay in the test.
        _dir = Directory.CreateTempSubdirectory("motorlang-plant-e2e-").FullName;
        foreach (var f in Directory.GetFiles(Path.Combine(Fixture.Root, "examples", "harbor-cannery"), "*.motors"))
            File.Copy(f, Path.Combine(_dir, Path.GetFileName(f)));
    }

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string[] Files => Directory.GetFiles(_dir, "*.motors").Order(StringComparer.Ordinal).ToArray();

    private static string UriOf(string path) => new Uri(path).AbsoluteUri;

    [Fact]
    public async Task TheExamplePlantInTheEditorEqualsCheckWithOneFileOpenAndWithAll()
    {
        var expected = Check(_dir);
        Assert.Equal(4, expected.Count);
        Assert.Contains(expected.Values, f => f.Any(x => x.Code == "P030"));

        await using var server = ServerProcess.Start();
        var client = server.Client;
        await client.InitializeAsync();
        var mcc1 = Path.Combine(_dir, "mcc-1-retort.motors");
        await client.Open(UriOf(mcc1), File.ReadAllText(mcc1));
        await client.DiagnosticsAsync(UriOf(mcc1), 1);
        // Every file of the plant is published, the three closed ones too.
        Assert.Equal(Dump(expected), Dump(await Published(client, Files)));

        foreach (var f in Files.Where(f => f != mcc1)) await client.Open(UriOf(f), File.ReadAllText(f));
        foreach (var f in Files) await client.DiagnosticsAsync(UriOf(f), 1);
        Assert.Equal(Dump(expected), Dump(await Published(client, Files)));
    }

    [Fact]
    public async Task AnEditInAnMccFileUpdatesTheSwitchboardItDidNotOpenAsCheckSeesIt()
    {
        await using var server = ServerProcess.Start();
        var client = server.Client;
        await client.InitializeAsync();
        var mcc1 = Path.Combine(_dir, "mcc-1-retort.motors");
        var switchboard = UriOf(Path.Combine(_dir, "switchboard.motors"));
        var text = File.ReadAllText(mcc1);
        await client.Open(UriOf(mcc1), text);
        await client.DiagnosticsAsync(UriOf(mcc1), 1);
        Assert.Empty((await client.DiagnosticsAsync(switchboard)).Diagnostics);

        // P-101 from 20 hp to 500 hp, typed in the buffer only: the switchboard's feeder now carries far more.
        var line = text.Split('\n').ToList().FindIndex(l => l.Contains("motor P-101", StringComparison.Ordinal));
        var column = text.Split('\n')[line].IndexOf("20hp", StringComparison.Ordinal);
        await client.Change(UriOf(mcc1), 2, new TextDocumentContentChangeEvent(new Protocol.Range(new Position(line, column), new Position(line, column + 2)), "500"));
        await client.DiagnosticsAsync(UriOf(mcc1), 2);
        var after = await client.DiagnosticsWhere(switchboard, p => p.Diagnostics.Length > 0, TimeSpan.FromSeconds(30));
        Assert.Null(after.Version);

        // The same edit saved: check sees exactly what the editor showed, in every file.
        File.WriteAllText(mcc1, text.Replace("P-101 \"Retort water circulation pump\" 20hp", "P-101 \"Retort water circulation pump\" 500hp"));
        var expected = Check(_dir);
        Assert.NotEmpty(expected["switchboard.motors"]);
        Assert.Equal(Dump(expected), Dump(await Published(client, Files)));

        // Closing the only open file: the plant has no open file left, so its diagnostics are cleared.
        await client.Notify("textDocument/didClose", new DidCloseTextDocumentParams(new TextDocumentIdentifier(UriOf(mcc1))));
        foreach (var f in Files) await client.DiagnosticsWhere(UriOf(f), p => p.Diagnostics.Length == 0 && p.Version is null);
    }

    [Fact]
    public async Task AFileWithNoPlantAroundItIsAnalysedOnItsOwn()
    {
        var alone = Directory.CreateTempSubdirectory("motorlang-alone-").FullName;
        try
        {
            var file = Path.Combine(alone, "alone.motors");
            // 'from' names a feeder of no file: on its own the list says so (P012-style unresolved reference).
            File.WriteAllText(file, "feeder MCC-9 480V 3ph\n  from SWBD-1\n");
            File.WriteAllText(Path.Combine(alone, "other.motors"), "feeder SWBD-1 480V 3ph\n");
            var expected = Check(alone);
            await using var server = ServerProcess.Start();
            await server.Client.InitializeAsync();
            await server.Client.Open(UriOf(file), File.ReadAllText(file));
            var published = await server.Client.DiagnosticsAsync(UriOf(file), 1);
            Assert.Equal(expected["alone.motors"].Select(k => k.ToString()), Keys(published).Select(k => k.ToString()));
            Assert.NotEmpty(expected["alone.motors"]);
        }
        finally
        {
            Directory.Delete(alone, recursive: true);
        }
    }

    private static string Dump(SortedDictionary<string, List<Key>> files) =>
        string.Join("\n", files.SelectMany(f => f.Value.Select(k => $"{f.Key}: {k}").Prepend($"{f.Key} ({f.Value.Count})")));

    private static async Task<SortedDictionary<string, List<Key>>> Published(LspClient client, IEnumerable<string> files)
    {
        var result = new SortedDictionary<string, List<Key>>(StringComparer.Ordinal);
        foreach (var f in files) result[Path.GetFileName(f)] = Keys(await client.DiagnosticsAsync(UriOf(f)));
        return result;
    }

    private static List<Key> Keys(PublishDiagnosticsParams p) =>
        p.Diagnostics.Select(d => new Key(d.Code, d.Range.Start.Line, d.Range.Start.Character, d.Range.End.Line, d.Range.End.Character, d.Message)).ToList();

    /// <summary>`motorlang check --format json` run in <paramref name="dir"/>: each file's findings, by file name.</summary>
    private static SortedDictionary<string, List<Key>> Check(string dir)
    {
        var dll = Path.Combine(AppContext.BaseDirectory, "motorlang.dll");
        var info = new ProcessStartInfo("dotnet", ["exec", dll, "check", "--format", "json", "."])
        {
            WorkingDirectory = dir, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        using var process = Process.Start(info)!;
        var stderr = process.StandardError.ReadToEndAsync();
        var json = JsonDocument.Parse(process.StandardOutput.ReadToEnd());
        process.WaitForExit();
        Assert.True(process.ExitCode is 0 or 1, stderr.Result);
        var result = new SortedDictionary<string, List<Key>>(StringComparer.Ordinal);
        foreach (var file in json.RootElement.GetProperty("files").EnumerateArray())
        {
            result[Path.GetFileName(file.GetProperty("path").GetString()!)] = file.GetProperty("findings").EnumerateArray().Select(f =>
            {
                var r = f.GetProperty("range");
                // check's JSON counts lines and columns from 1, the protocol from 0.
                return new Key(f.GetProperty("code").GetString()!, r.GetProperty("startLine").GetInt32() - 1, r.GetProperty("startColumn").GetInt32() - 1,
                    r.GetProperty("endLine").GetInt32() - 1, r.GetProperty("endColumn").GetInt32() - 1, f.GetProperty("message").GetString()!);
            }).ToList();
        }

        return result;
    }

    private sealed record Key(string Code, int StartLine, int StartColumn, int EndLine, int EndColumn, string Message);
}
