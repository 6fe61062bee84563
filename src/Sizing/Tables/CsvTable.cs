using MotorLang.Domain;
using System.Globalization;
using System.Reflection;

namespace MotorLang.Sizing.Tables;

/// <summary>
/// A code table stored as CSV under Tables/: '#' lines name the source, the first other line
/// names the columns, "-" marks a cell the table leaves empty. Embedded in the assembly.
/// </summary>
public sealed class CsvTable
{
    private readonly Dictionary<string, int> _columnIndex;

    private CsvTable(string name, string source, string[] columns, List<string[]> rows)
    {
        Name = name;
        Source = source;
        Columns = columns;
        Rows = rows;
        _columnIndex = columns.Select((c, i) => (c, i)).ToDictionary(p => p.c, p => p.i, StringComparer.OrdinalIgnoreCase);
    }

    public string Name { get; }

    /// <summary>The header comment: which table, which edition, where it was checked.</summary>
    public string Source { get; }

    public IReadOnlyList<string> Columns { get; }

    public IReadOnlyList<string[]> Rows { get; }

    public static CsvTable Load(string name)
    {
        var resource = $"MotorLang.Sizing.Tables.{name}.csv";
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(resource)
                           ?? throw new InvalidOperationException($"code table '{name}' is not embedded");
        using var reader = new StreamReader(stream);
        var source = new List<string>();
        string[]? columns = null;
        var rows = new List<string[]>();
        while (reader.ReadLine() is { } line)
        {
            if (line.StartsWith('#'))
            {
                source.Add(line.TrimStart('#', ' '));
                continue;
            }

            if (line.Trim().Length == 0) continue;
            var cells = line.Split(',').Select(c => c.Trim()).ToArray();
            if (columns is null)
            {
                columns = cells;
                continue;
            }

            if (cells.Length != columns.Length)
                throw new InvalidDataException($"{name}.csv: row '{line}' has {cells.Length} cells, the header has {columns.Length}");
            rows.Add(cells);
        }

        if (columns is null || rows.Count == 0) throw new InvalidDataException($"{name}.csv has no rows");
        if (source.Count == 0) throw new InvalidDataException($"{name}.csv does not name its source");
        return new CsvTable(name, string.Join(" ", source), columns, rows);
    }

    public int Column(string name) =>
        _columnIndex.TryGetValue(name, out var i) ? i : throw new InvalidDataException($"{Name}.csv has no column '{name}'");

    public bool HasColumn(string name) => _columnIndex.ContainsKey(name);

    /// <summary>A numeric cell, or null for "-".</summary>
    public static decimal? Number(string cell) => ParsedCells.GetOrAdd(cell, static c =>
        c == "-" ? null : Numbers.Parse(c) ?? throw new InvalidDataException($"'{c}' is not a number"));

    /// <summary>Table cells are looked up for every motor; each distinct cell text is parsed once (the tables are fixed, so this stays small).</summary>
    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, decimal?> ParsedCells = new(StringComparer.Ordinal);

    /// <summary>Checks that a column of keys rises strictly from row to row (tables are looked up by "first row at or above").</summary>
    public void RequireAscending(int column)
    {
        for (var i = 1; i < Rows.Count; i++)
        {
            if (Number(Rows[i][column]) <= Number(Rows[i - 1][column]))
                throw new InvalidDataException($"{Name}.csv: column '{Columns[column]}' is not in rising order at row {i + 1}");
        }
    }
}
