using MotorLang.Parser;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Parser.Tests;

internal static class TestSupport
{
    /// <summary>Diagnostics as "line:col-line:col CODE" with 1-based positions, for compact exact-span asserts.</summary>
    public static string[] Codes(string text) =>
        DocumentParser.Parse(text).Diagnostics.Select(Describe).ToArray();

    public static string Describe(Diagnostic d) =>
        $"{d.Range.Start.Line + 1}:{d.Range.Start.Column + 1}-{d.Range.End.Line + 1}:{d.Range.End.Column + 1} {d.Code}";

    public static string Lines(params string[] lines) => string.Join("\n", lines) + "\n";

    public static string RepoRoot
    {
        get
        {
            var dir = AppContext.BaseDirectory;
            while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
            return dir;
        }
    }
}
