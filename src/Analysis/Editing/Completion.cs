using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;
using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Editing;

public enum CompletionKind { Keyword, Value, Reference }

/// <summary>A completion item in plain terms; the server maps it to the protocol.</summary>
public sealed record CompletionEntry(string Label, CompletionKind Kind, string? Detail, string? Documentation, string SortText);

/// <summary>
/// What may be typed at the cursor: keywords the block allows (not yet written), the words a
/// keyword accepts, wire sizes and device ratings ordered around what the calculation requires,
/// and tags for 'from' and 'like'.
/// </summary>
public static class Completion
{
    public static IReadOnlyList<CompletionEntry> At(AnalysisResult analysis, TextPosition position)
    {
        var lines = analysis.Parse.Tree.Lines;
        if (position.Line >= lines.Length) return [];
        var line = lines[position.Line];
        var before = line.Content[..Math.Min(position.Column, line.Length)];
        var words = before.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var typingFirstWord = words.Length == 0 || (words.Length == 1 && !before.EndsWith(' '));
        if (before.Contains('#')) return [];
        if (typingFirstWord) return Keywords(analysis, position.Line, before.Length - before.TrimStart().Length);

        var spec = MotorLang.Parser.Statements.Keywords.Find(words[0]);
        if (spec is null) return [];
        var owner = OwnerOf(analysis, position.Line);
        var written = words.Length - 1 - (before.EndsWith(' ') ? 0 : 1);
        return Values(analysis, spec, owner, written, words.Skip(1).ToArray()).ToList();
    }

    private static IReadOnlyList<CompletionEntry> Keywords(AnalysisResult analysis, int lineIndex, int indent)
    {
        var parent = ParentBlock(analysis, lineIndex, indent);
        var kind = parent switch
        {
            ProjectNode => BlockKind.Project,
            FeederNode => BlockKind.Feeder,
            MotorNode => BlockKind.Motor,
            LoadNode => BlockKind.Load,
            _ => BlockKind.Root,
        };
        return MotorLang.Parser.Statements.Keywords.AllowedIn(kind)
            .Where(k => k.IsHeader || parent is null || !parent.Has(k.Keyword))
            // The block's own keywords first, then the inherited settings, then headers of new blocks.
            .Select((k, i) => new CompletionEntry(k.Keyword, CompletionKind.Keyword, Signature(k), k.Doc,
                $"{(k.IsHeader ? 2 : k.AllowedIn.Contains(BlockKind.Project) && kind != BlockKind.Project ? 1 : 0)}{i:000}"))
            .ToList();
    }

    private static IEnumerable<CompletionEntry> Values(AnalysisResult analysis, KeywordSpec spec, BlockNode? owner, int written, string[] words)
    {
        var motor = owner is MotorNode m ? analysis.Motors.GetValueOrDefault(m) : null;
        var feeder = owner is FeederNode f ? analysis.Feeders.GetValueOrDefault(f) : null;
        switch (spec.Keyword)
        {
            case "wire":
                return WireSizes(motor?.MinimumWire?.Value ?? feeder?.MinimumWire?.Value, motor?.RequiredAmpacity?.Value ?? feeder?.RequiredAmpacity?.Value);
            case "ground":
                return WireSizes(motor?.MinimumGround?.Value is { } g ? WireSpec.Single(g) : feeder?.MinimumGround?.Value is { } fg ? WireSpec.Single(fg) : null, null, "NEC 250.122");
            case "protection" when written >= 1:
                var max = motor?.MaximumProtection?.Value ?? feeder?.MaximumProtection?.Value;
                var fuse = words.Length > 0 && words[0].Contains("fuse", StringComparison.OrdinalIgnoreCase);
                return Ratings(max, fuse);
            case "from":
                return analysis.Parse.Model.Feeders.Where(x => x != owner).Select(x => Reference(x));
            case "like":
                return analysis.Parse.Model.Motors.Where(x => x != owner).Select(x => Reference(x));
            case "overload" when motor?.OverloadLimit?.Value is { } limit:
                return [new CompletionEntry($"{Format.Number(limit)}A", CompletionKind.Value, "NEC 430.32(A)(1) limit", string.Join("\n", motor.OverloadLimit.Steps.Select(s => $"{s.Label}: {s.Value} ({s.Rule})")), "0")];
        }

        var arg = spec.Args.Where(a => a.Choices is not null).Skip(spec.Keyword == "duty" && written > 1 ? 1 : 0).FirstOrDefault();
        return arg?.Choices is { } choices
            ? choices.Select((c, i) => new CompletionEntry(c.Canonical, CompletionKind.Value, arg.Name, c.Doc, $"{i:000}"))
            : [];
    }

