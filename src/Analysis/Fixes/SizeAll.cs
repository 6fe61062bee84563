using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Fixes;

/// <summary>"Size everything": apply every fix, analyze again, repeat until nothing changes.</summary>
public static class SizeAll
{
    /// <summary>
    /// A larger wire can raise the grounding conductor, so fixes are applied in passes (at most
    /// four). A pass that would add a syntax error is not taken.
    /// </summary>
    public static string Apply(string text)
    {
        for (var pass = 0; pass < 4; pass++)
        {
            var analysis = Analyzer.Analyze(text);
            var edits = analysis.SizeEverything();
            if (edits.IsEmpty) break;
            var next = TextEdits.Apply(text, edits);
            if (Analyzer.Analyze(next).Parse.Diagnostics.Length > analysis.Parse.Diagnostics.Length) break;
            text = next;
        }

        return text;
    }
}
