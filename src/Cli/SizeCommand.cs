using System.CommandLine;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Plant;
using MotorLang.Cli.Output;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli;

/// <summary>
/// `motorlang size`: apply every fix (correct sizes in, missing sizes added). `--dry-run` prints a
/// unified diff instead and `--check` only names the file; both change nothing and exit 1 when
/// the list would change, so CI can require a fully sized list.
/// </summary>
public static class SizeCommand
{
    public static Command Create(TextWriter stdout, TextWriter stderr)
    {
        var file = new Argument<string>("file") { Description = "A motor-list file" };
        var dryRun = new Option<bool>("--dry-run") { Description = "Print a unified diff, change nothing; exit 1 if the list would change" };
        var check = new Option<bool>("--check") { Description = "Change nothing; exit 1 and name the file if it would change" };
        var quiet = SharedOptions.Quiet("the diff (no status line)");
        var command = new Command("size", "Write the required sizes into a motor list") { file, dryRun, check, quiet };
        SharedOptions.Exclusive(command, dryRun, check);
        command.SetAction(result =>
        {
            var path = SourceFiles.Expand([result.GetValue(file)!])[0];
            var say = result.GetValue(quiet) ? TextWriter.Null : stderr;
            if (PlantInputs.Group([path]) is [{ Plant: { } plant }]) return SizePlant(plant, result.GetValue(dryRun), result.GetValue(check), result.GetValue(quiet), stdout, say);
            var before = SourceFiles.Read(path);
            var after = SizeAll.Apply(before);
            if (after == before)
            {
                say.WriteLine($"{path}: nothing to change");
                return ExitCodes.Clean;
            }

            if (result.GetValue(dryRun))
            {
                stdout.Write(UnifiedDiff.Between(path, before, after, "sized"));
                return ExitCodes.Findings;
            }

            if (result.GetValue(check))
            {
                if (!result.GetValue(quiet)) stdout.WriteLine($"{path}: would be sized");
                return ExitCodes.Findings;
            }

            SourceFiles.WriteAtomically(path, after);
            say.WriteLine($"{path}: sized");
            return ExitCodes.Clean;
        });
        return command;
    }

    /// <summary>
    /// A file of a plant is sized with the whole plant in view (a switchboard's feeder carries the
    /// MCCs in other files), and every file whose values change is written, each atomically.
    /// </summary>
    private static int SizePlant(Files.PlantFolder plant, bool dryRun, bool check, bool quiet, TextWriter stdout, TextWriter say)
    {
        var before = plant.Members.Select(m => new PlantFile(m.Name, m.Text)).ToList();
        var after = PlantSizeAll.Apply(before);
        var changed = plant.Members.Select((m, i) => (Path: PlantInputs.Shown(m.Path), m.Path, Before: m.Text, After: after[i].Text)).Where(c => c.Before != c.After).ToList();
        if (changed.Count == 0)
        {
            say.WriteLine($"{PlantInputs.Shown(plant.Root)}: nothing to change in the plant");
            return ExitCodes.Clean;
        }

        foreach (var c in changed)
        {
            if (dryRun) stdout.Write(UnifiedDiff.Between(c.Item1, c.Before, c.After, "sized"));
            else if (check)
            {
                if (!quiet) stdout.WriteLine($"{c.Item1}: would be sized");
            }
            else
            {
                SourceFiles.WriteAtomically(c.Item2, c.After);
                say.WriteLine($"{c.Item1}: sized");
            }
        }

        return dryRun || check ? ExitCodes.Findings : ExitCodes.Clean;
    }
}
