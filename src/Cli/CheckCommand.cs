using System.CommandLine;
using System.Text.Json;
using MotorLang.Analysis;
using MotorLang.Analysis.Findings;
using MotorLang.Cli.Output;
using MotorLang.Cli.Usage;
using MotorLang.Parser.Diagnostics;
using Spectre.Console;

namespace MotorLang.Cli;

/// <summary>`motorlang check`: every finding as text, JSON or SARIF; exit 1 when there are errors.</summary>
public static class CheckCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr, CliEnvironment env, Option<string> color)
    {
        var paths = new Argument<string[]>("paths") { Description = "Motor-list files or folders, or - for standard input", Arity = ArgumentArity.OneOrMore };
        var format = new Option<string>("--format") { Description = "text, json or sarif", DefaultValueFactory = _ => "text" };
        format.AcceptOnlyFromAmong("text", "json", "sarif");
        var stdinName = Inputs.CreateStdinNameOption();
        var severity = SharedOptions.SeverityFilter();
        var quiet = SharedOptions.Quiet("the findings (no totals line)");
        var command = new Command("check", "Check motor lists against the code and report problems") { paths, format, stdinName, severity, quiet };
        command.SetAction(result =>
        {
            var inputs = Inputs.Resolve(result.GetValue(paths)!, result.GetValue(stdinName), env, stderr);
            var full = Analyze(inputs, stderr, result.GetValue(quiet));
            var files = full.Select(r => r.File).ToList();
            // Totals and the exit code count every finding; each file shows at most FindingCap.MaxShown of those the filter keeps.
            var all = full.SelectMany(r => r.Findings).ToList();
            var level = result.GetValue(severity);
            var reports = full.Select(r => (r.File, FindingCap.Shown(r.Findings.Where(f => SharedOptions.Shows(level, f.Severity)).ToList()))).ToList();
            var acknowledged = full.GroupBy(r => r.File).ToDictionary(g => g.Key, g => (IReadOnlyList<Acknowledgement>)g.SelectMany(r => r.Acknowledged).ToList());
            var colored = ColorChoice.Enabled(result.GetValue(color), env);
            switch (result.GetValue(format))
            {
                case "json":
                    stdout.WriteLine(JsonReport.Write(reports, acknowledged).ToJsonString(JsonReport.Options));
                    break;
                case "sarif":
                    stdout.WriteLine(SarifReport.Write(reports, ToolVersion.Text, acknowledged, ToolVersion.DocsBase).ToJsonString(JsonReport.Options));
                    break;
                default:
                    foreach (var (file, findings) in reports)
                    {
                        foreach (var f in findings) stdout.WriteLine(FindingText.Line(file, f, colored));
                        // The justified deviations stay visible to a reviewer, after the findings, unless only the severe are asked for.
                        if (level == "information")
                        {
                            foreach (var a in acknowledged[file]) stdout.WriteLine(FindingText.Line(file, a));
                        }
                    }

                    break;
            }

            int errors = all.Count(f => f.Severity == Severity.Error), warnings = all.Count(f => f.Severity == Severity.Warning);
            var acks = full.Sum(r => r.Acknowledged.Count);
            if (!result.GetValue(quiet))
                stderr.WriteLine($"{files.Count} file{(files.Count == 1 ? "" : "s")} checked: {errors} error{(errors == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}"
                    + (acks > 0 ? $", {acks} acknowledged" : ""));
            return errors > 0 ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    /// <summary>Analyzes each plant and each file on its own; with many on an interactive terminal, shows progress on stderr.</summary>
    private static List<(string File, IReadOnlyList<Finding> Findings, IReadOnlyList<Acknowledgement> Acknowledged)> Analyze(Inputs inputs, TextWriter stderr, bool quiet)
    {
        // Standard input is a list on its own; files that belong to a plant bring in the plant.
        var files = inputs.FromStdin ? [new Unit(null, inputs.Names[0])] : PlantInputs.Group(inputs.Names);
        var reports = new List<(string, IReadOnlyList<Finding>, IReadOnlyList<Acknowledgement>)>();
        void One(Unit unit)
        {
            if (unit.Plant is not null)
            {
                reports.AddRange(PlantInputs.Findings(unit));
                return;
            }

            var analysis = Analyzer.Analyze(inputs.Read(unit.File!));
            reports.Add((unit.File!, analysis.Findings, analysis.Acknowledged));
        }

        if (quiet || files.Count < 20 || Console.IsErrorRedirected || stderr != Console.Error)
        {
            foreach (var f in files) One(f);
            return reports;
        }

        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(Console.Error) });
        console.Progress().Start(ctx =>
        {
            var task = ctx.AddTask("checking", maxValue: files.Count);
            foreach (var f in files)
            {
                One(f);
                task.Increment(1);
            }
        });
        return reports;
    }
}
