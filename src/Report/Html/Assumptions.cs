using MotorLang.Analysis;
using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Resolution;
using MotorLang.Domain;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Sizing.Tables;

namespace MotorLang.Report.Html;

/// <summary>
/// The sheets after the calculations: the installation settings and readings every result rests on,
/// what MotorLang does not check, and the tool version, table sources and cautions.
/// </summary>
public static class Assumptions
{
    public static string Describe(Settings s) =>
        $"{(s.Material == ConductorMaterial.Copper ? "copper" : "aluminum")} {s.Insulation} {s.InsulationRating} °C"
        + (s.TerminationRating is { } t ? $", {t} °C terminations" : "")
        + $", {Format.Number(s.AmbientCelsius)} °C ambient, {s.CurrentCarrying} current-carrying conductors, {s.Raceway.ToString().ToUpperInvariant()}"
        + $", drop limits {Format.Percent(s.BranchDropLimit)} branch / {Format.Percent(s.TotalDropLimit)} total, power factor {Format.Number(s.PowerFactor)}";

    private static readonly (string Keyword, string What)[] SettingLines =
    [
        ("code", "code edition"), ("ambient", "ambient temperature"), ("conductor", "conductor material, insulation, terminations"),
        ("raceway", "raceway"), ("ccc", "current-carrying conductors"), ("drop-limit", "voltage-drop limits"), ("power-factor", "power factor"),
    ];

    public static void WriteAssumptions(Page page, AnalysisResult analysis, SheetTitle block)
    {
        var model = analysis.Parse.Model;
        page.SheetStart("assumptions", "Assumptions and readings used", block);
        page.El("h3", "Installation settings");
        page.Open("table", "class=\"plain\"").Open("thead").Open("tr").El("th", "Where").El("th", "Settings in force").El("th", "Written there").Close("tr").Close("thead").Open("tbody");
        BlockNode? project = model.Project;
        if (project is not null) SettingsRow(page, "project", project, model);
        else page.Open("tr").El("td", "project").El("td", Describe(Settings.Defaults)).El("td", "nothing: every setting is MotorLang's default").Close("tr");
        foreach (var f in model.Feeders.Where(Settings.HasOwn)) SettingsRow(page, $"feeder {f.Tag?.Value}", f, model);
        foreach (var m in model.Motors.Where(Settings.HasOwn)) SettingsRow(page, $"motor {m.Tag?.Value}", m, model);
        page.Close("tbody").Close("table");
        page.El("p", "Where nothing is written MotorLang uses " + Describe(Settings.Defaults) + ".", "class=\"note\"");

        page.El("h3", "Readings taken where the code can be read more than one way");
        var readings = ConservativeReadings(analysis);
        if (readings.Count == 0) page.El("p", "None of the calculations in this list needed one.");
        else
        {
            page.Open("table", "class=\"plain\"").Open("thead").Open("tr").El("th", "Rule").El("th", "Reading").El("th", "Circuits").Close("tr").Close("thead").Open("tbody");
            foreach (var r in readings) page.Open("tr").El("td", r.Rule, "class=\"rule\"").El("td", r.Note).El("td", string.Join(", ", r.Circuits)).Close("tr");
            page.Close("tbody").Close("table");
        }

        page.El("p", "docs/checks.md states each reading MotorLang takes and why; the calculation sheets show each where it was used.", "class=\"note\"");
        page.SheetEnd();
    }

    private static void SettingsRow(Page page, string where, BlockNode block, MotorList model)
    {
        var written = SettingLines.Where(s => block.Has(s.Keyword)).Select(s => s.What).ToList();
        page.Open("tr").El("td", where).El("td", Describe(Settings.For(block, model)))
            .El("td", written.Count == 0 ? "nothing (defaults)" : string.Join(", ", written)).Close("tr");
    }

    /// <summary>Steps that state a conservative reading, once each, with the circuits they were taken on.</summary>
    private static List<(string Rule, string Note, List<string> Circuits)> ConservativeReadings(AnalysisResult analysis)
    {
        var found = new Dictionary<(string, string), List<string>>();
        void Add(string tag, IEnumerable<BreakdownSection> sections)
        {
            foreach (var step in sections.SelectMany(s => s.Steps))
            {
                if (!step.Note.Contains("conservative", StringComparison.OrdinalIgnoreCase) && !step.Value.Contains("conservative", StringComparison.OrdinalIgnoreCase)) continue;
                var key = (step.Rule, step.Note);
                if (!found.TryGetValue(key, out var tags)) found[key] = tags = [];
                if (!tags.Contains(tag)) tags.Add(tag);
            }
        }

        foreach (var m in analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index)) Add(m.Tag, Breakdown.MotorSections(m));
        foreach (var f in analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index)) Add(f.Tag, Breakdown.FeederSections(f));
        return found.Select(p => (p.Key.Item1, p.Key.Item2, p.Value)).ToList();
    }

    public static void WriteNotChecked(Page page, AnalysisResult analysis, SheetTitle block)
    {
        page.SheetStart("not-checked", "What was not checked", block);
        page.El("p", "These rules bear on the circuits of this list but MotorLang does not check them. The engineer of record must.", "class=\"lead\"");
        page.Open("table", "class=\"plain\"").Open("thead").Open("tr").El("th", "Rule").El("th", "What").El("th", "Why not").El("th", "Circuits").Close("tr").Close("thead").Open("tbody");
        var motors = analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index).Select(m => (m.Tag, Rules: NotChecked.For(m, analysis.Power))).ToList();
        var feeders = analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index).Select(f => (f.Tag, Rules: NotChecked.For(f, analysis.Power))).ToList();
        foreach (var rule in NotChecked.All)
        {
            var circuits = motors.Concat(feeders).Where(c => c.Rules.Contains(rule)).Select(c => c.Tag).ToList();
            if (circuits.Count == 0) continue;
            var all = circuits.Count == motors.Count + feeders.Count ? "all" : string.Join(", ", circuits);
            page.Open("tr").El("td", rule.Rule, "class=\"rule\"").El("td", rule.Text).El("td", rule.Reason).El("td", all).Close("tr");
        }

        page.Close("tbody").Close("table");
        page.SheetEnd();
    }

    public static void WriteSources(Page page, SheetTitle block)
    {
        page.SheetStart("sources", "Tool, tables and cautions", block);
        page.El("h3", "Cautions");
        foreach (var c in Cautions) page.El("p", c, "class=\"caution\"");
        page.El("h3", "Tool");
        page.El("p", $"MotorLang {block.ToolVersion}; code: NFPA 70-2023 (National Electrical Code), Article 430 with Articles 240, 250, 310 and 695 where they bear on motor circuits.");
        page.El("h3", "Code tables used");
        page.Open("table", "class=\"plain\"").Open("thead").Open("tr").El("th", "Table data").El("th", "Source as recorded with the data").Close("tr").Close("thead").Open("tbody");
        foreach (var t in CodeTables.All) page.Open("tr").El("td", t.Name).El("td", t.Source).Close("tr");
        page.Close("tbody").Close("table");
        page.SheetEnd();
    }

    /// <summary>The cautions printed with every report (the same as the README's).</summary>
    public static readonly string[] Cautions =
    [
        "MotorLang is an aid to, not a substitute for, engineering judgement. Every result must be checked by a qualified person before it is used for design, purchasing or installation.",
        "Local amendments to the NEC and the authority having jurisdiction govern; where they differ from what MotorLang computes, they win.",
        "Manufacturers' instructions and listings (110.3(B)) may set tighter limits than the code tables.",
        "Nothing here replaces licensed professional practice or the engineer of record's seal.",
    ];
}
