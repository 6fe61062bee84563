using MotorLang.Analysis;
using MotorLang.Analysis.Coverage;
using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Resolution;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Model;
using MotorLang.Sizing;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>
/// One sheet per motor and per feeder: what was read from the list, then every calculation step with
/// its value and rule (the same sections the editor's hover shows), the verdict on the written value,
/// the rules applied and those not checked, and the circuit's findings.
/// </summary>
public static class CalculationSheets
{
    public static void Write(Page page, AnalysisResult analysis, SheetTitle block, SourceLines lines)
    {
        var model = analysis.Parse.Model;
        // Findings by line, once: each sheet takes its circuit's lines from here, so the report stays linear in the list.
        var byLine = analysis.Findings.ToLookup(f => f.Range.Start.Line);
        foreach (var m in analysis.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index))
        {
            page.SheetStart(SheetId("motor", m.Motor, analysis), $"Calculation sheet — motor {m.Tag}", block, "calc");
            Inputs(page, m.Motor, model, lines, [
                ("Feeder", m.Motor.Feeder.Tag?.Value ?? ""),
                ("Rating", (m.Motor.Power?.Value.ToString() ?? "not written") + (m.Quantity > 1 ? $", {m.Quantity} alike" : "")),
                ("System", m.Volts > 0 ? $"{Format.Number(m.Volts)} V {Labels.Phases(m.Phases)}" : "not known"),
                ("Nameplate current", Likes.Get(m.Motor, model, x => x.Nameplate)?.Value.Value.ToString() ?? "not written"),
                ("Service factor", Likes.Get(m.Motor, model, x => x.ServiceFactor)?.Value.Value.ToString() ?? "not written"),
                ("Length", m.Motor.Length?.Value.ToString() ?? "not written"),
                ("Wire, ground", Labels.Conductors(m.Wire, null, m.Ground)),
                ("Protection", Labels.Protection(m.ProtectionRating, m.Device, null, null)),
                ("Overload", m.Overload is { } o ? Format.Amps(o) : "not written"),
            ]);
            var dip = analysis.Power.Dips.GetValueOrDefault(m.Motor);
            var sections = Breakdown.MotorSections(m, dip is null);
            if (dip is not null) sections = sections.Append(DipSection.Of(dip));
            if (analysis.Power.HasSource && analysis.Power.AtController(m.Motor) is { } bus) sections = sections.Concat(FaultSections.ForMotor(m.Motor, bus));
            if (analysis.Power.Taps.GetValueOrDefault(m.Motor) is { } tap) sections = sections.Append(TapSection.Of(tap));
            Sections(page, sections);
            Coverage(page, CircuitCoverage.For(m, analysis.Power));
            Findings(page, byLine, lines, m.Motor.Header.Line.Index, m.Motor.LastLine);
            page.SheetEnd();
        }

