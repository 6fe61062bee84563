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

    public DocumentSnapshot(string uri, int version, string text)
    {
        Uri = uri;
        Version = version;
        Text = text;
        _parse = new Lazy<ParseResult>(() => DocumentParser.Parse(text), LazyThreadSafetyMode.ExecutionAndPublication);
        _analysis = new Lazy<AnalysisResult>(() => Analyzer.Analyze(_parse.Value), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Uri { get; }
    public int Version { get; }
    public string Text { get; }
    public ParseResult Parse => _parse.Value;
    public AnalysisResult Analysis => _analysis.Value;
}
