using MotorLang.Analysis.Reports;
using Spectre.Console;

namespace MotorLang.Cli.Output;

/// <summary>
/// The schedule as a text table. On a terminal it fits the width: the least needed columns are left
/// out one by one until it does, and a note names them and how to see them. Under the tables, a
/// legend spells out the abbreviations the cells use.
/// </summary>
public static class ScheduleTable
{
    /// <summary>Width used when the output is not a terminal (a file, a pipe): wide enough for every column.</summary>
    public const int UnboundedWidth = 240;

    /// <summary>Columns given up first when the terminal is narrow; Tag, sizes and Status always stay.</summary>
    private static readonly string[] DropOrder =
        ["Voltage drop", "Ground", "Min ground", "Disconnect", "Overload", "Overload limit", "Volts", "Feeder", "Power"];

    /// <summary>The feeder column of a list with a 'source': the available fault current at each bus.</summary>
    public const string FaultColumn = "Fault current";

    private static readonly string[] FeederDropOrder = ["Voltage drop", "Ground", "Min ground", "Volts", "Load", FaultColumn];

    public static readonly string[] Legend =
    [
        "FLC = full-load current the circuit is sized from (430.6); Min wire, Max protection, Overload limit, Min ground = what the code requires or allows, beside what the list states.",
        "ITB = inverse-time breaker; inst. = instantaneous-trip breaker; DE fuse = dual-element (time-delay) fuse; NTD fuse = non-time-delay fuse; ×N = N identical motors.",
        "Voltage drop = running drop on the branch (and, in brackets, with the feeder's); Status = the error codes on the motor, 'warnings', or 'ok'.",
        "Feeders: Load = the calculated load of its motors and other loads (430.24); Required = the ampacity its conductors need.",
        "Max protection \"by TAG\" = a motor with no device of its own on a branch circuit supplying several motors: that circuit's device protects it (430.53).",
    ];

    /// <summary>Under a table with the fault current column.</summary>
    public const string FaultLegend =
        "Fault current = three-phase bolted fault current at the feeder's bus from the source (ohmic method), + the running motors' share (≈ 4 × FLC, an approximation), and X/R; each motor's controller is taken to stand at its feeder's bus.";

    public static string Render(Schedule s, int? terminalWidth, string[] feederHeaders, Func<FeederTotals, string[]> feederCells)
    {
        var width = terminalWidth ?? UnboundedWidth;
        var motorHeaders = ScheduleRow.Headers.Where(h => h != "Description").ToList();
        var (motors, droppedMotor) = Fit(width, motorHeaders, s.Rows.Select(r => Pick(ScheduleRow.Headers, r.Cells)).ToList(), DropOrder);
        var (feeders, droppedFeeder) = Fit(width, [.. feederHeaders], s.Feeders.Select(f => Pick(feederHeaders, feederCells(f))).ToList(), FeederDropOrder);
        var text = motors + feeders;
        var dropped = droppedMotor.Concat(droppedFeeder).Distinct().ToList();
        var proseWidth = Math.Min(width, 100);
        if (dropped.Count > 0)
            text += Wrap($"Not shown, to fit {width} columns: {string.Join(", ", dropped)}. For every column, widen the terminal, or use --format markdown or csv (or pipe the output).", proseWidth);
        var legend = feederHeaders.Contains(FaultColumn) ? [.. Legend, FaultLegend] : Legend;
        return text + "\n" + string.Concat(legend.Select(l => Wrap(l, proseWidth)));
    }

    /// <summary>Breaks prose at spaces so no line is wider than the terminal.</summary>
    private static string Wrap(string text, int width)
    {
        var sb = new System.Text.StringBuilder();
        var line = 0;
        foreach (var word in text.Split(' '))
        {
            if (line > 0 && line + 1 + word.Length > width)
            {
                sb.Append('\n');
                line = 0;
            }
            else if (line > 0)
            {
                sb.Append(' ');
                line++;
            }

            sb.Append(word);
            line += word.Length;
        }

        return sb.Append('\n').ToString();
    }

    private static Dictionary<string, string> Pick(IReadOnlyList<string> headers, string[] cells) =>
        headers.Select((h, i) => (h, cells[i])).ToDictionary(x => x.h, x => x.Item2);

    /// <summary>Renders with all columns, then without each in drop order, until every line fits.</summary>
    private static (string Text, List<string> Dropped) Fit(int width, List<string> headers, List<Dictionary<string, string>> rows, string[] dropOrder)
    {
        var dropped = new List<string>();
        var shown = new List<string>(headers);
        while (true)
        {
            var text = Draw(shown, rows);
            var fits = text.Split('\n').All(l => l.TrimEnd().Length <= width);
            var next = dropOrder.FirstOrDefault(shown.Contains);
            if (fits || next is null) return (text, dropped);
            shown.Remove(next);
            dropped.Add(next);
        }
    }

    private static string Draw(List<string> headers, List<Dictionary<string, string>> rows)
    {
        var writer = new StringWriter();
        var console = AnsiConsole.Create(new AnsiConsoleSettings
        {
            Out = new AnsiConsoleOutput(writer), Ansi = AnsiSupport.No, ColorSystem = ColorSystemSupport.NoColors,
        });
        // Drawn unbounded and measured: Spectre would otherwise wrap cells to squeeze the table in.
        console.Profile.Width = UnboundedWidth * 4;
        var table = new Table().Border(TableBorder.Simple);
        foreach (var h in headers) table.AddColumn(Markup.Escape(h));
        foreach (var r in rows) table.AddRow(headers.Select(h => Markup.Escape(r[h])).ToArray());
        console.Write(table);
        // Spectre pads every line to the table's width; trailing blanks only make lines wrap on narrow terminals.
        return string.Join("\n", writer.ToString().Split('\n').Select(l => l.TrimEnd())).TrimEnd('\n') + "\n";
    }
}
