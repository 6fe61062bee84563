namespace MotorLang.Parser;

/// <summary>
/// Where the parts of a joined document start (the files of a plant, joined by Analysis) and how a
/// line is named in a message. The parser knows nothing of files: a part is a run of lines.
/// </summary>
internal sealed class DocumentParts(IReadOnlyList<int> starts, Func<int, string> lineLabel)
{
    private readonly HashSet<int> _starts = [.. starts];

    public bool IsStart(int line) => _starts.Contains(line);

    public string LineLabel(int line) => lineLabel(line);
}
