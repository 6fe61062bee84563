using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Plant;

/// <summary>
/// The hover, inlay and feeder-summary services (<see cref="Breakdown"/>) for a file of a plant:
/// read from the plant's joined analysis, so a feeder's totals count what it supplies in other
/// files, with every position in the file's own lines.
/// </summary>
public static class PlantBreakdown
{
    public static BreakdownView? At(PlantAnalysis plant, string file, TextPosition position)
    {
        if (!Joinable(plant, file)) return null;
        var at = plant.ToJoined(file, new SourceRange(position, position)).Start;
        if (Breakdown.At(plant.Joined!, at) is not { } view || plant.FileOfLine(view.Range.Start.Line).File != file) return null;
        return view with { Range = plant.ToFile(view.Range).Range };
    }

    /// <summary>The motors whose headers are on lines <paramref name="first"/> to <paramref name="last"/> of the file, each with its header's line in the file.</summary>
    public static IEnumerable<(MotorResult Motor, int Line)> MotorsOnLines(PlantAnalysis plant, string file, int first, int last)
    {
        if (!Joinable(plant, file) || last < first) yield break;
        var from = plant.ToJoined(file, SourceRange.OnLine(first, 0, 0)).Start.Line;
        var to = plant.ToJoined(file, SourceRange.OnLine(last, 0, 0)).Start.Line;
        foreach (var m in Breakdown.MotorsOnLines(plant.Joined!, from, to))
        {
            var (f, line) = plant.FileOfLine(m.Motor.Header.Line.Index);
            if (f == file) yield return (m, line);
        }
    }

    /// <summary>The feeders written in the file, in line order, each with its header's range in the file.</summary>
    public static IEnumerable<(FeederResult Feeder, SourceRange Header)> Feeders(PlantAnalysis plant, string file)
    {
        if (!Joinable(plant, file)) yield break;
        foreach (var f in plant.Joined!.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index))
        {
            var (name, range) = plant.ToFile(f.Feeder.Header.Range);
            if (name == file) yield return (f, range);
        }
    }

    private static bool Joinable(PlantAnalysis plant, string file) =>
        plant.Joined is not null && !plant.Apart.Contains(file) && plant.Files.Any(f => f.Name == file);
}
