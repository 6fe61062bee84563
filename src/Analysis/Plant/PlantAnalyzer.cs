using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Parser;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Syntax;

namespace MotorLang.Analysis.Plant;

/// <summary>
/// The plant layer: joins the per-file texts of a plant into one model and analyses it once, so that
/// every rule that spans feeders (430.24 and 430.62 sums, the drop from the source, fire pump
/// supplies, 'from' and 'like', unique tags, the project's settings) sees the whole plant, then
/// gives each finding back to its file. Files know nothing of each other; only this layer joins them.
/// </summary>
public static class PlantAnalyzer
{
    /// <summary>
    /// Analyses <paramref name="files"/> together, in the order given (the plant file first, then
    /// the others in ordinal order of name: see src/Files PlantFolders). <paramref name="leftOut"/>
    /// are files under the plant's folder that are not part of it; each is reported (P031) on the
    /// plant file's 'plant' statement.
    /// </summary>
    public static PlantAnalysis Analyze(IReadOnlyList<PlantFile> files, IReadOnlyList<PlantLeftOut>? leftOut = null)
    {
        // A file the parser would not read (too large, binary) stays out of the join, or it would
        // take every other file down with it; it gets its own diagnostics, as on its own.
        var apart = new Dictionary<string, AnalysisResult>(StringComparer.Ordinal);
        var joinable = new List<PlantFile>();
        foreach (var f in files)
        {
            if (f.Text.Length > DocumentParser.MaxChars || f.Text.Contains('\0')) apart[f.Name] = Analyzer.Analyze(f.Text);
            else joinable.Add(f);
        }

        PlantJoin? join = null;
        AnalysisResult? joined = null;
        if (joinable.Count > 0)
        {
            join = PlantJoin.Of(joinable);
            joined = Analyzer.Analyze(DocumentParser.ParseJoined(join.Text, join.Starts, join.LineLabel));
        }

        return Build(files, join, joined, apart, leftOut ?? []);
    }

    /// <summary>
    /// The plant after <paramref name="file"/>'s text became <paramref name="newText"/> by an edit
    /// inside one line: that line of the joined model is re-read and only what it reaches is sized
    /// again (<see cref="DocumentParser.ReparseLine(ParseResult, int, string)"/>,
    /// <see cref="Analyzer.Update"/>), as for a single file, so a keystroke in one MCC file does not
    /// parse and size the whole plant. Null when the texts differ in more than one line, or the
    /// edit can change the structure (a new line, a tag, 'from', 'like', the project block...): then
    /// call <see cref="Analyze"/>. The result equals <see cref="Analyze"/> of the new texts; a
    /// property test checks that on random edits.
    /// </summary>
    public static PlantAnalysis? Update(PlantAnalysis previous, string file, string newText)
    {
        if (previous.Join is not { } join || previous.Joined is not { } joined || previous.Apart.Contains(file)) return null;
        var index = join.IndexOf(file);
        var position = previous.Files.ToList().FindIndex(f => f.Name == file);
        if (index < 0 || position < 0) return null;
        var old = join.File(index).Text;
        if (ReferenceEquals(old, newText) || old == newText) return previous;
        if (newText.Length > DocumentParser.MaxChars || newText.Contains('\0') || EditedLine(old, newText) is not var (line, content)) return null;
        var parse = DocumentParser.ReparseLine(joined.Parse, join.Starts[index] + line, content);
        if (parse is null) return null;
        var analysis = Analyzer.Update(joined, parse) ?? Analyzer.Analyze(parse);
        var files = previous.Files.ToArray();
        files[position] = files[position] with { Text = newText };
        return Build(files, join.WithFile(index, files[position]), analysis, previous.ApartAnalyses, previous.LeftOut);
    }

    /// <summary>
    /// The one line two texts differ in, and its new content without its line ending; null when they
    /// differ across a line break (or in a byte order mark).
    /// </summary>
    private static (int Line, string Content)? EditedLine(string old, string now)
    {
        var prefix = old.AsSpan().CommonPrefixLength(now);
        var max = Math.Min(old.Length, now.Length) - prefix;
        var suffix = 0;
        while (suffix < max && old[^(suffix + 1)] == now[^(suffix + 1)]) suffix++;
        if (prefix == 0 && (old.StartsWith('\uFEFF') || now.StartsWith('\uFEFF'))) return null;
        // The changed characters, in either text, lie inside one line (and are not its ending).
        if (old.AsSpan(prefix, old.Length - suffix - prefix).IndexOfAny('\n', '\r') >= 0) return null;
        if (now.AsSpan(prefix, now.Length - suffix - prefix).IndexOfAny('\n', '\r') >= 0) return null;
        var lineStart = prefix == 0 ? 0 : now.LastIndexOf('\n', prefix - 1) + 1;
        var lineEnd = now.IndexOf('\n', prefix);
        if (lineEnd < 0) lineEnd = now.Length;
        var content = now[lineStart..lineEnd];
        if (content.EndsWith('\r')) content = content[..^1];
        if (lineStart == 0 && content.StartsWith('\uFEFF')) content = content[1..];
        return (old.AsSpan(0, lineStart).Count('\n'), content);
    }

