using System.CommandLine;
using System.Reflection;
using MotorLang.Analysis;
using MotorLang.Analysis.Reports;
using MotorLang.Cli.Usage;
using MotorLang.Report;
using MotorLang.Report.Diagram;

namespace MotorLang.Cli;

/// <summary>`motorlang report` and `motorlang diagram`: the issued report as one HTML file, and the one-line diagram as SVG.</summary>
public static class ReportCommand
{
    public static Command CreateReport(TextWriter stdout, TextWriter stderr, CliEnvironment env) => Create("report",
        "Write the motor schedule, feeder schedule, findings, one-line diagram and calculation sheets as one self-contained HTML file",
        stdout, stderr, env, (analysis, name, date, revisions) => PlantReport.Html(analysis, new ReportInfo(name, Version, date, revisions)));

    public static Command CreateDiagram(TextWriter stdout, TextWriter stderr, CliEnvironment env) => Create("diagram",
        "Write the one-line diagram (supply, feeders, motors, loads) as SVG",
        stdout, stderr, env, (analysis, name, _, _) => OneLineDiagram.Svg(analysis, $"{analysis.Parse.Model.Project?.Name?.Value ?? name} one-line diagram") + "\n");

    private static Command Create(string verb, string description, TextWriter stdout, TextWriter stderr, CliEnvironment env, Func<AnalysisResult, string, DateOnly, IReadOnlyList<Revision>?, string> write)
    {
        var file = new Argument<string>("file") { Description = "A motor-list file, or - to read the list from standard input" };
        var output = SharedOptions.Output(verb == "report" ? "the report" : "the diagram");
        var name = new Option<string?>("--name") { Description = "The list's name in the title block (default: the path given)" };
        var date = new Option<string?>("--date") { Description = "Date of issue, yyyy-MM-dd (default: today, UTC)" };
        var revisions = new Option<int>("--revisions")
        {
            Description = "How many revisions the revision log shows, from git (0: no log)", DefaultValueFactory = _ => 10,
        };
        var stdinName = Inputs.CreateStdinNameOption();
        var command = new Command(verb, description) { file, output, name, stdinName };
        if (verb == "report")
        {
            command.Options.Add(date);
            command.Options.Add(revisions);
        }
        command.SetAction(result =>
        {
            var given = result.GetValue(file)!;
            var issuedOn = DateOnly.FromDateTime(DateTime.UtcNow);
            if (result.GetValue(date) is { } day && !DateOnly.TryParseExact(day, "yyyy-MM-dd", out issuedOn))
                throw new CliException($"--date '{day}' is not a date written yyyy-MM-dd");
            if (given != "-" && PlantOf(given, stderr) is { } plant)
                return WritePlant(plant, result.GetValue(name), issuedOn, verb == "report" ? result.GetValue(revisions) : 0, result.GetValue(output), stdout, verb, write);
            var inputs = Inputs.Resolve([given], result.GetValue(stdinName), env, stderr);
            var text = inputs.Read(inputs.Names[0]);
            var listName = result.GetValue(name) ?? inputs.Names[0];
            var issued = issuedOn;
            var analysis = Analyzer.Analyze(text);
            // The log is read from git only for a file on disk; a list from stdin has no history here.
            IReadOnlyList<Revision>? log = null;
            if (verb == "report" && given != "-" && result.GetValue(revisions) is var count and > 0)
            {
                var (shown, before) = RevisionHistory.Of(inputs.Names[0], text, count);
                log = RevisionLog.Of(shown, before);
            }

            var content = write(analysis, listName, issued, log);
            if (result.GetValue(output) is { } path) SourceFiles.WriteOutput(path, System.Text.Encoding.UTF8.GetBytes(content));
            else stdout.Write(content);
            return analysis.HasErrors ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    /// <summary>
    /// The plant a path belongs to: a folder holding one plant, or a file of a plant. A folder of
    /// several unrelated lists is refused: reporting one of them would leave circuits out silently.
    /// </summary>
    private static Files.PlantFolder? PlantOf(string path, TextWriter stderr)
    {
        var units = PlantInputs.Group(SourceFiles.Expand([path], stderr));
        if (units is [{ Plant: { } plant }]) return plant;
        if (Directory.Exists(path))
            throw new CliException($"'{path}' is a folder of {units.Count} separate motor lists, not one plant: name one file, or make the folder a plant ('plant' in its project block; docs/format.md, Plants)");
        return null;
    }

    /// <summary>The report or diagram of a whole plant: its files analysed as one, every place named by its own file and line.</summary>
    private static int WritePlant(Files.PlantFolder plant, string? name, DateOnly issued, int revisions, string? target, TextWriter stdout, string verb,
        Func<AnalysisResult, string, DateOnly, IReadOnlyList<Revision>?, string> write)
    {
        var analysis = PlantInputs.Analyze(plant);
        if (analysis.Joined is not { } joined || analysis.Apart.Count > 0)
            throw new CliException($"a file of the plant in '{PlantInputs.Shown(plant.Root)}' could not be read into it, so its {verb} would leave circuits out; 'motorlang check' names the file");
        var shown = plant.Members.ToDictionary(m => m.Name, m => PlantInputs.Shown(m.Path));
        var lines = SourceLines.Plant(line => analysis.FileOfLine(line) is var (f, l) ? (shown.GetValueOrDefault(f, f), l) : default);
        IReadOnlyList<Revision>? log = null;
        if (revisions > 0)
        {
            var (revised, before) = RevisionHistory.OfPlant(plant, analysis, revisions);
            log = RevisionLog.OfPlant(revised, before);
        }

        var content = verb == "report"
            ? PlantReport.Html(joined, new ReportInfo(name ?? PlantInputs.Shown(plant.Root), Version, issued, log) { Lines = lines })
            : write(joined, name ?? PlantInputs.Shown(plant.Root), issued, null);
        if (target is not null) SourceFiles.WriteOutput(target, System.Text.Encoding.UTF8.GetBytes(content));
        else stdout.Write(content);
        return analysis.HasErrors ? ExitCodes.Findings : ExitCodes.Clean;
    }

    private static string Version =>
        typeof(ReportCommand).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0]
        ?? typeof(ReportCommand).Assembly.GetName().Version?.ToString() ?? "0";
}
