using System.CommandLine;
using System.Text.Json;
using MotorLang.Analysis;
using MotorLang.Analysis.Plant;
using MotorLang.Analysis.Reports;
using MotorLang.Cli.Output;

namespace MotorLang.Cli;

/// <summary>`motorlang diff OLD NEW`: what changed between two versions, record by record, with the sizes that moved.</summary>
public static class DiffCommand
{
    public static Command Create(TextWriter stdout)
    {
        var oldArg = new Argument<string>("old") { Description = "A file, or a git revision and path such as HEAD~1:plant.motors; for a plant, also a bare revision such as HEAD~1" };
        var newArg = new Argument<string>("new") { Description = "A file, a plant (a folder or a file of it), or a git revision and path" };
        var format = new Option<string>("--format") { Description = "text or json", DefaultValueFactory = _ => "text" };
        format.AcceptOnlyFromAmong("text", "json");
        var exitCode = new Option<bool>("--exit-code") { Description = "Exit 1 when the versions differ, 0 when they do not" };
        var command = new Command("diff", "Compare two versions of a motor list or a plant by tag") { oldArg, newArg, format, exitCode };
        command.SetAction(result =>
        {
            using var sides = new PlantDiffInputs();
            if (PlantSides(sides, result.GetValue(oldArg)!, result.GetValue(newArg)!) is { } plants)
            {
                var plantChanges = PlantDiff.Compare(plants.Before, plants.After);
                if (result.GetValue(format) == "json")
                    stdout.WriteLine(DiffJson.Write(plantChanges));
                else if (plantChanges.Count == 0)
                    stdout.WriteLine("no changes");
                else
                    foreach (var line in PlantDiff.Describe(plantChanges)) stdout.WriteLine(line);
                return result.GetValue(exitCode) && plantChanges.Count > 0 ? ExitCodes.Findings : ExitCodes.Clean;
            }

            var before = Analyzer.Analyze(Read(result.GetValue(oldArg)!));
            var after = Analyzer.Analyze(Read(result.GetValue(newArg)!));
            var changes = ListDiff.Compare(before, after);
            if (result.GetValue(format) == "json")
                stdout.WriteLine(DiffJson.Write(changes));
            else if (changes.Count == 0)
                stdout.WriteLine("no changes");
            else
                foreach (var c in changes) stdout.WriteLine(ListDiff.Describe(c));
            return result.GetValue(exitCode) && changes.Count > 0 ? ExitCodes.Findings : ExitCodes.Clean;
        });
        return command;
    }

    /// <summary>
    /// The two plants to compare when NEW is a folder or a file of a plant (docs/format.md, Plants),
    /// or null to compare two files. OLD is then a path on disk, REV:PATH, or a bare revision
    /// (NEW's plant folder at that revision); a folder that holds no plant is refused.
    /// </summary>
    private static (PlantAnalysis Before, PlantAnalysis After)? PlantSides(PlantDiffInputs sides, string oldSpec, string newSpec)
    {
        if (sides.Local(newSpec) is not { } local) return null;
        var root = PlantDiffInputs.PlantRoot(local.Path);
        if (root is null)
        {
            if (Directory.Exists(local.Path)) throw new CliException($"'{newSpec}' is a folder that holds no plant: diff compares two files or two plants");
            return null;
        }

        var oldRoot = sides.OldRoot(oldSpec, root, local.Top);
        return (PlantDiffInputs.Analyze(oldRoot).Analysis, PlantDiffInputs.Analyze(root).Analysis);
    }

    /// <summary>A path on disk, or REV:PATH read with `git show` from the current folder's repository.</summary>
    public static string Read(string spec)
    {
        if (File.Exists(spec)) return SourceFiles.Read(spec);
        var colon = spec.IndexOf(':');
        if (colon <= 0) throw new CliException($"cannot read '{spec}': no such file, and not a git revision:path");
        return Git.RunOrFail(null, $"show '{spec}'", "show", spec);
    }
}
