using System.Globalization;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using MotorLang.Analysis.Reports.Data;

namespace MotorLang.Cli.Output;

/// <summary>
/// The schedule as a workbook: a sheet of motors and a sheet of feeders, one row per record, the
/// columns of <see cref="ScheduleColumns"/>. Numbers are numeric cells (a spreadsheet can sum them)
/// with a number format; units are in the headers; text is written inline, so no shared-string table.
/// </summary>
public static class ScheduleXlsx
{
    // Style indices into the stylesheet below: 0 default, 1 bold header, 2 number "0.####" (at most four decimals, as the JSON).
    private const uint HeaderStyle = 1;
    private const uint NumberStyle = 2;
    private const uint NumberFormatId = 164; // custom formats start at 164

    public static byte[] Write(ScheduleData schedule)
    {
        using var memory = new MemoryStream();
        using (var document = SpreadsheetDocument.Create(memory, SpreadsheetDocumentType.Workbook))
        {
            var workbook = document.AddWorkbookPart();
            workbook.Workbook = new Workbook();
            var styles = workbook.AddNewPart<WorkbookStylesPart>();
            styles.Stylesheet = Stylesheet();
            var sheets = workbook.Workbook.AppendChild(new Sheets());
            AddSheet(workbook, sheets, 1, "Motors", ScheduleColumns.Motors, schedule.Motors);
            AddSheet(workbook, sheets, 2, "Feeders", ScheduleColumns.Feeders, schedule.Feeders);
            workbook.Workbook.Save();
        }

        return memory.ToArray();
    }

    private static void AddSheet<T>(WorkbookPart workbook, Sheets sheets, uint id, string name, IReadOnlyList<ScheduleColumn<T>> columns, IReadOnlyList<T> rows)
    {
        var part = workbook.AddNewPart<WorksheetPart>();
        var data = new SheetData();
        var header = new Row { RowIndex = 1 };
        for (var i = 0; i < columns.Count; i++) header.Append(TextCell(i, 1, columns[i].Header, HeaderStyle));
        data.Append(header);
        for (var r = 0; r < rows.Count; r++)
        {
            var index = (uint)r + 2;
            var row = new Row { RowIndex = index };
            for (var i = 0; i < columns.Count; i++)
            {
                switch (columns[i].Cell(rows[r]))
                {
                    case null: break;
                    case decimal d: row.Append(NumberCell(i, index, d)); break;
                    case var v: row.Append(TextCell(i, index, Convert.ToString(v, CultureInfo.InvariantCulture) ?? "", 0)); break;
                }
            }

            data.Append(row);
        }

        // Freeze the header row so it stays in view while scrolling.
        var view = new SheetViews(new SheetView(new Pane
        {
            VerticalSplit = 1, TopLeftCell = "A2", ActivePane = PaneValues.BottomLeft, State = PaneStateValues.Frozen,
        }) { WorkbookViewId = 0 });
        part.Worksheet = new Worksheet(view, data);
        sheets.Append(new Sheet { Id = workbook.GetIdOfPart(part), SheetId = id, Name = name });
    }

    private static Cell NumberCell(int column, uint row, decimal value) => new()
    {
        CellReference = Reference(column, row), StyleIndex = NumberStyle, DataType = CellValues.Number,
        CellValue = new CellValue(value.ToString(CultureInfo.InvariantCulture)),
    };

    private static Cell TextCell(int column, uint row, string text, uint style) => new(new InlineString(new Text(text) { Space = SpaceProcessingModeValues.Preserve }))
    {
        CellReference = Reference(column, row), DataType = CellValues.InlineString, StyleIndex = style,
    };

    /// <summary>A1-style reference: column 0 is A, 26 is AA.</summary>
    public static string Reference(int column, uint row)
    {
        var letters = "";
        for (var c = column + 1; c > 0; c = (c - 1) / 26) letters = (char)('A' + (c - 1) % 26) + letters;
        return letters + row.ToString(CultureInfo.InvariantCulture);
    }

    private static Stylesheet Stylesheet() => new(
        new NumberingFormats(new NumberingFormat { NumberFormatId = NumberFormatId, FormatCode = "0.####" }) { Count = 1 },
        new Fonts(new Font(), new Font(new Bold())) { Count = 2 },
        new Fills(new Fill(new PatternFill { PatternType = PatternValues.None }), new Fill(new PatternFill { PatternType = PatternValues.Gray125 })) { Count = 2 },
        new Borders(new Border()) { Count = 1 },
        new CellFormats(
            new CellFormat(),
            new CellFormat { FontId = 1, ApplyFont = true },
            new CellFormat { NumberFormatId = NumberFormatId, ApplyNumberFormat = true }) { Count = 3 });
}
