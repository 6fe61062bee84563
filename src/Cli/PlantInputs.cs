using MotorLang.Analysis;
using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Plant;
using MotorLang.Files;

namespace MotorLang.Cli;

/// <summary>What one command works on: a plant (its files read together) or one file on its own.</summary>
public sealed record Unit(PlantFolder? Plant, string? File)
{
    /// <summary>Every file of the unit, as the command line names it.</summary>
    public IReadOnlyList<string> Paths => Plant is { } p ? p.Members.Select(m => PlantInputs.Shown(m.Path)).ToList() : [File!];
}

/// <summary>
/// Turns the paths of a command line into plants and single files: a file (or a file found in a
/// named folder) that belongs to a plant brings in the whole plant, once; any other file is
/// analysed on its own, exactly as before plants existed.
/// </summary>
public static class PlantInputs
{
    public static IReadOnlyList<Unit> Group(IReadOnlyList<string> files)
    {
        var units = new List<Unit>();
        var byFolder = new Dictionary<string, PlantFolder?>(StringComparer.Ordinal);
        var taken = new HashSet<string>(StringComparer.Ordinal);
        foreach (var file in files)
        {
            var full = Path.GetFullPath(file);
            var folder = Path.GetDirectoryName(full) ?? full;
            if (!byFolder.TryGetValue(folder, out var plant))
                byFolder[folder] = plant = PlantFolders.ForFile(file, SourceFiles.Extension, PlantMarker.IsPlantFile);
            if (plant is not null && plant.Members.Any(m => Path.GetFullPath(m.Path) == full))
            {
                if (taken.Add(Path.GetFullPath(plant.Root))) units.Add(new Unit(plant, null));
            }
            else
            {
                units.Add(new Unit(null, file));
            }
        }

        return units;
    }

    public static PlantAnalysis Analyze(PlantFolder plant) =>
        PlantAnalyzer.Analyze(plant.Members.Select(m => new PlantFile(m.Name, m.Text)).ToList(),
            plant.LeftOut.Select(s => new PlantLeftOut(Path.GetRelativePath(plant.Root, s.Path).Replace(Path.DirectorySeparatorChar, '/'), s.Reason)).ToList());

    /// <summary>Each file's findings, named as the command line names the file.</summary>
    public static IEnumerable<(string File, IReadOnlyList<Finding> Findings, IReadOnlyList<Acknowledgement> Acknowledged)> Findings(Unit unit)
    {
        if (unit.Plant is not { } plant)
        {
            var single = Analyzer.Analyze(SourceFiles.Read(unit.File!));
            yield return (unit.File!, single.Findings, single.Acknowledged);
            yield break;
        }

        var analysis = Analyze(plant);
        foreach (var m in plant.Members) yield return (Shown(m.Path), analysis.FindingsOf(m.Name), analysis.AcknowledgedOf(m.Name));
    }

    /// <summary>A plant member's path as messages show it: relative to the current folder when below it.</summary>
    public static string Shown(string path)
    {
        var relative = Path.GetRelativePath(Directory.GetCurrentDirectory(), path);
        return relative.StartsWith("..", StringComparison.Ordinal) || Path.IsPathRooted(relative) ? path : relative;
    }
}
