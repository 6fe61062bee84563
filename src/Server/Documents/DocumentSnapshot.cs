using MotorLang.Analysis;
using MotorLang.Parser;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Documents;

/// <summary>
/// One version of one document, never changed once made (as seen from outside). Parsing and
/// analysis happen at most once per snapshot, on first use, and are shared by every request that
/// reads this version.
/// <para>
/// A version after a change is only the earlier version and the change: nothing is parsed or
/// joined when it is made, so keystrokes that come faster than analysis cost almost nothing. When
/// a version is first read, its tree is made from the nearest earlier version that has one,
/// applying every change since in order (<see cref="EditChain"/>): changes that keep lines where
/// they are re-read just their lines, chained into one model edit from the last analysed version,
/// so one update sizes again the union of what they reach; the first change that moves lines or
/// the structure turns the rest into text edits, read by one full parse at the end.
/// </para>
/// </summary>
public sealed class DocumentSnapshot
{
    /// <summary>Versions not yet read that may pile up before a change reads the one before it, which bounds the work and memory a burst of changes can defer.</summary>
    internal const int MaxPending = 512;

    private readonly Lazy<ParseResult> _parse;
    private readonly Lazy<AnalysisResult> _analysis;
    private readonly string? _text;

    // The version this one was made from and the change that made it; cleared once this version
    // is parsed, so that reading it lets every earlier version go.
    private volatile DocumentSnapshot? _previous;
    private readonly IReadOnlyList<TextDocumentContentChangeEvent>? _changes;

    // The analysed version this one's model edit is relative to (null: analyse in full); set when parsed.
    private volatile DocumentSnapshot? _editBase;

    public DocumentSnapshot(string uri, int version, string text)
    {
        Uri = uri;
        Version = version;
        _text = text;
        _parse = new Lazy<ParseResult>(() => DocumentParser.Parse(text), LazyThreadSafetyMode.ExecutionAndPublication);
        _analysis = new Lazy<AnalysisResult>(() => Analyzer.Analyze(_parse.Value), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    private DocumentSnapshot(DocumentSnapshot previous, int version, IReadOnlyList<TextDocumentContentChangeEvent> changes)
    {
        Uri = previous.Uri;
        Version = version;
        _previous = previous;
        _changes = changes;
        Pending = previous.IsParsed ? 1 : previous.Pending + 1;
        _parse = new Lazy<ParseResult>(Read, LazyThreadSafetyMode.ExecutionAndPublication);
        _analysis = new Lazy<AnalysisResult>(Analyse, LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Uri { get; }
    public int Version { get; }

    /// <summary>The document's text (after a change, joined from the parsed lines on first use).</summary>
    public string Text => _text ?? Parse.Tree.Text;

    public ParseResult Parse => _parse.Value;
    public AnalysisResult Analysis => _analysis.Value;

    internal bool IsParsed => _parse.IsValueCreated;

    internal bool IsAnalysed => _analysis.IsValueCreated;

    /// <summary>True when the analysis was updated from an earlier version's rather than made in full (for tests).</summary>
    internal bool Updated { get; private set; }

    /// <summary>How many versions up to this one are not parsed yet.</summary>
    internal int Pending { get; }

    /// <summary>
    /// The next version: this one with <paramref name="changes"/> applied in order (LSP
    /// semantics), made without parsing anything. When too many versions wait unread, this one is
    /// read first.
    /// </summary>
    public DocumentSnapshot WithChanges(int version, IReadOnlyList<TextDocumentContentChangeEvent> changes)
    {
        if (Pending >= MaxPending) _ = Parse;
        return new DocumentSnapshot(this, version, changes);
    }

    private ParseResult Read()
    {
        // The versions back to the nearest one with a tree (or text), then their changes in order.
        var chain = new List<DocumentSnapshot>();
        var origin = this;
        while (!origin.IsParsed && origin._previous is { } previous)
        {
            chain.Add(origin);
            origin = previous;
        }

        chain.Reverse();
        var changes = chain.SelectMany(s => s._changes!);
        var originBase = origin._editBase;
        var (parse, editBase) = origin.IsParsed
            ? EditChain.Apply(origin.Parse, origin.IsAnalysed ? origin : originBase, changes)
            : (EditChain.ApplyToText(origin.Text, changes), null);
        _editBase = editBase;
        _previous = null;
        return parse;
    }

    private AnalysisResult Analyse()
    {
        var parse = _parse.Value;
        if (_editBase is { } editBase && Analyzer.Update(editBase.Analysis, parse) is { } updated)
        {
            _editBase = null;
            Updated = true;
            return updated;
        }

        _editBase = null;
        return Analyzer.Analyze(parse);
    }
}
