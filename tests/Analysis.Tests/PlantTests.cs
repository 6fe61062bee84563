using MotorLang.Analysis.Plant;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Tests;

/// <summary>The plant layer: files analysed together, each finding given back to its file.</summary>
public sealed class PlantTests
{
    private static readonly string Switchboard = AnalysisFixture.Text(
        "project \"P\"",
        "  plant",
        "feeder SWBD-1 480V 3ph",
        "  wire 14 AWG",
        "  protection inverse-time-breaker 15A");

    // Two 10 hp 460 V motors: 14 A each (NFPA 70-2023 Table 430.250, 460 V column).
    private static readonly string Mcc = AnalysisFixture.Text(
        "feeder MCC-1 480V 3ph",
        "  from SWBD-1",
        "  motor M-1 10hp",
        "    nameplate 13A",
        "  motor M-2 10hp",
        "    like M-1");

    private static PlantAnalysis Analyze(params (string Name, string Text)[] files) =>
        PlantAnalyzer.Analyze(files.Select(f => new PlantFile(f.Name, f.Text)).ToList());

    private static List<string> Codes(PlantAnalysis plant, string file) =>
        plant.FindingsOf(file).Select(f => $"{AnalysisFixture.Describe(f)}").ToList();

    [Fact]
    public void FromInAnotherFileResolvesAndItsMotorsCountInTheSupplyingFeeder()
    {
        // Alone, the MCC's 'from' names nothing and the switchboard sees no load.
        Assert.Contains(Analyzer.Analyze(Mcc).Findings, f => f.Code == "P014");
        Assert.DoesNotContain(Analyzer.Analyze(Switchboard).Findings, f => f.Code == "M107");

        var plant = Analyze(("swbd.motors", Switchboard), ("mcc.motors", Mcc));
        Assert.DoesNotContain(plant.FindingsOf("mcc.motors"), f => f.Code is "P014" or "P016");
        // hand calculation, NFPA 70-2023 430.24: 1.25 x 14 A + 14 A = 31.5 A, more than 14 AWG carries
        // (15 A under 240.4(D)): the switchboard feeder's wire, on line 4 of its own file.
        var wire = Assert.Single(plant.FindingsOf("swbd.motors"), f => f.Code == "M107");
        Assert.Equal(3, wire.Range.Start.Line);
        Assert.Contains("31.5", wire.Message);
    }

    [Fact]
    public void LikeInAnotherFileInheritsTheMotorsValues()
    {
        var other = AnalysisFixture.Text("feeder MCC-2 480V 3ph", "  from SWBD-1", "  motor M-3 10hp", "    like M-1");
        var plant = Analyze(("swbd.motors", Switchboard), ("mcc.motors", Mcc), ("mcc2.motors", other));
        Assert.DoesNotContain(plant.FindingsOf("mcc2.motors"), f => f.Code is "P014" or "M111");
        var m3 = plant.Joined!.Motors.Single(m => m.Key.Tag!.Value == "M-3").Value;
        Assert.Equal(plant.Joined.Motors.Single(m => m.Key.Tag!.Value == "M-1").Value.Findings.Length, m3.Findings.Length);
    }

    [Fact]
    public void ADuplicateTagAcrossFilesIsReportedInBothFiles()
    {
        var again = AnalysisFixture.Text("feeder MCC-2 480V 3ph", "  from SWBD-1", "  motor M-1 5hp");
        var plant = Analyze(("swbd.motors", Switchboard), ("mcc.motors", Mcc), ("z.motors", again));
        var second = Assert.Single(plant.FindingsOf("z.motors"), f => f.Code == "P013");
        Assert.Equal("3:9-3:12 P013", AnalysisFixture.Describe(second));
        Assert.Contains("line 3 of mcc.motors", second.Message);
        var first = Assert.Single(plant.FindingsOf("mcc.motors"), f => f.Code == PlantCodes.TagUsedInAnotherFile);
        Assert.Equal("3:9-3:12 P030", AnalysisFixture.Describe(first));
        Assert.Contains("line 3 of z.motors", first.Message);
    }

    [Fact]
    public void ACycleAcrossFilesIsOneDiagnosticNamingEachMembersFile()
    {
        var a = AnalysisFixture.Text("project \"P\"", "  plant", "feeder A 480V 3ph", "  from B");
        var b = AnalysisFixture.Text("feeder B 480V 3ph", "  from A");
        var plant = Analyze(("a.motors", a), ("b.motors", b));
        Assert.Equal(["4:8-4:9 P016"], Codes(plant, "a.motors").Where(c => c.EndsWith("P016")));
        Assert.EndsWith("A (line 3 of a.motors) → B (line 1 of b.motors) → A", Assert.Single(plant.FindingsOf("a.motors"), f => f.Code == "P016").Message);
        // B's file has no second P016: its feeder's sizing note points to the one diagnostic.
        Assert.DoesNotContain(plant.FindingsOf("b.motors"), f => f.Code == "P016");
        Assert.Contains(plant.FindingsOf("b.motors"), f => f.Code == "M204" && f.Message.Contains("P016"));
    }

