using MotorLang.Parser;
using MotorLang.Parser.Model;
using MotorLang.Parser.Syntax;

namespace MotorLang.Analysis.Editing;

/// <summary>A foldable line range; <see cref="Comment"/> marks a run of comment lines.</summary>
public readonly record struct FoldRange(int StartLine, int EndLine, bool Comment);

/// <summary>Folding ranges: every block with lines under it, and every run of two or more comment lines.</summary>
public static class Folding
{
    public static IReadOnlyList<FoldRange> Of(ParseResult parse)
    {
        var ranges = new List<FoldRange>();
        void Add(BlockNode b)
        {
            if (b.LastLine > b.Header.Line.Index) ranges.Add(new FoldRange(b.Header.Line.Index, b.LastLine, false));
        }

        if (parse.Model.Project is { } p) Add(p);
        foreach (var f in parse.Model.Feeders)
        {
            Add(f);
            foreach (var m in f.Motors) Add(m);
        }

        var lines = parse.Tree.Lines;
        for (var i = 0; i < lines.Length; i++)
        {
            if (lines[i].Kind != LineKind.Comment) continue;
            var j = i;
            while (j + 1 < lines.Length && lines[j + 1].Kind == LineKind.Comment) j++;
            if (j > i) ranges.Add(new FoldRange(i, j, true));
            i = j;
        }

        return ranges.OrderBy(r => r.StartLine).ToList();
    }
}