    /// <summary>Sizes from the minimum upward first, then the smaller ones last (marked too small).</summary>
    private static IEnumerable<CompletionEntry> WireSizes(WireSpec? minimum, decimal? required, string rule = "NEC 430.22 / 430.24")
    {
        foreach (var size in ConductorSize.All.Where(s => s >= ConductorSize.Parse("14")))
        {
            var wire = WireSpec.Single(size);
            var tooSmall = minimum is { } min && min.Sets == 1 && size < min.Size;
            var sort = minimum is { } mm && mm.Sets == 1 ? (tooSmall ? 100 + (mm.Size.Index - size.Index) : size.Index - mm.Size.Index) : size.Index;
            var detail = minimum is { } x && size == x.Size && x.Sets == 1 ? $"minimum ({rule})" : tooSmall ? "too small" : null;
            var doc = required is { } r ? $"{Format.Amps(r)} required" : null;
            yield return new CompletionEntry(wire.ToString(), CompletionKind.Value, detail, doc, $"{sort:000}");
        }

        if (minimum is { Sets: > 1 } parallel)
            yield return new CompletionEntry(parallel.ToString(), CompletionKind.Value, $"minimum ({rule})", null, "000");
    }

    /// <summary>Standard ratings at and below the maximum, the maximum first.</summary>
    private static IEnumerable<CompletionEntry> Ratings(decimal? max, bool fuse)
    {
        var ratings = StandardRatings.For(fuse).ToList();
        foreach (var r in ratings)
        {
            var over = max is { } m && r > m;
            var sort = max is { } mx ? (over ? 500 + ratings.IndexOf(r) : (int)Math.Min(499, mx - r)) : ratings.IndexOf(r);
            yield return new CompletionEntry($"{Format.Number(r)}A", CompletionKind.Value,
                max is { } y && r == y ? "maximum (NEC 430.52)" : over ? "above the maximum" : null, null, $"{sort:0000}");
        }
    }

    private static CompletionEntry Reference(CircuitNode n) =>
        new(n.Tag?.Value ?? "", CompletionKind.Reference, n.Keyword, n.Description?.Value, n.Tag?.Value ?? "");

    private static string Signature(KeywordSpec k) =>
        string.Join(" ", k.Args.Select(a => a.Required ? a.Name : $"[{a.Name}]"));

    /// <summary>The block a new line at this indentation would belong to.</summary>
    private static BlockNode? ParentBlock(AnalysisResult analysis, int lineIndex, int indent)
    {
        var lines = analysis.Parse.Tree.Lines;
        for (var i = Math.Min(lineIndex, lines.Length) - 1; i >= 0; i--)
        {
            var l = lines[i];
            if (l.Statement is not { Spec.IsHeader: true } s || l.IndentWidth >= indent) continue;
            return Node(analysis, s);
        }

        return null;
    }

    private static BlockNode? OwnerOf(AnalysisResult analysis, int lineIndex)
    {
        var lines = analysis.Parse.Tree.Lines;
        var line = lines[lineIndex];
        return ParentBlock(analysis, lineIndex, line.IndentWidth);
    }

    private static BlockNode? Node(AnalysisResult analysis, Statement header)
    {
        var model = analysis.Parse.Model;
        if (header.Keyword == "project") return model.Project;
        return header.Arg("tag")?.Value is string tag ? model.Find(tag) : null;
    }
}