    [Fact]
    public void AnUnresolvedFromIsReportedInTheFileThatWritesIt()
    {
        var b = AnalysisFixture.Text("# no such feeder", "feeder B 480V 3ph", "  from SWBD-9");
        var plant = Analyze(("swbd.motors", Switchboard), ("b.motors", b));
        Assert.Equal("3:8-3:14 P014", AnalysisFixture.Describe(Assert.Single(plant.FindingsOf("b.motors"), f => f.Code == "P014")));
        Assert.DoesNotContain(plant.FindingsOf("swbd.motors"), f => f.Code == "P014");
    }

    [Fact]
    public void ASecondProjectBlockNamesTheFileOfTheFirst()
    {
        var b = AnalysisFixture.Text("project \"Other\"", "feeder B 480V 3ph");
        var plant = Analyze(("swbd.motors", Switchboard), ("b.motors", b));
        var dup = Assert.Single(plant.FindingsOf("b.motors"), f => f.Code == "P020");
        Assert.Contains("line 1 of swbd.motors", dup.Message);
    }

    [Fact]
    public void AFileLeftOutIsReportedOnThePlantStatement()
    {
        var plant = PlantAnalyzer.Analyze([new PlantFile("swbd.motors", Switchboard)], [new PlantLeftOut("out.motors", "a symlink leading out of the plant's folder")]);
        var note = Assert.Single(plant.FindingsOf("swbd.motors"), f => f.Code == PlantCodes.FileLeftOut);
        Assert.Equal("2:3-2:8 P031", AnalysisFixture.Describe(note));
        Assert.Contains("out.motors", note.Message);
    }

    [Fact]
    public void AFileThatBeginsIndentedDoesNotJoinTheBlockBeforeIt()
    {
        // Alone, the indented motor has no feeder; in the plant it must not become MCC-1's.
        var stray = AnalysisFixture.Text("  motor X-1 5hp");
        var plant = Analyze(("swbd.motors", Switchboard), ("mcc.motors", Mcc), ("stray.motors", stray));
        Assert.DoesNotContain(plant.Joined!.Motors.Keys, m => m.Tag?.Value == "X-1");
        Assert.Equal(Analyzer.Analyze(stray).Findings.Select(AnalysisFixture.Describe), plant.FindingsOf("stray.motors").Select(AnalysisFixture.Describe));
    }

    [Fact]
    public void AnOpenMergeConflictEndsWithItsFile()
    {
        var conflict = AnalysisFixture.Text("<<<<<<< ours", "feeder Q 480V 3ph");
        var plant = Analyze(("swbd.motors", Switchboard), ("c.motors", conflict), ("mcc.motors", Mcc));
        Assert.DoesNotContain(plant.FindingsOf("mcc.motors"), f => f.Code == "P014");
        Assert.Contains(plant.Joined!.Model().Feeders, f => f.Tag?.Value == "MCC-1");
    }

    [Fact]
    public void OneFileAloneGivesExactlyTheFindingsOfTheFile()
    {
        var text = "\uFEFF" + AnalysisFixture.Text([.. AnalysisFixture.Base]).Replace("nameplate 13A", "nameplate 19A").TrimEnd('\n');
        var plant = Analyze(("one.motors", text));
        Assert.Equal(Analyzer.Analyze(text).Findings, plant.FindingsOf("one.motors"));
    }

    [Fact]
    public void SizingWritesEachFixIntoTheFileThatHoldsTheValue()
    {
        // The switchboard ends without a line break: an added line must go after its last line.
        var plant = Analyze(("swbd.motors", Switchboard.TrimEnd('\n')), ("mcc.motors", Mcc));
        var edits = plant.SizeEverything();
        Assert.Contains(edits, e => e.File == "swbd.motors" && e.Edit.Range.Start.Line == 3);
        foreach (var file in plant.Files)
        {
            var after = TextEdits.Apply(file.Text, edits.Where(e => e.File == file.Name).Select(e => e.Edit));
            Assert.DoesNotContain(Analyzer.Analyze(after).Parse.Diagnostics, d => d.Code is "P001" or "P005" or "P012");
        }

        var sized = Analyze([.. plant.Files.Select(f => (f.Name, TextEdits.Apply(f.Text, edits.Where(e => e.File == f.Name).Select(e => e.Edit))))]);
        Assert.DoesNotContain(sized.Findings, f => f.Finding.Code is "M107" or "M108");
    }
}

internal static class PlantTestExtensions
{
    public static MotorLang.Parser.Model.MotorList Model(this AnalysisResult r) => r.Parse.Model;
}
