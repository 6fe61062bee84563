using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Plant;

/// <summary>
/// The files of a plant joined into one text, and the map from its lines back to each file's own.
/// Each file starts on a line of its own: a byte order mark is left out (columns never count it),
/// and a file that does not end in a line break is given one, which <see cref="ToFile(int, TextEdit)"/>
/// takes back out of an edit that lands after it.
/// </summary>
internal sealed class PlantJoin
{
    private readonly IReadOnlyList<PlantFile> _files;
    private readonly int[] _starts;
    private readonly int[] _lineCounts;
    private readonly bool[] _addedBreak;

    private string? _text;

    private PlantJoin(IReadOnlyList<PlantFile> files, string? text, int[] starts, int[] lineCounts, bool[] addedBreak)
    {
        _files = files;
        _text = text;
        _starts = starts;
        _lineCounts = lineCounts;
        _addedBreak = addedBreak;
    }

    /// <summary>The joined text (after <see cref="WithFile"/>, joined again only when asked).</summary>
    public string Text => _text ??= Of(_files)._text!;

    /// <summary>The index of a joined file, or -1.</summary>
    public int IndexOf(string name)
    {
        for (var i = 0; i < _files.Count; i++)
        {
            if (_files[i].Name == name) return i;
        }

        return -1;
    }

    public PlantFile File(int index) => _files[index];

    /// <summary>
    /// The join after file <paramref name="index"/>'s text changed inside one line: the same lines in
    /// the same places, so the line map is shared; the joined text is made again only if asked for.
    /// </summary>
    public PlantJoin WithFile(int index, PlantFile file)
    {
        var files = _files.ToArray();
        files[index] = file;
        return new PlantJoin(files, null, _starts, _lineCounts, _addedBreak);
    }

    public IReadOnlyList<int> Starts => _starts;

    public static PlantJoin Of(IReadOnlyList<PlantFile> files)
    {
        var sb = new System.Text.StringBuilder();
        var starts = new int[files.Count];
        var counts = new int[files.Count];
        var added = new bool[files.Count];
        var line = 0;
        for (var i = 0; i < files.Count; i++)
        {
            var text = files[i].Text.AsSpan();
            if (text.Length > 0 && text[0] == '\uFEFF') text = text[1..];
            starts[i] = line;
            sb.Append(text);
            if (text.Length == 0 || text[^1] != '\n')
            {
                sb.Append('\n');
                added[i] = true;
            }

            counts[i] = text.Count('\n') + (added[i] ? 1 : 0);
            line += counts[i];
        }

        return new PlantJoin(files, sb.ToString(), starts, counts, added);
    }

    /// <summary>The file a line of the joined text belongs to (the joined text's last, empty line is the last file's).</summary>
    public int FileOf(int line)
    {
        var i = Array.BinarySearch(_starts, line);
        if (i < 0) i = ~i - 1;
        return Math.Clamp(i, 0, _starts.Length - 1);
    }

    public string Name(int file) => _files[file].Name;

    /// <summary>How a message names a line of the joined text: its line in its file.</summary>
    public string LineLabel(int line)
    {
        var file = FileOf(line);
        return $"line {line - _starts[file] + 1} of {_files[file].Name}";
    }

    public TextPosition ToFile(int file, TextPosition p) => p with { Line = p.Line - _starts[file] };

    public SourceRange ToFile(int file, SourceRange r) => new(ToFile(file, r.Start), ToFile(file, r.End));

    public SourceRange ToJoined(int file, SourceRange r) =>
        new(r.Start with { Line = r.Start.Line + _starts[file] }, r.End with { Line = r.End.Line + _starts[file] });

    /// <summary>
    /// The file an edit belongs to. An insertion at the start of a file's first line is the line
    /// added after the last statement of the file before it (statements are only ever added after
    /// another statement of their block, and a block never runs into the next file).
    /// </summary>
    public int FileOf(TextEdit edit)
    {
        var file = FileOf(edit.Range.Start.Line);
        var insertAtStart = edit.Range.Start == edit.Range.End && edit.Range.Start.Column == 0 && edit.Range.Start.Line == _starts[file];
        return insertAtStart && file > 0 ? file - 1 : file;
    }

    public TextEdit ToFile(int file, TextEdit edit)
    {
        var local = new TextEdit(ToFile(file, edit.Range), edit.NewText);
        var lines = _lineCounts[file];
        if (!_addedBreak[file] || local.Range.Start.Line < lines) return local;

        // After the line break the join added: the file itself ends on its last line, so the new
        // line goes at that line's end, led by the file's own line break instead of followed by one.
        var original = _files[file].Text;
        var lastLine = original.AsSpan(original.LastIndexOf('\n') + 1);
        var column = lastLine.Length - (lines == 1 && lastLine.Length > 0 && lastLine[0] == '\uFEFF' ? 1 : 0);
        var end = new TextPosition(lines - 1, column);
        var ending = original.Contains("\r\n", StringComparison.Ordinal) ? "\r\n" : "\n";
        var text = edit.NewText.EndsWith('\n') ? edit.NewText[..^1].TrimEnd('\r') : edit.NewText;
        return new TextEdit(new SourceRange(end, end), ending + text);
    }
}
