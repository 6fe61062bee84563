using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Statements;

namespace MotorLang.Parser.Tests;

/// <summary>docs/format.md is the language reference: it must name every keyword, word and code the parser knows.</summary>
public class DocumentationTests
{
    private static readonly string Reference = File.ReadAllText(Path.Combine(TestSupport.RepoRoot, "docs", "format.md"));

    [Fact]
    public void EveryKeywordIsDocumented()
    {
        var missing = Keywords.All.Select(k => k.Keyword).Where(k => !Reference.Contains($"`{k}`")).ToList();
        Assert.Empty(missing);
    }

    [Fact]
    public void EveryEnumeratedWordIsDocumented()
    {
        var words = Keywords.All.SelectMany(k => k.Args).SelectMany(a => a.Choices ?? [])
            .Where(c => c.Canonical.Length > 1) // single letters (design and code letters) are documented as ranges
            .SelectMany(c => c.Aliases.Prepend(c.Canonical)).Distinct();
        var missing = words.Where(w => !Reference.Contains($"`{w}`")).ToList();
        Assert.Empty(missing);
    }

    [Fact]
    public void EveryDiagnosticCodeIsDocumented()
    {
        var codes = typeof(SyntaxCodes).GetFields().Select(f => (string)f.GetValue(null)!);
        var missing = codes.Where(c => !Reference.Contains($"| {c} |")).ToList();
        Assert.Empty(missing);
    }
}
