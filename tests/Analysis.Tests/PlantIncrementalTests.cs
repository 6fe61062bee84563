using CsCheck;
using MotorLang.Analysis.Plant;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// An edit inside one line of one file of a plant, updated incrementally (PlantAnalyzer.Update),
/// equals a fresh analysis of the plant's new texts: every finding of every file, with its range,
/// message, related files and fix edits.
/// </summary>
public sealed class PlantIncrementalTests
{
    // Value edits the update re-reads on their own, and a few it must refuse (a tag, a 'from').
    private static readonly (string From, string To)[] Edits =
    [
        ("5hp", "25hp"), ("10hp", "1hp"), ("60hp", "5hp"), ("14 AWG", "6 AWG"), ("4/0 AWG", "10 AWG"), ("200ft", "90ft"),
        (" 480V", " 208V"), ("2 AWG", "2/0 AWG"), ("M1-", "M7-"), ("from F0", "from F1"),
    ];

    [Fact]
    public void AnUpdateAfterAOneLineEditEqualsAFreshPlantAnalysis()
    {
        var updated = 0;
        Gen.Select(PlantPropertyTests.Plants, Gen.Int[0, 3], Gen.Int[0, 1000], Gen.Int[0, Edits.Length], Gen.Bool).Sample((texts, fileSeed, lineSeed, editSeed, comment) =>
        {
            var files = texts.Select((t, i) => new PlantFile($"f{i}.motors", t)).ToList();
            var before = PlantAnalyzer.Analyze(files);
            var file = fileSeed % files.Count;
            var lines = files[file].Text.Split('\n');
            var line = lineSeed % lines.Length;
            var edited = lines[line];
            if (comment || editSeed == Edits.Length) edited = edited.TrimEnd('\r') + "  # checked" + (edited.EndsWith('\r') ? "\r" : "");
            else if (edited.Contains(Edits[editSeed].From, StringComparison.Ordinal)) edited = edited.Replace(Edits[editSeed].From, Edits[editSeed].To);
            else edited = edited.Insert(edited.TrimEnd('\r').Length, " ");
            lines[line] = edited;
            var after = files.Select((f, i) => i == file ? f with { Text = string.Join('\n', lines) } : f).ToList();

            var update = PlantAnalyzer.Update(before, after[file].Name, after[file].Text);
            var fresh = PlantAnalyzer.Analyze(after);
            if (update is not null) updated++;
            Assert.Equal(Describe(fresh), Describe(update ?? fresh));
            if (update is not null) Assert.Equal(after.Select(f => f.Text), update.Files.Select(f => f.Text));
        }, iter: 150);
        // Most of these edits stay inside a statement: the incremental path must have been taken.
        Assert.True(updated > 50, $"only {updated} of 150 edits were updated incrementally");
    }

    private static string Describe(PlantAnalysis a) => string.Join("\n", a.Findings.Select(f =>
        $"{f.File} {f.Finding.Range} {f.Finding.Code} {f.Finding.Severity} {f.Finding.Message} related [{string.Join(",", f.Finding.RelatedLocations.Select((r, i) => $"{f.RelatedFiles[i]}:{r.Range} {r.Message}"))}]"
        + (f.Finding.Fix is { } fix ? $" fix {fix.Title}: {string.Join(" | ", fix.Edits.Select((e, i) => $"{f.FixFiles[i]}:{e.Range}={e.NewText}"))}" : "")))
        + "\nacknowledged " + string.Join(",", a.Acknowledged.Select(x => $"{x.File}:{x.Acknowledgement.Finding.Code}"));
}
