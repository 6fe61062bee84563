using MotorLang.Analysis.Findings;
using MotorLang.Server.Documents;
using MotorLang.Server.Plants;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Features;

/// <summary>Findings as the diagnostics the scheduler publishes: of one document, or of every file of a plant.</summary>
internal static class Diagnostics
{
    public static DiagnosticBatch Single(DocumentSnapshot s) =>
        new(null, [new FileDiagnostics(s.Uri, s.Version, FindingCap.Shown(s.Analysis.Findings).Select(f => Convert.ToLsp(f, s.Uri)).ToArray())]);

    /// <summary>
    /// Every file of the plant, each with at most <see cref="FindingCap.MaxShown"/> findings as
    /// `motorlang check` shows them; a related location in another file carries that file's URI.
    /// </summary>
    public static DiagnosticBatch Plant(PlantView plant)
    {
        var uris = plant.Files.ToDictionary(f => f.Name, f => f.Uri, StringComparer.Ordinal);
        var byFile = plant.Analysis.Findings.GroupBy(f => f.File).ToDictionary(g => g.Key, g => g.ToList(), StringComparer.Ordinal);
        return new(plant.Root, plant.Files.Select(file =>
        {
            var found = byFile.GetValueOrDefault(file.Name) ?? [];
            var shown = FindingCap.Shown(found.Select(f => f.Finding).ToList());
            var diagnostics = shown.Select((f, i) => i < found.Count
                ? Convert.ToLsp(f, file.Uri, found[i].RelatedFiles.Select(n => uris.GetValueOrDefault(n, file.Uri)).ToList())
                : Convert.ToLsp(f, file.Uri)).ToArray();
            return new FileDiagnostics(file.Uri, file.Open?.Version, diagnostics);
        }).ToList());
    }
}
