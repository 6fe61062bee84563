using MotorLang.Analysis;
using MotorLang.Parser;

namespace MotorLang.Server.Documents;

/// <summary>
/// One version of one document, never changed once made. Parsing and analysis happen at most
/// once per snapshot, on first use, and are shared by every request that reads this version.
/// </summary>
public sealed class DocumentSnapshot
{
    private readonly Lazy<ParseResult> _parse;
    private readonly Lazy<AnalysisResult> _analysis;
    private readonly string? _text;

    public DocumentSnapshot(string uri, int version, string text)
    {
        Uri = uri;
        Version = version;
        _text = text;
        _parse = new Lazy<ParseResult>(() => DocumentParser.Parse(text), LazyThreadSafetyMode.ExecutionAndPublication);
        _analysis = new Lazy<AnalysisResult>(() => Analyzer.Analyze(_parse.Value), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>
    /// The snapshot after an edit that stayed inside line <paramref name="line"/> of an analysed
    /// snapshot, given that line's new content. Only that line is re-read and only what it can
    /// affect is analysed again (<see cref="DocumentParser.ReparseLine(ParseResult, int, string)"/>,
    /// <see cref="Analyzer.Update"/>); the text is joined from the tree only when something asks
    /// for it. When the line cannot be re-read on its own, the whole text is parsed.
    /// </summary>
    private DocumentSnapshot(string uri, int version, AnalysisResult before, int line, string content)
    {
        Uri = uri;
        Version = version;
        _parse = new Lazy<ParseResult>(
            () => DocumentParser.ReparseLine(before.Parse, line, content) ?? DocumentParser.Parse(before.Parse.Tree.WithLine(line, content)),
            LazyThreadSafetyMode.ExecutionAndPublication);
        _analysis = new Lazy<AnalysisResult>(() => Analyzer.Update(before, _parse.Value) ?? Analyzer.Analyze(_parse.Value),
            LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Uri { get; }
    public int Version { get; }

    /// <summary>The document's text (after a one-line edit, joined from the parsed lines on first use).</summary>
    public string Text => _text ?? Parse.Tree.Text;

    public ParseResult Parse => _parse.Value;
    public AnalysisResult Analysis => _analysis.Value;

    /// <summary>
    /// The next version after a change inside one line, or null when this snapshot has not been
    /// analysed yet (building on it would chain unanalysed snapshots and keep old versions alive)
    /// or the line does not exist.
    /// </summary>
    public DocumentSnapshot? WithLineEdit(int version, int line, int startCharacter, int endCharacter, string inserted)
    {
        if (!_analysis.IsValueCreated) return null;
        var before = _analysis.Value;
        var lines = before.Parse.Tree.Lines;
        if (line < 0 || line >= lines.Length) return null;
        var old = lines[line].ContentSpan;
        // Characters past the end of the line mean its end, as the protocol asks.
        var start = Math.Clamp(startCharacter, 0, old.Length);
        var end = Math.Clamp(endCharacter, start, old.Length);
        var content = string.Concat(old[..start], inserted, old[end..]);
        return new DocumentSnapshot(Uri, version, before, line, content);
    }
}
