using MotorLang.Parser;
using MotorLang.Parser.Model;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Editing;

public enum OutlineKind { Project, Feeder, Motor, Load }

/// <summary>One entry of the document outline: the whole block's range and the part to select (the tag).</summary>
public sealed record OutlineNode(string Name, string? Detail, OutlineKind Kind, SourceRange Range, SourceRange SelectionRange, IReadOnlyList<OutlineNode> Children);

/// <summary>The outline of a document: project, then feeders with their motors and loads. Never truncated.</summary>
public static class Outline
{
    public static IReadOnlyList<OutlineNode> Of(ParseResult parse)
    {
        var nodes = new List<OutlineNode>();
        var lines = parse.Tree.Lines;
        SourceRange Block(BlockNode b) =>
            new(new TextPosition(b.Header.Line.Index, 0), new TextPosition(b.LastLine, lines[b.LastLine].Length));

        if (parse.Model.Project is { } p)
            nodes.Add(new OutlineNode(p.Name?.Value ?? "project", null, OutlineKind.Project, Block(p), p.Header.KeywordToken.Range, []));
        foreach (var f in parse.Model.Feeders)
        {
            var children = f.Motors.Select(m => Leaf(m, OutlineKind.Motor, Block(m), m.IsCompressor ? "compressor" : m.Power?.Value.ToString()))
                .Concat(f.Loads.Select(l => Leaf(l, OutlineKind.Load, Block(l), (l.Current ?? l.ApparentPower)?.Value.ToString())))
                .OrderBy(n => n.Range.Start).ToList();
            nodes.Add(Leaf(f, OutlineKind.Feeder, Block(f), $"{f.Voltage?.Value} {f.Description?.Value}".Trim()) with { Children = children });
        }

        return nodes;
    }

    private static OutlineNode Leaf(CircuitNode n, OutlineKind kind, SourceRange range, string? detail)
    {
        var description = n.Description?.Value;
        var text = string.Join(" ", new[] { detail, description }.Where(s => !string.IsNullOrEmpty(s)));
        return new OutlineNode(n.Tag?.Value ?? "(no tag)", text.Length == 0 ? null : text, kind, range, n.Tag?.Range ?? n.Header.KeywordToken.Range, []);
    }
}