        foreach (var f in analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index))
        {
            page.SheetStart(SheetId("feeder", f.Feeder, analysis), $"Calculation sheet — feeder {f.Tag}", block, "calc");
            Inputs(page, f.Feeder, model, lines, [
                ("Supplied from", f.Feeder.From?.Value ?? "supply"),
                ("System", f.Volts > 0 ? $"{Format.Number(f.Volts)} V {Labels.Phases(f.Phases)}" : "not known"),
                ("Motors", string.Join(", ", f.Feeder.Motors.Select(x => x.Tag?.Value))),
                ("Other loads", string.Join(", ", f.Feeder.Loads.Select(x => x.Tag?.Value))),
                ("Running load", Format.Amps(f.CalculatedLoad)),
                ("Length", f.Feeder.Length?.Value.ToString() ?? "not written"),
                ("Wire, ground", Labels.Conductors(f.Wire, null, f.Ground)),
                ("Protection", Labels.Protection(f.ProtectionRating, f.Feeder.Protection?.Value, null, null)),
            ]);
            Sections(page, analysis.Power.HasSource && analysis.Power.Feeders.GetValueOrDefault(f.Feeder) is { } fault
                ? Breakdown.FeederSections(f).Concat(FaultSections.ForFeeder(fault))
                : Breakdown.FeederSections(f));
            Coverage(page, CircuitCoverage.For(f, analysis.Power));
            Findings(page, byLine, lines, f.Feeder.Header.Line.Index, f.Feeder.LastOwnLine);
            page.SheetEnd();
        }
    }

    /// <summary>
    /// The sheet's anchor: "calc-motor-P-101". A tag written twice (an error, but the report is still
    /// written) gets its line after it, so every anchor stays unique and links reach the right sheet.
    /// </summary>
    public static string SheetId(string kind, CircuitNode circuit, AnalysisResult analysis)
    {
        var tag = circuit.Tag?.Value ?? "";
        return ReferenceEquals(analysis.Parse.Model.Find(tag), circuit) ? $"calc-{kind}-{tag}" : $"calc-{kind}-{tag}-{circuit.Header.Line.Index + 1}";
    }

    private static void Inputs(Page page, CircuitNode circuit, MotorList model, SourceLines lines, (string Name, string Value)[] facts)
    {
        var settings = Settings.For(circuit, model);
        page.Open("div", "class=\"inputs\"")
            .El("p", $"{circuit.Description?.Value ?? ""} — {lines.Describe(circuit.Header.Line.Index)} of the list", "class=\"where\"")
            .Open("dl");
        foreach (var (name, value) in facts) page.El("dt", name).El("dd", value.Length == 0 ? "—" : value);
        page.El("dt", "Installation").El("dd", Assumptions.Describe(settings));
        page.Close("dl").Close("div");
    }

    private static void Sections(Page page, IEnumerable<BreakdownSection> sections)
    {
        page.Open("div", "class=\"steps\"");
        foreach (var s in sections)
        {
            page.Open("div", "class=\"section\"").El("h3", s.Heading);
            page.Open("table", "class=\"steps-table\"").Open("thead").Open("tr")
                .El("th", "Step").El("th", "Value").El("th", "Rule").El("th", "Why").Close("tr").Close("thead").Open("tbody");
            foreach (var step in s.Steps)
                page.Open("tr").El("td", step.Label).El("td", step.Value, "class=\"num\"").El("td", step.Rule, "class=\"rule\"").El("td", step.Note).Close("tr");
            page.Close("tbody").Close("table");
            if (s.Verdict is { } v) page.El("p", v, $"class=\"verdict {(v.StartsWith('✗') ? "err" : v.StartsWith('✓') ? "ok" : "")}\"");
            page.Close("div");
        }

        page.Close("div");
    }

    private static void Coverage(Page page, CircuitCoverage coverage)
    {
        page.Open("div", "class=\"coverage\"");
        page.El("h3", "Checked against");
        page.El("p", string.Join("; ", coverage.Applied.Select(r => r.Rule)), "class=\"rules\"");
        page.El("h3", "Not checked on this circuit");
        page.Open("ul", "class=\"not-checked\"");
        foreach (var r in coverage.NotChecked) page.Open("li").El("b", r.Rule).Text($" {r.Text} — {r.Reason}").Close("li");
        page.Close("ul").Close("div");
    }

    private static void Findings(Page page, ILookup<int, Finding> byLine, SourceLines lines, int first, int last)
    {
        var on = Enumerable.Range(first, last - first + 1).SelectMany(l => byLine[l]).ToList();
        if (on.Count == 0) return;
        page.Open("div", "class=\"circuit-findings\"").El("h3", "Findings");
        page.Open("ul");
        foreach (var f in on) page.Open("li", $"class=\"{(f.Severity == Parser.Diagnostics.Severity.Error ? "err" : "warn")}\"").El("b", f.Code).Text($" {lines.Describe(f.Range.Start.Line)}: {f.Message}").Close("li");
        page.Close("ul").Close("div");
    }
}
