using System.Text.Json;
using System.Text.Json.Nodes;
using Json.Schema;

namespace MotorLang.Cli.Tests;

/// <summary>The real executable: exit codes, every output format, atomic writes, and diff between git revisions.</summary>
public sealed class ExecutableTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-exe-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static string Example(string name) => Path.Combine(Executable.RepoRoot, "examples", name);

    // A schema is registered globally by its $id when read, and may be read only once per process (see Schemas).
    internal static void AssertValid(string schemaPath, string json)
    {
        var schema = Schemas.Load(schemaPath);
        using var doc = JsonDocument.Parse(json);
        var result = schema.Evaluate(doc.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List, RequireFormatValidation = true });
        Assert.True(result.IsValid, string.Join("\n", (result.Details ?? []).Where(d => d.Errors is not null)
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"))));
    }

    [Fact]
    public void ExitCodesAreZeroOneAndTwo()
    {
        Assert.Equal(0, Executable.Run(_dir, "check", Example("dairy-bottling.motors")).Code);
        Assert.Equal(1, Executable.Run(_dir, "check", Example("cabinet-shop.motors")).Code);
        var missing = Executable.Run(_dir, "check", "nowhere.motors");
        Assert.Equal(2, missing.Code);
        Assert.DoesNotContain("Exception", missing.Err);
        Assert.Equal(2, Executable.Run(_dir, "check", "--format", "xml", Example("dairy-bottling.motors")).Code);
    }

    [Fact]
    public void JsonOutputMatchesItsSchema()
    {
        var (code, json, _) = Executable.Run(_dir, "check", "--format", "json", Example("cabinet-shop.motors"), Example("dairy-bottling.motors"));
        Assert.Equal(1, code);
        AssertValid(Path.Combine(Executable.RepoRoot, "docs", "schemas", "check-report.schema.json"), json);
        var report = JsonNode.Parse(json)!;
        Assert.Equal(7, (int)report["summary"]!["errors"]!);
        Assert.Equal("M107", (string)report["files"]![0]!["findings"]![0]!["code"]!);
    }

    [Fact]
    public void SarifOutputHasThe210Shape()
    {
        var (_, sarif, _) = Executable.Run(_dir, "check", "--format", "sarif", Example("cabinet-shop.motors"));
        AssertValid(Path.Combine(AppContext.BaseDirectory, "Schemas", "sarif-2.1.0-subset.schema.json"), sarif);
        var run = JsonNode.Parse(sarif)!["runs"]![0]!;
        var first = run["results"]![0]!;
        Assert.Equal("error", (string)first["level"]!);
        Assert.Equal(11, (int)first["locations"]![0]!["physicalLocation"]!["region"]!["startLine"]!);
        Assert.Contains(run["tool"]!["driver"]!["rules"]!.AsArray(), r => (string)r!["id"]! == (string)first["ruleId"]!);
    }

    [Theory]
    [InlineData("csv", "File,Line,Feeder,Tag,Description,Quantity,Power,Power unit,Volts (V)")]
    [InlineData("markdown", "| Feeder | Tag | Description |")]
    [InlineData("table", "Max protection")]
    [InlineData("json", "\"motors\"")]
    public void ScheduleFormats(string format, string expected)
    {
        var (code, output, _) = Executable.Run(_dir, "schedule", "--format", format, Example("dairy-bottling.motors"));
        Assert.Equal(0, code);
        Assert.Contains(expected, output);
        Assert.Contains("P-101", output);
    }

    [Fact]
    public void ScheduleJsonOfCompressorsMatchesItsSchema()
    {
        var (code, json, _) = Executable.Run(_dir, "schedule", "--format", "json", Example("cold-storage.motors"));
        Assert.Equal(0, code);
        AssertValid(Path.Combine(Executable.RepoRoot, "docs", "schemas", "schedule.schema.json"), json);
        var rtu = JsonNode.Parse(json)!["motors"]!.AsArray().Single(r => (string)r!["tag"]! == "RTU-1")!;
        Assert.Equal("compressor", (string)rtu["kind"]!);
        Assert.Equal(50m, (decimal)rtu["markedMaximumProtection"]!["value"]!);
        // NFPA 70-2023 440.4(B): the marked maximum is the maximum protection of marked equipment.
        Assert.Equal(50m, (decimal)rtu["maximumProtection"]!["value"]!);
        Assert.Contains(rtu["rulesApplied"]!.AsArray(), r => (string)r!["rule"]! == "440.12(A)(2)");
    }

    [Fact]
    public void ScheduleJsonMatchesItsSchemaAndSaysWhatIsNotChecked()
    {
        var (code, json, _) = Executable.Run(_dir, "schedule", "--format", "json", Example("dairy-bottling.motors"));
        Assert.Equal(0, code);
        AssertValid(Path.Combine(Executable.RepoRoot, "docs", "schemas", "schedule.schema.json"), json);
        var rows = JsonNode.Parse(json)!["motors"]!.AsArray();
        string[] Rules(JsonNode row, string list) => row[list]!.AsArray().Select(i => (string)i!["rule"]!).ToArray();
        // P-101 is a 15 hp motor across the line, H-201 runs on a drive (starting drive 62A).
        var p101 = rows.Single(r => (string)r!["tag"]! == "P-101")!;
        var h201 = rows.Single(r => (string)r!["tag"]! == "H-201")!;
        // Conductors at 125 % of FLC (NFPA 70-2023 430.22); on the drive, 125 % of its rated input (430.122(A)).
        Assert.Contains("430.22", Rules(p101, "rulesApplied"));
        Assert.Contains("430.122(A)", Rules(h201, "rulesApplied"));
        // Short-circuit current ratings (110.10) are never checked; drive overtemperature (430.126) only concerns the drive.
        Assert.Contains("110.10, 409.22, 430.8", Rules(p101, "notChecked"));
        Assert.Contains("430.126", Rules(h201, "notChecked"));
        Assert.DoesNotContain("430.126", Rules(p101, "notChecked"));
        var feeder = JsonNode.Parse(json)!["feeders"]![0]!;
        Assert.Contains("430.24", Rules(feeder, "rulesApplied"));
        Assert.Contains("240.21(B)", Rules(feeder, "notChecked"));
    }

    [Fact]
    public void SizeWritesAtomicallyAndDryRunPrintsADiff()
    {
        var path = Path.Combine(_dir, "shop.motors");
        File.Copy(Example("cabinet-shop.motors"), path);
        var before = File.ReadAllText(path);
        var dry = Executable.Run(_dir, "size", "--dry-run", path);
        Assert.Equal(1, dry.Code); // it would change something
        Assert.Contains("-    wire 14 AWG", dry.Out);
        Assert.Contains("+    wire 10 AWG", dry.Out);
        Assert.Equal(before, File.ReadAllText(path));

        Assert.Equal(0, Executable.Run(_dir, "size", path).Code);
        Assert.Empty(Directory.GetFiles(_dir, "*.tmp"));
        var check = Executable.Run(_dir, "check", path);
        Assert.DoesNotContain("M101", check.Out);
        Assert.DoesNotContain("M102", check.Out);
        Assert.Contains("# too small for 16.7 A FLC at 125 %", File.ReadAllText(path)); // comments survive
    }

    [Fact]
    public void DiffComparesTwoGitRevisionsByTag()
    {
        Executable.Git(_dir, "init", "-q");
        var path = Path.Combine(_dir, "plant.motors");
        File.WriteAllText(path, "feeder MCC 480V 3ph\n  motor P-301 \"Pump\" 15hp\n    design B\n    wire 10 AWG\n  motor P-302 5hp\n");
        Executable.Git(_dir, "add", "plant.motors");
        Executable.Git(_dir, "commit", "-q", "-m", "first");
        File.WriteAllText(path, "feeder MCC 480V 3ph\n  motor P-301 \"Pump\" 30hp\n    design B\n    wire 10 AWG\n  motor P-303 5hp\n");
        Executable.Git(_dir, "commit", "-q", "-am", "second");

        var (code, output, err) = Executable.Run(_dir, "diff", "HEAD~1:plant.motors", "HEAD:plant.motors");
        Assert.True(code == 0, err);
        var lines = output.Trim().Split('\n');
        // 30 hp 480 V: 40 A (Table 430.250) x 125 % = 50 A -> 8 AWG at 75 C (design B); 15 hp: 21 A -> 26.25 A -> 10 AWG.
        Assert.Contains(lines, l => l.StartsWith("~ motor P-301: power 15hp → 30hp") && l.Contains("minimum wire 10 AWG → 8 AWG") && l.Contains("now: M101"));
        Assert.Contains(lines, l => l.StartsWith("+ motor P-303 added"));
        Assert.Contains("- motor P-302 removed", lines);

        var bad = Executable.Run(_dir, "diff", "HEAD~9:plant.motors", "HEAD:plant.motors");
        Assert.Equal(2, bad.Code);
        Assert.Contains("git cannot show", bad.Err);
    }

    [Fact]
    public void PlantScheduleJsonNamesEachRowsOwnFileAndLine()
    {
        var folder = Example("harbor-cannery");
        var (code, json, err) = Executable.Run(_dir, "schedule", folder, "--format", "json");
        Assert.True(code == 1, err); // the example's planted duplicate tag is an error
        AssertValid(Path.Combine(Executable.RepoRoot, "docs", "schemas", "schedule.schema.json"), json);
        var rows = JsonNode.Parse(json)!["motors"]!.AsArray().Concat(JsonNode.Parse(json)!["feeders"]!.AsArray()).ToList();
        Assert.True(rows.Count >= 8, $"{rows.Count} rows");
        foreach (var row in rows)
        {
            // Each row's file and line hold the header that writes its tag.
            var text = File.ReadAllLines((string)row!["file"]!)[(int)row["line"]! - 1];
            Assert.Matches($@"^\s*(feeder|motor|compressor)\s+{System.Text.RegularExpressions.Regex.Escape((string)row["tag"]!)}\b", text);
        }

        Assert.Equal(Directory.GetFiles(folder, "*.motors").Length - 1, // the switchboard file holds no motors
            rows.Where(r => r!["feeder"] is not null).Select(r => (string)r!["file"]!).Distinct().Count());
        var csv = Executable.Run(_dir, "schedule", folder, "--format", "csv", "--table", "feeders");
        Assert.Contains("switchboard.motors", csv.Out);
    }

    [Fact]
    public void DiffJsonOfAListAndOfAPlantMatchesItsSchema()
    {
        var schema = Path.Combine(Executable.RepoRoot, "docs", "schemas", "diff.schema.json");
        var before = Path.Combine(_dir, "before.motors");
        var after = Path.Combine(_dir, "after.motors");
        File.WriteAllText(before, "feeder MCC 480V 3ph\n  motor P-301 15hp\n    wire 10 AWG\n  motor P-302 5hp\n");
        File.WriteAllText(after, "feeder MCC 480V 3ph\n  motor P-301 30hp\n    wire 10 AWG\n  motor P-303 5hp\n");
        var (_, json, err) = Executable.Run(_dir, "diff", before, after, "--format", "json");
        AssertValid(schema, json);
        var changes = JsonNode.Parse(json)!.AsArray();
        // Change kinds are words; 30 hp 480 V is 40 A (NFPA 70-2023 Table 430.250), 15 hp 21 A.
        var byTag = changes.ToDictionary(c => (string)c!["tag"]!, c => c!);
        Assert.Equal(("changed", "changed", "added", "removed"),
            ((string)byTag["MCC"]["change"]!, (string)byTag["P-301"]["change"]!, (string)byTag["P-303"]["change"]!, (string)byTag["P-302"]["change"]!));
        Assert.Contains(byTag["P-301"]["results"]!.AsArray(), r => (string)r!["quantity"]! == "FLC" && (string)r["old"]! == "21 A" && (string)r["new"]! == "40 A");

        // A plant against itself at HEAD: the object form, no changes.
        var plant = Path.Combine(_dir, "plant");
        Directory.CreateDirectory(plant);
        File.WriteAllText(Path.Combine(plant, "swbd.motors"), "project \"P\"\n  plant\nfeeder SWBD 480V 3ph\n");
        File.WriteAllText(Path.Combine(plant, "mcc.motors"), "feeder MCC 480V 3ph\n  from SWBD\n  motor M-1 10hp\n");
        Executable.Git(plant, "init", "-q");
        Executable.Git(plant, "add", ".");
        Executable.Git(plant, "commit", "-q", "-m", "first");
        File.WriteAllText(Path.Combine(plant, "mcc.motors"), "feeder MCC 480V 3ph\n  from SWBD\n  motor M-1 20hp\n");
        var plantDiff = Executable.Run(plant, "diff", "HEAD", ".", "--format", "json");
        Assert.True(plantDiff.Out.Length > 0, plantDiff.Err + err);
        AssertValid(schema, plantDiff.Out);
        var records = JsonNode.Parse(plantDiff.Out)!["records"]!.AsArray();
        Assert.Contains(records, r => (string)r!["file"]! == "mcc.motors" && (string)r["change"]!["tag"]! == "M-1" && (string)r["change"]!["change"]! == "changed");
    }
}
