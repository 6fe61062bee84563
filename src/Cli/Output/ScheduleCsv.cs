using System.Globalization;
using CsvHelper;
using MotorLang.Analysis.Reports.Data;

namespace MotorLang.Cli.Output;

/// <summary>
/// One schedule table as CSV (RFC 4180, invariant numbers, units in the headers), starting with a
/// UTF-8 byte order mark so spreadsheet programs read the file as UTF-8 rather than a local code page.
/// </summary>
public static class ScheduleCsv
{
    public const char ByteOrderMark = '\uFEFF';

    public static string Write(ScheduleData schedule, string table) => table == "feeders"
        ? Write(ScheduleColumns.Feeders, schedule.Feeders)
        : Write(ScheduleColumns.Motors, schedule.Motors);

    private static string Write<T>(IReadOnlyList<ScheduleColumn<T>> columns, IReadOnlyList<T> rows)
    {
        var text = new StringWriter(CultureInfo.InvariantCulture);
        text.Write(ByteOrderMark);
        using (var csv = new CsvWriter(text, CultureInfo.InvariantCulture))
        {
            foreach (var c in columns) csv.WriteField(c.Header);
            csv.NextRecord();
            foreach (var row in rows)
            {
                foreach (var c in columns) csv.WriteField(Cell(c.Cell(row)));
                csv.NextRecord();
            }
        }

        return text.ToString();
    }

    private static string Cell(object? value) => value switch
    {
        null => "",
        decimal d => d.ToString(CultureInfo.InvariantCulture),
        _ => Convert.ToString(value, CultureInfo.InvariantCulture) ?? "",
    };
}
