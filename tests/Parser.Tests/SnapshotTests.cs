using System.Text;
using MotorLang.Parser.Syntax;

namespace MotorLang.Parser.Tests;

/// <summary>
/// Each example parsed to a readable dump and compared with the checked-in expectation under
/// Snapshots/. To accept a deliberate change, run the tests with UPDATE_SNAPSHOTS=1 and review
/// the diff before committing it.
/// </summary>
public class SnapshotTests
{
    public static TheoryData<string> Examples() =>
        new(Directory.GetFiles(Path.Combine(TestSupport.RepoRoot, "examples"), "*.motors")
            .Concat(Directory.GetFiles(Path.Combine(TestSupport.RepoRoot, "tests", "Parser.Tests", "Fixtures"), "*.motors"))
            .Select(f => Path.GetRelativePath(TestSupport.RepoRoot, f)));

    [Theory]
    [MemberData(nameof(Examples))]
    public void ExampleParsesToTheExpectedTree(string path)
    {
        var name = Path.GetFileName(path);
        var actual = Dump(DocumentParser.Parse(File.ReadAllText(Path.Combine(TestSupport.RepoRoot, path))));
        var expectedPath = Path.Combine(TestSupport.RepoRoot, "tests", "Parser.Tests", "Snapshots", name + ".txt");
        if (Environment.GetEnvironmentVariable("UPDATE_SNAPSHOTS") == "1") File.WriteAllText(expectedPath, actual);
        Assert.True(File.Exists(expectedPath), $"no snapshot at {expectedPath}; run with UPDATE_SNAPSHOTS=1 and review it");
        Assert.Equal(File.ReadAllText(expectedPath), actual);
    }

    public static string Dump(ParseResult r)
    {
        var sb = new StringBuilder();
        foreach (var line in r.Tree.Lines)
        {
            var n = line.Index + 1;
            switch (line.Kind)
            {
                case LineKind.Blank:
                    continue;
                case LineKind.Comment:
                    sb.Append($"{n,3} comment {line.Comment!.Value.Text}\n");
                    continue;
                case LineKind.ConflictMarker:
                    sb.Append($"{n,3} conflict-marker\n");
                    continue;
            }

            sb.Append($"{n,3} {new string(' ', Math.Max(line.Depth, 0) * 2)}");
            if (line.Statement is { } s)
            {
                sb.Append(s.Keyword);
                foreach (var a in s.Args.OrderBy(a => a.Range.Start)) sb.Append($" {a.Spec.Name}={a.Canonical}@{a.Range.Start.Column + 1}");
            }
            else
            {
                sb.Append("unread: ").Append(line.Content.Trim());
            }

            if (line.IsBroken) sb.Append(" [broken]");
            if (line.Comment is { } c) sb.Append($" {c.Text}");
            sb.Append('\n');
        }

        sb.Append("model:\n");
        foreach (var f in r.Model.Feeders)
        {
            sb.Append($"  feeder {f.Tag?.Value} lines {f.Header.Line.Index + 1}-{f.LastLine + 1}: {f.Motors.Count} motors, {f.Loads.Count} loads\n");
        }

        sb.Append("diagnostics:\n");
        foreach (var d in r.Diagnostics) sb.Append($"  {d}\n");
        return sb.ToString();
    }
}
