using System.CommandLine;
using System.Text;
using System.Text.Json;
using MotorLang.Analysis;
using MotorLang.Analysis.Plant;
using MotorLang.Analysis.Reports;
using MotorLang.Analysis.Reports.Data;
using MotorLang.Cli.Output;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli;

/// <summary>`motorlang schedule`: one row per motor, computed and specified sizes side by side, then feeder totals.</summary>
public static class ScheduleCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr, CliEnvironment env)
    {
        var file = new Argument<string>("file") { Description = "A motor-list file, or - to read the list from standard input" };
        var stdinName = Inputs.CreateStdinNameOption();
        var format = new Option<string>("--format") { Description = "table, csv, markdown, json or xlsx", DefaultValueFactory = _ => "table" };
        format.AcceptOnlyFromAmong("table", "csv", "markdown", "json", "xlsx");
        var table = new Option<string>("--table") { Description = "For csv: the motors table or the feeders table", DefaultValueFactory = _ => "motors" };
        table.AcceptOnlyFromAmong("motors", "feeders");
        var output = SharedOptions.Output("the schedule (required for xlsx)");
        var command = new Command("schedule", "Print the motor schedule with computed and specified sizes") { file, format, table, output, stdinName };
        command.Validators.Add(r =>
        {
            if (r.GetValue(format) == "xlsx" && r.GetValue(output) is null) r.AddError("--format xlsx writes a workbook: name the file with --output FILE");
            if (r.GetResult(table) is { Implicit: false } && r.GetValue(format) != "csv") r.AddError("--table applies to --format csv only");
        });
        command.SetAction(result =>
        {
            var path = result.GetValue(file)!;
            var inputs = Inputs.Resolve([path], result.GetValue(stdinName), env, stderr);
            var source = inputs.Names[0];
            if (path != "-" && PlantInputs.Group([source]) is [{ Plant: { } plant }])
            {
                var chosenForPlant = result.GetValue(format);
                if (chosenForPlant is not ("table" or "markdown")) return TypedPlantSchedule(plant, chosenForPlant!, result.GetValue(table)!, result.GetValue(output), stdout);
                var (plantText, errors) = PlantSchedule(plant, chosenForPlant == "markdown", result.GetValue(output) is null && env.OutputIsTerminal ? env.TerminalWidth : null);
                if (result.GetValue(output) is { } to) SourceFiles.WriteOutput(to, System.Text.Encoding.UTF8.GetBytes(plantText));
                else stdout.Write(plantText);
                return errors ? ExitCodes.Findings : ExitCodes.Clean;
            }

            var analysis = Analyzer.Analyze(inputs.Read(source));
            var chosen = result.GetValue(format);
            var target = result.GetValue(output);
            if (chosen == "xlsx")
            {
                SourceFiles.WriteOutput(target!, ScheduleXlsx.Write(ScheduleDataBuilder.Of(analysis, source)));
                return analysis.HasErrors ? ExitCodes.Findings : ExitCodes.Clean;
            }

            var schedule = Schedule.Of(analysis);
            var text = chosen switch
            {
                "csv" => ScheduleCsv.Write(ScheduleDataBuilder.Of(analysis, source), result.GetValue(table)!),
                "markdown" => Markdown(schedule),
                "json" => ScheduleJson.Write(ScheduleDataBuilder.Of(analysis, source)),
                _ => ScheduleTable.Render(schedule, target is null && env.OutputIsTerminal ? env.TerminalWidth : null, FeederHeaders(schedule), FeederCells(schedule)),
            };
            if (target is null) stdout.Write(text);
            else SourceFiles.WriteOutput(target, System.Text.Encoding.UTF8.GetBytes(text));
            return analysis.HasErrors ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    /// <summary>A plant's schedule as JSON, CSV or xlsx: one table of every file's rows, each naming its file and line.</summary>
    private static int TypedPlantSchedule(Files.PlantFolder plant, string format, string table, string? target, TextWriter stdout)
    {
        var analysis = PlantInputs.Analyze(plant);
        var shown = plant.Members.ToDictionary(m => m.Name, m => PlantInputs.Shown(m.Path));
        var data = PlantScheduleData.Of(analysis, n => shown.GetValueOrDefault(n, n))
            ?? throw new CliException($"a file of the plant in '{PlantInputs.Shown(plant.Root)}' could not be read into it, so its {format} schedule would leave circuits out; 'motorlang check' names the file");
        if (format == "xlsx")
        {
            SourceFiles.WriteOutput(target!, ScheduleXlsx.Write(data));
        }
        else
        {
            var text = format == "csv" ? ScheduleCsv.Write(data, table) : ScheduleJson.Write(data);
            if (target is null) stdout.Write(text);
            else SourceFiles.WriteOutput(target, System.Text.Encoding.UTF8.GetBytes(text));
        }

        return analysis.HasErrors ? ExitCodes.Findings : ExitCodes.Clean;
    }

    /// <summary>
    /// A plant's schedule: every file's motors and feeders under the file's name (the feeders'
    /// totals count what other files hang on them), then a line that sums up the plant.
    /// </summary>
    private static (string Text, bool Errors) PlantSchedule(Files.PlantFolder plant, bool markdown, int? width)
    {
        var analysis = PlantInputs.Analyze(plant);
        var sb = new StringBuilder();
        var joined = analysis.Joined;
        var whole = joined is null ? new Schedule([], []) : Schedule.Of(joined);
        // Schedule.Of lists motors and feeders in line order; the same order gives each row its file.
        var motorFiles = joined?.Motors.Values.OrderBy(m => m.Motor.Header.Line.Index).Select(m => analysis.FileOfLine(m.Motor.Header.Line.Index).File).ToList() ?? [];
        var feederFiles = joined?.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index).Select(f => analysis.FileOfLine(f.Feeder.Header.Line.Index).File).ToList() ?? [];
        foreach (var member in plant.Members)
        {
            var rows = whole.Rows.Where((_, i) => motorFiles[i] == member.Name).ToList();
            var feeders = whole.Feeders.Where((_, i) => feederFiles[i] == member.Name).ToList();
            sb.Append(markdown ? $"## {member.Name}\n\n" : $"== {PlantInputs.Shown(member.Path)}\n");
            if (analysis.Apart.Contains(member.Name)) sb.Append("(not read: see 'motorlang check')\n\n");
            else
            {
                var part = new Schedule(rows, feeders) { ShowsFaultCurrent = whole.ShowsFaultCurrent };
                sb.Append(markdown ? Markdown(part) : ScheduleTable.Render(part, width, FeederHeaders(part), FeederCells(part))).Append('\n');
            }
        }

        int errors = analysis.Findings.Count(f => f.Finding.Severity == MotorLang.Parser.Diagnostics.Severity.Error),
            warnings = analysis.Findings.Count(f => f.Finding.Severity == MotorLang.Parser.Diagnostics.Severity.Warning);
        sb.Append($"Plant {PlantInputs.Shown(plant.Root)}: {plant.Members.Count} files, {whole.Rows.Count} motors, {whole.Feeders.Count} feeders; "
            + $"{errors} error{(errors == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")} (motorlang check lists them)\n");
        return (sb.ToString(), analysis.HasErrors);
    }

    private static readonly string[] FeederColumns =
        ["Feeder", "Volts", "Load", "Required", "Min wire", "Wire", "Max protection", "Protection", "Min ground", "Ground", "Voltage drop"];

    /// <summary>The feeder columns; a list with a 'source' adds the fault current at each bus.</summary>
    private static string[] FeederHeaders(Schedule s) => s.ShowsFaultCurrent ? [.. FeederColumns, ScheduleTable.FaultColumn] : FeederColumns;

    private static Func<FeederTotals, string[]> FeederCells(Schedule s) => f =>
        s.ShowsFaultCurrent
            ? [.. Cells(f), f.FaultCurrent]
            : Cells(f);

    private static string[] Cells(FeederTotals f) =>
        [f.Tag, f.Volts, f.CalculatedLoad, f.RequiredAmpacity, f.MinimumWire, f.Wire, f.MaximumProtection, f.Protection, f.MinimumGround, f.Ground, f.VoltageDrop];

    public static string Markdown(Schedule s)
    {
        var sb = new StringBuilder();
        void Row(IEnumerable<string> cells) => sb.Append("| ").Append(string.Join(" | ", cells.Select(c => c.Replace("|", "\\|")))).Append(" |\n");
        Row(ScheduleRow.Headers);
        Row(ScheduleRow.Headers.Select(_ => "---"));
        foreach (var r in s.Rows) Row(r.Cells);
        sb.Append("\n**Feeders**\n\n");
        Row(FeederHeaders(s));
        Row(FeederHeaders(s).Select(_ => "---"));
        foreach (var f in s.Feeders) Row(FeederCells(s)(f));
        return sb.ToString();
    }
}
