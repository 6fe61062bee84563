using System.Text;

namespace MotorLang.Cli.Tests;

/// <summary>The commands, run in-process with captured output, on files in a temporary folder.</summary>
public sealed class CliTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-cli-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private string Write(string name, string text)
    {
        var path = Path.Combine(_dir, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void CheckReportsFileLineColumnSeverityCodeAndMessage()
    {
        var path = Write("a.motors", "feeder F 480V 3ph\n  lenght 10ft\n");
        var (code, output, _) = Run("check", path);
        Assert.Equal(1, code);
        Assert.Equal($"{path}:2:3: error P001: unknown keyword 'lenght'; did you mean 'length'?", output.Trim());
    }

    [Fact]
    public void CheckOfAnyFileOfAPlantChecksTheWholePlantAndNamesEachFile()
    {
        var plant = Path.Combine(_dir, "plant");
        Directory.CreateDirectory(Path.Combine(plant, "mcc"));
        File.WriteAllText(Path.Combine(plant, "swbd.motors"), "project \"P\"\n  plant\nfeeder SWBD-1 480V 3ph\n  wire 14 AWG\n");
        var mcc = Path.Combine(plant, "mcc", "mcc1.motors");
        // Two 10 hp 460 V motors, 14 A each (NFPA 70-2023 Table 430.250): hand calculation, 430.24,
        // 1.25 x 14 + 14 = 31.5 A, more than 14 AWG may carry.
        File.WriteAllText(mcc, "feeder MCC-1 480V 3ph\n  from SWBD-1\n  motor M-1 10hp\n  motor M-2 10hp\n  motor M-1 5hp\n");
        var (code, output, err) = Run("check", mcc);
        Assert.Equal(1, code);
        var lines = output.Trim().Split('\n');
        Assert.Contains(lines, l => l.StartsWith(Path.Combine(plant, "swbd.motors") + ":4:", StringComparison.Ordinal) && l.Contains("M107"));
        Assert.Contains(lines, l => l.StartsWith(mcc + ":5:9: error P013", StringComparison.Ordinal) && l.Contains("line 3 of mcc/mcc1.motors"));
        Assert.DoesNotContain(lines, l => l.Contains("P014"));
        Assert.Contains("2 files checked", err);
    }

    [Fact]
    public void SizeOfAFileOfAPlantWritesTheFixIntoTheFileThatHoldsTheValue()
    {
        var plant = Path.Combine(_dir, "sized");
        Directory.CreateDirectory(plant);
        var swbd = Path.Combine(plant, "swbd.motors");
        File.WriteAllText(swbd, "project \"P\"\n  plant\nfeeder SWBD-1 480V 3ph\n  wire 14 AWG\n");
        var mcc = Path.Combine(plant, "mcc1.motors");
        File.WriteAllText(mcc, "feeder MCC-1 480V 3ph\n  from SWBD-1\n  motor M-1 10hp\n  motor M-2 10hp\n");
        // Alone the switchboard has no load: nothing would tell it its wire is too small.
        var alone = Path.Combine(_dir, "alone.motors");
        File.Copy(swbd, alone);
        Assert.DoesNotContain("M107", Run("check", alone).Out);
        var (code, _, err) = Run("size", mcc);
        Assert.Equal(0, code);
        Assert.Contains("swbd.motors: sized", err);
        // hand calculation, NFPA 70-2023 430.24 with Table 430.250 (14 A at 460 V): 1.25 x 14 + 14 = 31.5 A;
        // 14 AWG is too small, and the wire written is no longer 14 AWG.
        Assert.DoesNotContain("wire 14 AWG", File.ReadAllText(swbd));
        Assert.DoesNotContain("M107", Run("check", mcc).Out);
    }

    [Fact]
    public void ScheduleOfAPlantPrintsEveryFileAndAPlantSummary()
    {
        var plant = Path.Combine(_dir, "sched");
        Directory.CreateDirectory(plant);
        File.WriteAllText(Path.Combine(plant, "swbd.motors"), "project \"P\"\n  plant\nfeeder SWBD-1 480V 3ph\n");
        File.WriteAllText(Path.Combine(plant, "mcc1.motors"), "feeder MCC-1 480V 3ph\n  from SWBD-1\n  motor M-1 10hp\n");
        File.WriteAllText(Path.Combine(plant, "mcc2.motors"), "feeder MCC-2 480V 3ph\n  from SWBD-1\n  motor M-2 10hp\n");
        var (_, output, _) = Run("schedule", "--format", "markdown", Path.Combine(plant, "mcc2.motors"));
        Assert.Equal(["swbd.motors", "mcc1.motors", "mcc2.motors"], output.Split('\n').Where(l => l.StartsWith("## ")).Select(l => l[3..]));
        Assert.Contains("3 files, 2 motors, 3 feeders", output);
        // The switchboard's totals count both MCCs: 10 hp at 460 V is 14 A (NFPA 70-2023 Table 430.250);
        // hand calculation, 430.24: 1.25 x 14 + 14 = 31.5 A required.
        Assert.Contains(output.Split('\n'), l => l.StartsWith("| SWBD-1 |") && l.Contains("31.5 A"));
        // The typed schedule of the plant: one table, each row under its file, the same 31.5 A.
        var (_, json, _) = Run("schedule", "--format", "json", Path.Combine(plant, "mcc2.motors"));
        var data = System.Text.Json.Nodes.JsonNode.Parse(json)!;
        Assert.Equal(["M-1", "M-2"], data["motors"]!.AsArray().Select(m => (string)m!["tag"]!));
        Assert.EndsWith("mcc2.motors", (string)data["motors"]![1]!["file"]!);
        var swbd = data["feeders"]!.AsArray().Single(f => (string)f!["tag"]! == "SWBD-1")!;
        Assert.Equal(31.5m, (decimal)swbd["requiredAmpacity"]!["value"]!);
        Assert.EndsWith("swbd.motors", (string)swbd["file"]!);
    }

    [Fact]
    public void CheckOfACleanFileExitsZero()
    {
        // Information findings (sizes not written yet) do not fail a check.
        var (code, output, err) = Run("check", Write("ok.motors", "feeder F 480V 3ph\n  motor M 5hp\n"));
        Assert.Equal(0, code);
        Assert.All(output.Trim().Split('\n'), line => Assert.DoesNotContain(": error ", line));
        Assert.Contains(": information M301: ", output);
        Assert.Contains("1 file checked: 0 errors", err);
    }

    [Fact]
    public void CheckShowsAtMostAThousandFindingsPerFileThenOneNote()
    {
        // 400 motors with only a horsepower: each gets M203/M204 and M301s, well over 1,000 findings.
        var text = "feeder F 480V 3ph\n" + string.Concat(Enumerable.Range(1, 400).Select(i => $"  motor M-{i} 5hp\n"));
        var path = Write("many.motors", text);
        var total = MotorLang.Analysis.Analyzer.Analyze(text).Findings.Length;
        Assert.True(total > 1001);

        var (code, output, err) = Run("check", path);
        var lines = output.Trim().Split('\n');
        Assert.Equal(1001, lines.Length);
        Assert.Contains($": information M310: {total - 1000} more findings not shown", lines[^1]);
        Assert.Equal(0, code);
        Assert.Contains("1 file checked: 0 errors, 400 warnings", err); // every motor's M204 counted, shown or not

        foreach (var format in new[] { "json", "sarif" })
        {
            var (_, report, _) = Run("check", "--format", format, path);
            var key = format == "json" ? "code" : "ruleId";
            Assert.Single(System.Text.RegularExpressions.Regex.Matches(report, $"\"{key}\":\\s*\"M310\""));
            Assert.Equal(1001, System.Text.RegularExpressions.Regex.Matches(report, $"\"{key}\":").Count);
        }
    }

    [Fact]
    public void MissingFilesAndEmptyFoldersAreUsageErrors()
    {
        var (code, _, err) = Run("check", Path.Combine(_dir, "nope.motors"));
        Assert.Equal(2, code);
        Assert.Contains("no such file or folder", err);
        Assert.DoesNotContain("   at ", err);

        var empty = Directory.CreateDirectory(Path.Combine(_dir, "empty")).FullName;
        Assert.Equal(2, Run("check", empty).Code);
    }

    [Fact]
    public void NonUtf8FilesAreRefusedWithAClearMessage()
    {
        var path = Path.Combine(_dir, "latin1.motors");
        File.WriteAllBytes(path, [.. Encoding.ASCII.GetBytes("project \"Caf"), 0xE9, .. Encoding.ASCII.GetBytes("\"\n")]);
        var (code, _, err) = Run("check", path);
        Assert.Equal(2, code);
        Assert.Contains("not UTF-8", err);
    }

    [Fact]
    public void UnknownOptionsAreUsageErrors()
    {
        Assert.Equal(2, Run("check", "--bogus").Code);
        Assert.Equal(2, Run("frobnicate").Code);
    }

    [Fact]
    public void FmtRewritesInPlaceAndKeepsTheBom()
    {
        var path = Path.Combine(_dir, "f.motors");
        File.WriteAllBytes(path, [0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes("FEEDER F 480v 3PH\r\n    motor M 5 hp # note\r\n")]);
        var (code, output, _) = Run("fmt", path);
        Assert.Equal(0, code);
        Assert.Contains("formatted", output);
        Assert.Equal([0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes("feeder F 480V 3ph\r\n  motor M 5hp    # note\r\n")], File.ReadAllBytes(path));
        Assert.Empty(Directory.GetFiles(_dir, "*.tmp"));
    }

    [Fact]
    public void FmtCheckChangesNothingAndExitsOneWhenAFileWouldChange()
    {
        var messy = Write("m.motors", "feeder F 480v 3ph\n");
        var tidy = Write("t.motors", "feeder F 480V 3ph\n");
        var (code, output, _) = Run("fmt", "--check", _dir);
        Assert.Equal(1, code);
        Assert.Equal($"{messy}: would be reformatted", output.Trim());
        Assert.Equal("feeder F 480v 3ph\n", File.ReadAllText(messy));
        Assert.Equal(0, Run("fmt", "--check", tidy).Code);
    }
}
