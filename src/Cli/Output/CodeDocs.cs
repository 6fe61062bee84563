using System.Reflection;

namespace MotorLang.Cli.Output;

/// <summary>
/// The documentation of each finding code, read from docs/checks.md (M codes) and docs/format.md
/// (P codes) as they were when the tool was built: both are embedded in the executable, so
/// `explain` prints exactly the entry the docs give, with no copy to drift.
/// </summary>
public static class CodeDocs
{
    /// <summary>One code's row; <paramref name="Anchor"/> is the GitHub anchor of the section the row is in.</summary>
    public sealed record Entry(string Code, string Source, string Anchor, IReadOnlyList<(string Heading, string Text)> Fields)
    {
        /// <summary>What the code means: the row's "What it means" (checks.md) or "Meaning" (format.md) cell.</summary>
        public string Meaning => Fields.FirstOrDefault(f => f.Heading is "What it means" or "Meaning").Text ?? "";

        /// <summary>The row as `explain` prints it, one "Heading: text" line per filled cell.</summary>
        public IEnumerable<string> Lines => Fields.Where(f => f.Text is not ("" or "—")).Select(f => $"{f.Heading}: {f.Text}");
    }

    private static readonly Lazy<List<Entry>> All = new(() => [.. Parse("checks.md"), .. Parse("format.md")]);

    public static IReadOnlyList<Entry> Entries => All.Value;

    public static Entry? Find(string code) => All.Value.FirstOrDefault(e => e.Code.Equals(code, StringComparison.OrdinalIgnoreCase));

    public static string Resource(string name)
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"{name} is not embedded in the executable");
        return new StreamReader(stream).ReadToEnd();
    }

    /// <summary>Every table row whose first cell is a code, with the cells named by that table's header row.</summary>
    private static IEnumerable<Entry> Parse(string name)
    {
        string[]? header = null;
        var section = "";
        foreach (var line in Resource(name).Split('\n').Select(l => l.TrimEnd('\r')))
        {
            if (line.StartsWith('#')) section = Slug(line.TrimStart('#').Trim());
            if (!line.StartsWith('|'))
            {
                header = null;
                continue;
            }

            var cells = Cells(line);
            if (header is null)
            {
                header = cells;
                continue;
            }

            if (cells.Length == 0 || !IsCode(cells[0])) continue;
            var fields = cells.Skip(1).Select((text, i) => (Heading: i + 1 < header.Length ? header[i + 1] : "", Text: text)).ToList();
            yield return new Entry(cells[0], "docs/" + name, section, fields);
        }
    }

    /// <summary>
    /// The anchor GitHub gives a heading: lower case, letters, digits, spaces, hyphens and
    /// underscores kept, every other character dropped, spaces made hyphens.
    /// </summary>
    public static string Slug(string heading) =>
        new string(heading.ToLowerInvariant().Where(c => char.IsLetterOrDigit(c) || c is ' ' or '-' or '_').ToArray()).Replace(' ', '-');

    /// <summary>Splits a Markdown table row on unescaped pipes.</summary>
    private static string[] Cells(string row)
    {
        var cells = new List<string>();
        var cell = new System.Text.StringBuilder();
        for (var i = 1; i < row.Length; i++)
        {
            if (row[i] == '\\' && i + 1 < row.Length && row[i + 1] == '|')
            {
                cell.Append('|');
                i++;
            }
            else if (row[i] == '|')
            {
                cells.Add(cell.ToString().Trim());
                cell.Clear();
            }
            else cell.Append(row[i]);
        }

        return [.. cells];
    }

    private static bool IsCode(string cell) => cell.Length == 4 && cell[0] is 'M' or 'P' && cell[1..].All(char.IsAsciiDigit);
}
