using System.Collections.Immutable;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Plant;

/// <summary>
/// The analysis of a plant: its files analysed together (one model over all of them, so 'from',
/// 'like', tags and the feeder sums reach across files) and every finding in the file it concerns.
/// </summary>
public sealed class PlantAnalysis
{
    private readonly PlantJoin? _join;
    private readonly Dictionary<string, int> _index;

    internal PlantAnalysis(IReadOnlyList<PlantFile> files, PlantJoin? join, AnalysisResult? joined, ImmutableArray<PlantFinding> findings,
        IReadOnlySet<string> apart, ImmutableArray<(string File, Acknowledgement Acknowledgement)> acknowledged,
        IReadOnlyList<PlantLeftOut> leftOut, IReadOnlyDictionary<string, AnalysisResult> apartAnalyses)
    {
        LeftOut = leftOut;
        ApartAnalyses = apartAnalyses;
        Acknowledged = acknowledged;
        Files = files;
        _join = join;
        Joined = joined;
        Findings = findings;
        Apart = apart;
        _index = files.Select((f, i) => (f.Name, i)).ToDictionary(p => p.Name, p => p.i, StringComparer.Ordinal);
    }

    internal PlantJoin? Join => _join;

    /// <summary>The files under the folder left out of the plant, as given.</summary>
    internal IReadOnlyList<PlantLeftOut> LeftOut { get; }

    /// <summary>The analyses of the files that were analysed on their own (<see cref="Apart"/>).</summary>
    internal IReadOnlyDictionary<string, AnalysisResult> ApartAnalyses { get; }

    /// <summary>The plant's files, the plant file first.</summary>
    public IReadOnlyList<PlantFile> Files { get; }

    /// <summary>
    /// The analysis of the files read together; its positions are lines of the joined text (see
    /// <see cref="FileOfLine"/>). Null when no file could be joined.
    /// </summary>
    public AnalysisResult? Joined { get; }

    /// <summary>Files that were analysed on their own because they could not be read as text (too large, binary).</summary>
    public IReadOnlySet<string> Apart { get; }

    /// <summary>Every finding, by file in the order of <see cref="Files"/>, then by position.</summary>
    public ImmutableArray<PlantFinding> Findings { get; }

    /// <summary>Findings taken out by an acknowledgement comment, each in its file's own lines.</summary>
    public ImmutableArray<(string File, Acknowledgement Acknowledgement)> Acknowledged { get; }

    public IReadOnlyList<Acknowledgement> AcknowledgedOf(string file) => Acknowledged.Where(a => a.File == file).Select(a => a.Acknowledgement).ToList();

    public bool HasErrors => Findings.Any(f => f.Finding.Severity == MotorLang.Parser.Diagnostics.Severity.Error);

    /// <summary>The findings of one file, in its own lines and columns.</summary>
    public IReadOnlyList<Finding> FindingsOf(string file) => Findings.Where(f => f.File == file).Select(f => f.Finding).ToList();

    /// <summary>The file and the line in it of a line of <see cref="Joined"/>.</summary>
    public (string File, int Line) FileOfLine(int joinedLine)
    {
        if (_join is null) throw new InvalidOperationException("no file of this plant was joined");
        var file = _join.FileOf(joinedLine);
        return (_join.Name(file), _join.ToFile(file, new TextPosition(joinedLine, 0)).Line);
    }

    /// <summary>A range in one file as a range of <see cref="Joined"/>.</summary>
    public SourceRange ToJoined(string file, SourceRange range) =>
        _join is not null && _index.ContainsKey(file) && !Apart.Contains(file) && _join.IndexOf(file) is var i and >= 0
            ? _join.ToJoined(i, range)
            : throw new ArgumentException($"'{file}' is not a joined file of this plant", nameof(file));

    /// <summary>A range of <see cref="Joined"/> in its own file.</summary>
    public (string File, SourceRange Range) ToFile(SourceRange joined)
    {
        var (file, _) = FileOfLine(joined.Start.Line);
        return (file, _join!.ToFile(_join.FileOf(joined.Start.Line), joined));
    }

    /// <summary>"Size everything" over the plant: every fix at once, each edit in the file that holds the value.</summary>
    public ImmutableArray<PlantEdit> SizeEverything()
    {
        if (_join is null || Joined is null) return [];
        return [.. Joined.SizeEverything().Select(e =>
        {
            var file = _join.FileOf(e);
            return new PlantEdit(_join.Name(file), _join.ToFile(file, e));
        })];
    }
}
