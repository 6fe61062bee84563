using System.Collections.Immutable;
using MotorLang.Parser;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Findings;

/// <summary>A finding the engineer has acknowledged in the list, with the reason written beside it.</summary>
public sealed record Acknowledgement(Finding Finding, string Reason, SourceRange Directive);

/// <summary>
/// Acknowledgement directives: a comment `# acknowledge M205: reason` at the end of the line a
/// finding is on, or on a comment line of its own above it (blank and comment lines between are
/// passed over). A directive with a reason takes the findings it names off that line: they are no
/// longer reported (so `check` passes) but listed as acknowledged, with the reason. A directive
/// that matches nothing (M320), names an unknown code (M321) or gives no reason (M322) is itself
/// reported, and one without a reason acknowledges nothing. The editor and `check` both read the
/// result from here, so they judge alike.
/// </summary>
public static class Acknowledgements
{
    public const string Word = "acknowledge";

    /// <summary>Codes that are about the directives or the report itself, so acknowledging them would hide the mechanism.</summary>
    private static readonly HashSet<string> NotAcknowledgeable =
        [FindingCodes.NotShown, FindingCodes.AcknowledgementStale, FindingCodes.AcknowledgementBadCode, FindingCodes.AcknowledgementWithoutReason];

    private static readonly HashSet<string> Known = typeof(FindingCodes).GetFields()
        .Select(f => (string)f.GetValue(null)!).ToHashSet(StringComparer.Ordinal);

    /// <summary>A directive as written: the codes it names, its reason (empty when missing), the line it applies to.</summary>
    private sealed record Directive(SyntaxToken Comment, IReadOnlyList<(string Code, int Column)> Codes, string Reason, int TargetLine, bool OwnLine);

    /// <summary>The findings to report (those acknowledged taken out, the directives' own findings put in line order) and the acknowledged ones.</summary>
    public static (ImmutableArray<Finding> Reported, ImmutableArray<Acknowledgement> Acknowledged) Apply(ParseResult parse, ImmutableArray<Finding> findings)
    {
        var directives = Find(parse.Tree.Lines);
        if (directives.Count == 0) return (findings, []);

        var own = new List<Finding>();
        var acknowledged = new List<Acknowledgement>();
        var taken = new HashSet<Finding>(ReferenceEqualityComparer.Instance);
        var byLine = findings.ToLookup(f => f.Range.Start.Line);
        foreach (var d in directives)
        {
            var valid = new List<(string Code, int Column)>();
            if (d.Codes.Count == 0)
                own.Add(new Finding(FindingCodes.AcknowledgementBadCode, Severity.Warning, d.Comment.Range,
                    $"'{Word}' names no finding code; write '# {Word} M205: why the finding is justified'"));
            foreach (var (code, column) in d.Codes)
            {
                var range = SourceRange.OnLine(d.Comment.Line, column, code.Length);
                if (code.StartsWith('P'))
                    own.Add(new Finding(FindingCodes.AcknowledgementBadCode, Severity.Warning, range,
                        $"{code} is about the text itself and cannot be acknowledged: correct the line instead"));
                else if (!Known.Contains(code) || NotAcknowledgeable.Contains(code))
                    own.Add(new Finding(FindingCodes.AcknowledgementBadCode, Severity.Warning, range,
                        $"'{code}' is not a finding code that can be acknowledged (see docs/checks.md)"));
                else valid.Add((code, column));
            }

            if (d.Reason.Length == 0)
            {
                if (d.Codes.Count > 0)
                    own.Add(new Finding(FindingCodes.AcknowledgementWithoutReason, Severity.Warning, d.Comment.Range,
                        $"an acknowledgement needs its reason after a colon ('# {Word} {d.Codes[0].Code}: why'); until then it acknowledges nothing"));
                continue;
            }

            foreach (var (code, column) in valid)
            {
                var matched = byLine[d.TargetLine].Where(f => f.Code == code && !taken.Contains(f)).ToList();
                if (matched.Count == 0)
                {
                    own.Add(new Finding(FindingCodes.AcknowledgementStale, Severity.Warning, SourceRange.OnLine(d.Comment.Line, column, code.Length),
                        $"acknowledges {code}, but there is no {code} on {(d.OwnLine ? $"line {d.TargetLine + 1}" : "this line")} any more: remove the acknowledgement",
                        RemoveFix(parse.Tree.Lines, d)));
                    continue;
                }

                foreach (var f in matched)
                {
                    taken.Add(f);
                    acknowledged.Add(new Acknowledgement(f, d.Reason, d.Comment.Range));
                }
            }
        }

        var reported = findings.Where(f => !taken.Contains(f)).ToList();
        foreach (var f in own)
        {
            // Into line order, after the findings already on or before that line.
            var at = reported.FindIndex(r => r.Range.Start.Line > f.Range.Start.Line);
            reported.Insert(at < 0 ? reported.Count : at, f);
        }

        return ([.. reported], [.. acknowledged]);
    }

