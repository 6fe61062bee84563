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

    public DocumentSnapshot(string uri, int version, string text) : this(uri, version, text, null, null)
    {
    }

    /// <summary>
    /// A snapshot after an edit inside line <paramref name="editedLine"/> of <paramref name="previous"/>:
    /// when the edit cannot change the document's structure, only that line is re-read and only
    /// what it can affect is analysed again (<see cref="DocumentParser.ReparseLine"/>,
    /// <see cref="Analyzer.Update"/>). Only an already-analyzed previous snapshot is used, so
    /// snapshots never form a chain that keeps old texts alive.
    /// </summary>
    public DocumentSnapshot(string uri, int version, string text, DocumentSnapshot? previous, int? editedLine)
    {
        Uri = uri;
        Version = version;
        Text = text;
        var before = previous is not null && editedLine is not null && previous._analysis.IsValueCreated ? previous._analysis.Value : null;
        _parse = new Lazy<ParseResult>(
            () => (before is not null ? DocumentParser.ReparseLine(before.Parse, text, editedLine!.Value) : null) ?? DocumentParser.Parse(text),
            LazyThreadSafetyMode.ExecutionAndPublication);
        _analysis = new Lazy<AnalysisResult>(
            () => (before is not null ? Analyzer.Update(before, _parse.Value) : null) ?? Analyzer.Analyze(_parse.Value),
            LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Uri { get; }
    public int Version { get; }
    public string Text { get; }
    public ParseResult Parse => _parse.Value;
    public AnalysisResult Analysis => _analysis.Value;
}
