namespace MotorLang.Report;

/// <summary>
/// Where each analysed line is written: in one file, its own line; in a plant (several files
/// analysed as one), the file and the line in it. Sheets name places through this, never by the
/// analysed line number, which means nothing to a reader of a plant.
/// </summary>
public sealed class SourceLines
{
    private readonly Func<int, (string? File, int Line)> _locate;
    private readonly bool _severalFiles;

    private SourceLines(Func<int, (string? File, int Line)> locate, bool severalFiles) => (_locate, _severalFiles) = (locate, severalFiles);

    public static SourceLines OneFile(string? name) => new(line => (name, line), false);

    /// <param name="locate">The file and 0-based line in it of a 0-based analysed line.</param>
    public static SourceLines Plant(Func<int, (string File, int Line)> locate) => new(line => locate(line), true);

    /// <summary>The file (as named) and the 0-based line in it.</summary>
    public (string? File, int Line) At(int analysedLine) => _locate(analysedLine);

    /// <summary>"line 12" for one file; "mcc1.motors line 12" in a plant.</summary>
    public string Describe(int analysedLine)
    {
        var (file, line) = _locate(analysedLine);
        return _severalFiles ? $"{file} line {line + 1}" : $"line {line + 1}";
    }
}
