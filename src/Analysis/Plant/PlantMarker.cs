using MotorLang.Parser;

namespace MotorLang.Analysis.Plant;

/// <summary>Whether a motor list is a plant file: its project block says 'plant' (docs/format.md, Plants).</summary>
public static class PlantMarker
{
    public static bool IsPlantFile(string text) =>
        text.Contains("plant", StringComparison.OrdinalIgnoreCase) && DocumentParser.Parse(text).Model.Project?.Plant is not null;
}