    /// <summary>The plant's findings from its joined analysis and the analyses of the files apart, each in its own file.</summary>
    private static PlantAnalysis Build(IReadOnlyList<PlantFile> files, PlantJoin? join, AnalysisResult? joined,
        IReadOnlyDictionary<string, AnalysisResult> apart, IReadOnlyList<PlantLeftOut> leftOut)
    {
        var found = new List<PlantFinding>();
        var acknowledged = new List<(string, Acknowledgement)>();
        if (join is not null && joined is not null)
        {
            foreach (var f in joined.Findings) found.Add(Map(join, f));
            foreach (var a in joined.Acknowledged)
            {
                var mapped = Map(join, a.Finding);
                var directiveFile = join.FileOf(a.Directive.Start.Line);
                acknowledged.Add((mapped.File, a with { Finding = mapped.Finding, Directive = join.ToFile(directiveFile, a.Directive) }));
            }

            AddTagsUsedAgain(join, joined, found);
            AddLeftOut(join, joined, leftOut, found);
        }

        foreach (var (name, alone) in apart)
        {
            foreach (var a in alone.Acknowledged) acknowledged.Add((name, a));
            foreach (var f in alone.Findings) found.Add(new PlantFinding(name, f, [.. f.RelatedLocations.Select(_ => name)], Edits(f, name)));
        }

        var order = files.Select((f, i) => (f.Name, i)).ToDictionary(p => p.Name, p => p.i, StringComparer.Ordinal);
        var sorted = found.OrderBy(f => order[f.File]).ThenBy(f => f.Finding.Range.Start).ToImmutableArray();
        return new PlantAnalysis(files, join, joined, sorted, new HashSet<string>(apart.Keys, StringComparer.Ordinal), [.. acknowledged], leftOut, apart);
    }

    private static ImmutableArray<string> Edits(Finding f, string file) => f.Fix is null ? [] : [.. f.Fix.Edits.Select(_ => file)];

    private static PlantFinding Map(PlantJoin join, Finding f)
    {
        var file = join.FileOf(f.Range.Start.Line);
        var related = f.RelatedLocations.Select(r => (File: join.FileOf(r.Range.Start.Line), r)).ToList();
        var edits = f.Fix?.Edits.Select(e => (File: join.FileOf(e), e)).ToList();
        var local = f with
        {
            Range = join.ToFile(file, f.Range),
            Related = f.Related.IsDefault ? f.Related : [.. related.Select(p => p.r with { Range = join.ToFile(p.File, p.r.Range) })],
            Fix = f.Fix is null ? null : f.Fix with { Edits = [.. edits!.Select(p => join.ToFile(p.File, p.e))] },
        };
        return new PlantFinding(join.Name(file), local, [.. related.Select(p => join.Name(p.File))], edits is null ? [] : [.. edits.Select(p => join.Name(p.File))]);
    }

    /// <summary>
    /// The second use of a tag gets P013 where it is written; when the first is in another file, that
    /// file is told too (P030), since its author may never open the other.
    /// </summary>
    private static void AddTagsUsedAgain(PlantJoin join, AnalysisResult joined, List<PlantFinding> into)
    {
        foreach (var f in joined.Findings)
        {
            if (f.Code != SyntaxCodes.DuplicateTag) continue;
            var line = joined.Parse.Tree.Lines[f.Range.Start.Line];
            var token = line.Tokens.FirstOrDefault(t => t.Column == f.Range.Start.Column);
            if (token.Text is null || joined.Parse.Model.Find(token.Text) is not { Tag: { } first }) continue;
            int firstFile = join.FileOf(first.Range.Start.Line), againFile = join.FileOf(f.Range.Start.Line);
            if (firstFile == againFile) continue;
            var message = $"tag '{first.Value}' is used again on {join.LineLabel(f.Range.Start.Line)}; tags must be unique in a plant";
            into.Add(new PlantFinding(join.Name(firstFile), new Finding(PlantCodes.TagUsedInAnotherFile, Severity.Error, join.ToFile(firstFile, first.Range), message), [], []));
        }
    }

    private static void AddLeftOut(PlantJoin join, AnalysisResult joined, IReadOnlyList<PlantLeftOut> leftOut, List<PlantFinding> into)
    {
        if (leftOut.Count == 0) return;
        var plant = joined.Parse.Model.Project?.Plant;
        var range = plant?.KeywordToken.Range ?? MotorLang.Parser.Text.SourceRange.OnLine(0, 0, 0);
        var file = join.FileOf(range.Start.Line);
        foreach (var l in leftOut)
        {
            into.Add(new PlantFinding(join.Name(file), new Finding(PlantCodes.FileLeftOut, Severity.Error, join.ToFile(file, range),
                $"'{l.Name}' is under this plant's folder but not part of the plant: {l.Reason}"), [], []));
        }
    }
}
