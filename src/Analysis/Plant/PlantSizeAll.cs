using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Plant;

/// <summary>"Size everything" over a plant: as <see cref="Fixes.SizeAll"/>, with each edit in the file that holds the value.</summary>
public static class PlantSizeAll
{
    /// <summary>The plant's files with every fix applied, in passes (at most four); a pass that would add a syntax error is not taken.</summary>
    public static IReadOnlyList<PlantFile> Apply(IReadOnlyList<PlantFile> files)
    {
        for (var pass = 0; pass < 4; pass++)
        {
            var analysis = PlantAnalyzer.Analyze(files);
            var edits = analysis.SizeEverything();
            if (edits.IsEmpty) break;
            var next = files.Select(f => f with { Text = TextEdits.Apply(f.Text, edits.Where(e => e.File == f.Name).Select(e => e.Edit)) }).ToList();
            if (SyntaxErrors(PlantAnalyzer.Analyze(next)) > SyntaxErrors(analysis)) break;
            files = next;
        }

        return files;
    }

    private static int SyntaxErrors(PlantAnalysis a) => a.Joined?.Parse.Diagnostics.Length ?? 0;
}
