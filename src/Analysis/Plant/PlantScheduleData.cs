using MotorLang.Analysis.Reports.Data;

namespace MotorLang.Analysis.Plant;

/// <summary>The typed schedule of a whole plant: every file's motors and feeders, each row under its own file and line.</summary>
public static class PlantScheduleData
{
    /// <param name="name">How the caller names each plant file (its path as shown), from the file's plant name.</param>
    /// <returns>Null when a file of the plant could not be read into it (<see cref="PlantAnalysis.Apart"/>): a schedule without it would leave circuits out.</returns>
    public static ScheduleData? Of(PlantAnalysis plant, Func<string, string> name)
    {
        if (plant.Joined is null || plant.Apart.Count > 0) return null;
        return ScheduleDataBuilder.Of(plant.Joined, line =>
        {
            var (file, inFile) = plant.FileOfLine(line);
            return (name(file), inFile);
        });
    }
}
