using System.CommandLine;
using System.Text;
using System.Text.Json;
using MotorLang.Analysis;
using MotorLang.Analysis.Reports;
using MotorLang.Analysis.Reports.Data;
using MotorLang.Cli.Output;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli;

/// <summary>`motorlang schedule`: one row per motor, computed and specified sizes side by side, then feeder totals.</summary>
public static class ScheduleCommand
{
    public static Command Create(TextWriter stdout, CliEnvironment env)
    {
        var file = new Argument<string>("file") { Description = "A motor-list file" };
        var format = new Option<string>("--format") { Description = "table, csv, markdown or json", DefaultValueFactory = _ => "table" };
        format.AcceptOnlyFromAmong("table", "csv", "markdown", "json");
        var command = new Command("schedule", "Print the motor schedule with computed and specified sizes") { file, format };
        command.SetAction(result =>
        {
            var path = result.GetValue(file)!;
            var source = SourceFiles.Expand([path])[0];
            var analysis = Analyzer.Analyze(SourceFiles.Read(source));
            var schedule = Schedule.Of(analysis);
            stdout.Write(result.GetValue(format) switch
            {
                "csv" => Csv(schedule),
                "markdown" => Markdown(schedule),
                "json" => ScheduleJson.Write(ScheduleDataBuilder.Of(analysis, source)),
                _ => ScheduleTable.Render(schedule, env.OutputIsTerminal ? env.TerminalWidth : null, FeederHeaders, FeederCells),
            });
            return analysis.HasErrors ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    private static readonly string[] FeederHeaders =
        ["Feeder", "Volts", "Load", "Required", "Min wire", "Wire", "Max protection", "Protection", "Min ground", "Ground", "Voltage drop"];

    private static string[] FeederCells(FeederTotals f) =>
        [f.Tag, f.Volts, f.CalculatedLoad, f.RequiredAmpacity, f.MinimumWire, f.Wire, f.MaximumProtection, f.Protection, f.MinimumGround, f.Ground, f.VoltageDrop];

    public static string Csv(Schedule s)
    {
        var sb = new StringBuilder();
        void Row(IEnumerable<string> cells) => sb.Append(string.Join(",", cells.Select(Quote))).Append('\n');
        Row(ScheduleRow.Headers);
        foreach (var r in s.Rows) Row(r.Cells);
        sb.Append('\n');
        Row(FeederHeaders);
        foreach (var f in s.Feeders) Row(FeederCells(f));
        return sb.ToString();
    }

    public static string Markdown(Schedule s)
    {
        var sb = new StringBuilder();
        void Row(IEnumerable<string> cells) => sb.Append("| ").Append(string.Join(" | ", cells.Select(c => c.Replace("|", "\\|")))).Append(" |\n");
        Row(ScheduleRow.Headers);
        Row(ScheduleRow.Headers.Select(_ => "---"));
        foreach (var r in s.Rows) Row(r.Cells);
        sb.Append("\n**Feeders**\n\n");
        Row(FeederHeaders);
        Row(FeederHeaders.Select(_ => "---"));
        foreach (var f in s.Feeders) Row(FeederCells(f));
        return sb.ToString();
    }

    private static string Quote(string cell) =>
        cell.IndexOfAny([',', '"', '\n']) >= 0 ? "\"" + cell.Replace("\"", "\"\"") + "\"" : cell;
}
