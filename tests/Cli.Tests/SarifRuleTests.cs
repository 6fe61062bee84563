using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using MotorLang.Analysis.Findings;
using MotorLang.Cli.Output;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Text;

namespace MotorLang.Cli.Tests;

/// <summary>SARIF rule metadata: texts from the docs' own rows, help links to sections that exist, the real version.</summary>
public sealed class SarifRuleTests
{
    private static string Example(string name) => Path.Combine(Executable.RepoRoot, "examples", name);

    private static string[] DocLines(string name) => File.ReadAllLines(Path.Combine(Executable.RepoRoot, "docs", name));

    /// <summary>The anchors GitHub makes for a file's headings, computed here apart from the tool's own code.</summary>
    private static HashSet<string> Anchors(string name) =>
        DocLines(name).Where(l => Regex.IsMatch(l, "^#{1,6} "))
            .Select(l => Regex.Replace(l.TrimStart('#').Trim().ToLowerInvariant(), @"[^\p{L}\p{Nd} _-]", "").Replace(' ', '-'))
            .ToHashSet();

    private static JsonObject RunSarif(string file)
    {
        var stdout = new StringWriter();
        CommandLine.Run(["check", "--format", "sarif", file], stdout, new StringWriter());
        ExecutableTests.AssertValid(Path.Combine(AppContext.BaseDirectory, "Schemas", "sarif-2.1.0-subset.schema.json"), stdout.ToString());
        return JsonNode.Parse(stdout.ToString())!.AsObject();
    }

    [Fact]
    public void EveryCodesHelpPointsAtASectionThatExists()
    {
        var anchors = new Dictionary<string, HashSet<string>> { ["docs/checks.md"] = Anchors("checks.md"), ["docs/format.md"] = Anchors("format.md") };
        Assert.True(CodeDocs.Entries.Count > 60, "the docs tables were not read");
        foreach (var entry in CodeDocs.Entries)
        {
            var path = SarifReport.HelpPath(entry);
            var (file, anchor) = (path.Split('#')[0], path.Split('#')[1]);
            Assert.True(anchors[file].Contains(anchor), $"{entry.Code}: {path} names no heading of {file}");
        }

        Assert.Equal("docs/checks.md#checks", SarifReport.HelpPath(CodeDocs.Find("M103")!));
        Assert.Equal("docs/format.md#diagnostics", SarifReport.HelpPath(CodeDocs.Find("P005")!));
    }

    [Fact]
    public void RulesCarryTheDocsRowAsDescriptionAndHelp()
    {
        var rules = RunSarif(Example("cabinet-shop.motors"))["runs"]![0]!["tool"]!["driver"]!["rules"]!.AsArray();
        Assert.NotEmpty(rules);
        var doc = DocLines("checks.md");
        foreach (var rule in rules)
        {
            var id = (string)rule!["id"]!;
            var row = doc.Single(l => l.StartsWith($"| {id} |"));
            var cells = row.Split('|').Select(c => c.Trim()).ToArray();
            // | Code | Severity | Rule | What it means | Example | Fix |
            Assert.Equal(cells[4], (string)rule["fullDescription"]!["text"]!);
            var shortText = (string)rule["shortDescription"]!["text"]!;
            Assert.StartsWith(shortText, cells[4]);
            Assert.EndsWith(".", shortText);
            var help = (string)rule["help"]!["text"]!;
            Assert.Contains($"Rule: {cells[3]}", help);
            Assert.Contains("See docs/checks.md#checks.", help);
            // This build names no published docs, so no link is made up.
            Assert.Null(rule["helpUri"]);
        }
    }

    [Fact]
    public void ShortDescriptionIsTheFirstSentenceOnly()
    {
        // M111's meaning has two sentences: "... and no nameplate current is given. Nothing else on the motor is sized."
        var rule = Rules(Finding("M111"))[0]!;
        Assert.Equal(CodeDocs.Find("M111")!.Meaning.Split(". Nothing")[0] + ".", (string)rule["shortDescription"]!["text"]!);
    }

    [Fact]
    public void WithPublishedDocsEachRuleLinksItsSection()
    {
        var log = SarifReport.Write([("a.motors", [Finding("M205"), Finding("P006")])], "0.1.0", docsBase: new Uri("https://docs.example.org/motorlang/docs/"));
        ExecutableTests.AssertValid(Path.Combine(AppContext.BaseDirectory, "Schemas", "sarif-2.1.0-subset.schema.json"), log.ToJsonString());
        var rules = log["runs"]![0]!["tool"]!["driver"]!["rules"]!.AsArray();
        Assert.Equal("https://docs.example.org/motorlang/docs/checks.md#checks", (string)rules.Single(r => (string)r!["id"]! == "M205")!["helpUri"]!);
        Assert.Equal("https://docs.example.org/motorlang/docs/format.md#diagnostics", (string)rules.Single(r => (string)r!["id"]! == "P006")!["helpUri"]!);
    }

    [Fact]
    public void TheDriverCarriesTheProjectsVersion()
    {
        var props = File.ReadAllText(Path.Combine(Executable.RepoRoot, "Directory.Build.props"));
        var version = Regex.Match(props, "<Version>([^<]+)</Version>").Groups[1].Value;
        Assert.NotEmpty(version);
        var driver = RunSarif(Example("dairy-bottling.motors"))["runs"]![0]!["tool"]!["driver"]!;
        Assert.Equal(version, (string)driver["version"]!);
    }

    private static JsonArray Rules(Finding f) => SarifReport.Write([("a.motors", [f])], "0.1.0")["runs"]![0]!["tool"]!["driver"]!["rules"]!.AsArray();

    private static Finding Finding(string code) =>
        new(code, code[0] == 'P' ? Severity.Error : Severity.Warning, SourceRange.OnLine(0, 0, 1), "message");
}
