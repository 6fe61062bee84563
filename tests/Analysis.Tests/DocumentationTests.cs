using MotorLang.Analysis.Findings;

namespace MotorLang.Analysis.Tests;

public class DocumentationTests
{
    [Fact]
    public void EveryFindingCodeIsDocumentedInChecksMd()
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        var doc = File.ReadAllText(Path.Combine(dir, "docs", "checks.md"));
        var missing = typeof(FindingCodes).GetFields().Select(f => (string)f.GetValue(null)!).Where(c => !doc.Contains($"| {c} |")).ToList();
        Assert.Empty(missing);
    }
}