    private static List<Directive> Find(LineList lines)
    {
        var found = new List<Directive>();
        var pending = new List<(SyntaxToken Comment, IReadOnlyList<(string, int)> Codes, string Reason)>();
        foreach (var line in lines)
        {
            if (line.InConflict) continue;
            var kind = line.Kind;
            if (kind == LineKind.Blank) continue;
            var parsed = line.Comment is { } c ? Read(c) : null;
            if (kind == LineKind.Comment)
            {
                if (parsed is { } p) pending.Add((line.Comment!.Value, p.Codes, p.Reason));
                continue;
            }

            foreach (var p in pending) found.Add(new Directive(p.Comment, p.Codes, p.Reason, line.Index, OwnLine: true));
            pending.Clear();
            if (parsed is { } t) found.Add(new Directive(line.Comment!.Value, t.Codes, t.Reason, line.Index, OwnLine: false));
        }

        // Directives above nothing apply to no line, so they can only be stale.
        foreach (var p in pending) found.Add(new Directive(p.Comment, p.Codes, p.Reason, -1, OwnLine: true));
        return found;
    }

    /// <summary>Reads `# acknowledge CODE[, CODE...]: reason`; null for any other comment.</summary>
    private static (IReadOnlyList<(string Code, int Column)> Codes, string Reason)? Read(SyntaxToken comment)
    {
        var text = comment.Text;
        var i = 1;
        while (i < text.Length && text[i] == ' ') i++;
        if (string.CompareOrdinal(text, i, Word, 0, Word.Length) != 0) return null;
        var after = i + Word.Length;
        if (after < text.Length && text[after] is not (' ' or ':')) return null; // 'acknowledged', 'acknowledgement': ordinary prose
        var colon = text.IndexOf(':', after);
        var codesEnd = colon < 0 ? text.Length : colon;
        var codes = new List<(string, int)>();
        var k = after;
        while (k < codesEnd)
        {
            if (text[k] is ' ' or ',')
            {
                k++;
                continue;
            }

            var start = k;
            while (k < codesEnd && text[k] is not (' ' or ',')) k++;
            codes.Add((text[start..k].ToUpperInvariant(), comment.Column + start));
        }

        var reason = colon < 0 ? "" : text[(colon + 1)..].Trim();
        return (codes, reason);
    }

    /// <summary>Deletes a stale directive: its whole line when it stands alone, else the comment and the blanks before it.</summary>
    private static Fix RemoveFix(LineList lines, Directive d)
    {
        var line = lines[d.Comment.Line];
        if (line.Kind == LineKind.Comment)
        {
            var end = d.Comment.Line + 1 < lines.Count ? new TextPosition(d.Comment.Line + 1, 0) : new TextPosition(d.Comment.Line, line.Length);
            return new Fix("Remove the stale acknowledgement", [new TextEdit(new SourceRange(new TextPosition(d.Comment.Line, 0), end), "")]);
        }

        var from = d.Comment.Column;
        var content = line.ContentSpan;
        while (from > 0 && content[from - 1] is ' ' or '\t') from--;
        return new Fix("Remove the stale acknowledgement",
            [new TextEdit(new SourceRange(new TextPosition(d.Comment.Line, from), new TextPosition(d.Comment.Line, line.Length)), "")]);
    }
}
