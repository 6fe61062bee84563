using System.Globalization;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using CsvHelper;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using DocumentFormat.OpenXml.Validation;
using Json.Schema;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli.Tests;

/// <summary>
/// The typed schedule outputs agree with one another: the JSON validates against its schema, and the
/// spreadsheet's numeric cells and the CSV's fields (read back with a CSV reader) hold the JSON's numbers.
/// </summary>
public sealed class ScheduleDataFormatTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-data-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static string Example(string name) => Path.Combine(Executable.RepoRoot, "examples", name);

    private static (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr, CliEnvironment.Plain());
        return (code, stdout.ToString(), stderr.ToString());
    }

    // Header -> the JSON field whose number the column holds, and the unit the JSON gives it (null: a plain number).
    private static readonly (string Header, string Field, string? Unit)[] MotorNumbers =
    [
        ("Line", "line", null), ("Quantity", "quantity", null), ("Power", "power", "*"), ("Volts (V)", "volts", "V"),
        ("Rated volts (V)", "ratedVolts", "V"), ("Phases", "phases", null), ("Nameplate current (A)", "nameplateCurrent", "A"),
        ("Service factor", "serviceFactor", null), ("FLC (A)", "fullLoadCurrent", "A"), ("Required ampacity (A)", "requiredAmpacity", "A"),
        ("Wire ampacity (A)", "wireAmpacity", "A"), ("Max protection (A)", "maximumProtection", "A"), ("Min protection (A)", "minimumProtection", "A"),
        ("Protection (A)", "protection", "A"), ("Overload limit (A)", "overloadLimit", "A"), ("Overload (A)", "overload", "A"),
        ("Disconnect current (A)", "disconnectMinimumCurrent", "A"), ("Disconnect power (hp)", "disconnectMinimumPower", "hp"),
        ("Conduit fill (%)", "conduitFill", "%"), ("Length", "length", "*"), ("Branch drop (%)", "branchVoltageDrop", "%"),
        ("Total drop (%)", "totalVoltageDrop", "%"), ("Fault current (kA)", "faultCurrent", "kA"),
        ("Fault current with motors (kA)", "faultCurrentWithMotors", "kA"), ("Fault X/R", "faultXOverR", null),
    ];

    private static readonly (string Header, string Field, string? Unit)[] FeederNumbers =
    [
        ("Line", "line", null), ("Volts (V)", "volts", "V"), ("Phases", "phases", null), ("Motors", "motorCount", null),
        ("Calculated load (A)", "calculatedLoad", "A"), ("Required ampacity (A)", "requiredAmpacity", "A"), ("Wire ampacity (A)", "wireAmpacity", "A"),
        ("Max protection (A)", "maximumProtection", "A"), ("Min protection (A)", "minimumProtection", "A"), ("Protection (A)", "protection", "A"),
        ("Conduit fill (%)", "conduitFill", "%"), ("Length", "length", "*"), ("Voltage drop (%)", "voltageDrop", "%"), ("Total drop (%)", "totalVoltageDrop", "%"),
        ("Fault current (kA)", "faultCurrent", "kA"), ("Fault current with motors (kA)", "faultCurrentWithMotors", "kA"), ("Fault X/R", "faultXOverR", null),
    ];

    /// <summary>The JSON's number for a field: a plain number, or a measure's value after checking its unit.</summary>
    private static decimal? Expected(JsonNode row, string field, string? unit)
    {
        var node = row[field];
        if (node is null) return null;
        if (unit is null) return node.GetValue<decimal>();
        if (unit != "*") Assert.Equal(unit, (string)node["unit"]!);
        return node["value"]!.GetValue<decimal>();
    }

    private JsonNode Json(string example)
    {
        var (code, json, err) = Run("schedule", "--format", "json", Example(example));
        Assert.True(code is 0 or 1, err);
        var schema = Schemas.Docs("schedule.schema.json");
        using var doc = JsonDocument.Parse(json);
        var result = schema.Evaluate(doc.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
        Assert.True(result.IsValid, example + ": " + string.Join("\n", (result.Details ?? []).Where(d => d.Errors is not null)
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Value}"))));
        return JsonNode.Parse(json)!;
    }

    [Theory]
    [InlineData("dairy-bottling.motors")]
    [InlineData("cabinet-shop.motors")]
    [InlineData("booster-station.motors")]
    [InlineData("cold-storage.motors")]
    [InlineData("press-line.motors")]
    [InlineData("orchard-packhouse.motors")]
    [InlineData("laundry-plant.motors")]
    public void JsonValidatesAgainstItsSchema(string example)
    {
        var json = Json(example);
        Assert.Equal(1, (int)json["formatVersion"]!);
        Assert.NotEmpty(json["motors"]!.AsArray());
    }

    [Fact]
    public void TheFaultCurrentAtEveryBusAndControllerIsInTheJson()
    {
        var json = Json("orchard-packhouse.motors");
        var feeders = json["feeders"]!.AsArray().ToDictionary(f => (string)f!["tag"]!, f => f!);
        var motors = json["motors"]!.AsArray().ToDictionary(m => (string)m!["tag"]!, m => m!);
        // Hand calculation by the ohmic method (IEEE Std 141 ch. 4, from memory), Chapter 9 Table 9 (NFPA 70-2023), steel conduit:
        // utility 35 kA at 480 V, X/R 6: |Z| = 480 ÷ (√3 × 35,000) = 0.0079180 Ω -> R 0.0013017, X 0.0078102.
        // 150 ft of 3/0 AWG copper in RMC: R 0.079 × 0.15 = 0.01185, X 0.052 × 0.15 = 0.0078 Ω.
        // Sum R 0.0131517, X 0.0156102, |Z| 0.0204117 Ω: I = 480 ÷ (√3 × 0.0204117) = 13,577 A, X/R 0.0156102 ÷ 0.0131517 = 1.187.
        Assert.Equal(13.577m, decimal.Round((decimal)feeders["MCC-1"]["faultCurrent"]!["value"]!, 3));
        Assert.Equal("kA", (string)feeders["MCC-1"]["faultCurrent"]!["unit"]!);
        Assert.Equal(1.19m, decimal.Round((decimal)feeders["MCC-1"]["faultXOverR"]!, 2));
        // The service bus has no length: the utility's own 35 kA and X/R 6.
        Assert.Equal(35m, (decimal)feeders["SWBD-1"]["faultCurrent"]!["value"]!);
        Assert.Equal(6m, (decimal)feeders["SWBD-1"]["faultXOverR"]!);
        // A controller is taken to stand at its feeder's bus; the motors' share only adds.
        Assert.Equal((decimal)feeders["MCC-1"]["faultCurrent"]!["value"]!, (decimal)motors["P-1"]["faultCurrent"]!["value"]!);
        Assert.True((decimal)motors["P-1"]["faultCurrentWithMotors"]!["value"]! > (decimal)motors["P-1"]["faultCurrent"]!["value"]!);
        // A list with no 'source' carries no fault current and asks for none.
        var dairy = Json("dairy-bottling.motors")["feeders"]!.AsArray();
        Assert.All(dairy, f => Assert.Null(f!["faultCurrent"]));
        Assert.All(dairy, f => Assert.DoesNotContain(f!["notComputed"]!.AsArray(), n => (string)n!["field"]! == "faultCurrent"));
    }

    [Fact]
    public void SchemaRejectsADisplayString()
    {
        // The schema must be able to fail: a current written as text, as the schedule once was, is not a measure.
        var schema = Schemas.Docs("schedule.schema.json");
        var json = Json("dairy-bottling.motors");
        json["motors"]![0]!["fullLoadCurrent"] = "21 A";
        using var doc = JsonDocument.Parse(json.ToJsonString());
        Assert.False(schema.Evaluate(doc.RootElement).IsValid);
    }

    [Fact]
    public void CabinetShopRowsCarryTheirFindingCodes()
    {
        var motors = Json("cabinet-shop.motors")["motors"]!.AsArray();
        // SAW-1 (line 18): 14 AWG for 1.25 x 16.7 = 20.88 A is M101; the 60 A breaker over 250 % x 16.7 = 41.75 -> 45 A (line 19).
        var saw = motors.Single(m => (string)m!["tag"]! == "SAW-1")!;
        var codes = saw["findings"]!.AsArray().Select(f => ((string)f!["code"]!, (int)f["line"]!)).ToList();
        Assert.Contains(("M101", 18), codes);
        Assert.Equal("errors", (string)saw["status"]!);
    }

    [Theory]
    [InlineData("dairy-bottling.motors", 100)]
    [InlineData("orchard-packhouse.motors", 50)]
    public void WorkbookCellsAreTheJsonNumbers(string example, int atLeast)
    {
        var json = Json(example);
        var path = Path.Combine(_dir, "schedule.xlsx");
        var (code, _, err) = Run("schedule", "--format", "xlsx", "--output", path, Example(example));
        Assert.True(code is 0 or 1, err);
        using var document = SpreadsheetDocument.Open(path, false);
        Assert.Empty(new OpenXmlValidator().Validate(document));
        var sheets = document.WorkbookPart!.Workbook.Sheets!.Elements<Sheet>().Select(s => s.Name!.Value).ToList();
        Assert.Equal(["Motors", "Feeders"], sheets);
        var checkedCells = CompareSheet(document, "Motors", json["motors"]!.AsArray(), MotorNumbers)
            + CompareSheet(document, "Feeders", json["feeders"]!.AsArray(), FeederNumbers);
        Assert.True(checkedCells > atLeast, $"only {checkedCells} numeric cells compared");
    }

    private static int CompareSheet(SpreadsheetDocument document, string name, JsonArray rows, (string Header, string Field, string? Unit)[] numbers)
    {
        var workbook = document.WorkbookPart!;
        var sheet = workbook.Workbook.Sheets!.Elements<Sheet>().Single(s => s.Name == name);
        var data = ((WorksheetPart)workbook.GetPartById(sheet.Id!)).Worksheet.GetFirstChild<SheetData>()!;
        var lines = data.Elements<Row>().ToList();
        var headers = lines[0].Elements<Cell>().ToDictionary(c => Column(c.CellReference!), c => c.InnerText);
        Assert.Equal(rows.Count + 1, lines.Count);
        var compared = 0;
        for (var r = 0; r < rows.Count; r++)
        {
            var cells = lines[r + 1].Elements<Cell>().ToDictionary(c => headers[Column(c.CellReference!)]);
            foreach (var (header, field, unit) in numbers)
            {
                var expected = Expected(rows[r]!, field, unit);
                if (expected is null)
                {
                    Assert.False(cells.ContainsKey(header), $"{name} row {r + 2} {header}: empty in the JSON, filled in the sheet");
                    continue;
                }

                var cell = cells[header];
                Assert.Equal(CellValues.Number, cell.DataType!.Value);
                Assert.NotNull(cell.StyleIndex); // a number format, not General
                Assert.Equal(expected.Value, decimal.Parse(cell.CellValue!.Text, CultureInfo.InvariantCulture));
                compared++;
            }

            Assert.Equal((string)rows[r]!["tag"]!, cells[name == "Motors" ? "Tag" : "Feeder"].InnerText);
        }

        return compared;
    }

    private static string Column(string reference) => new(reference.TakeWhile(char.IsLetter).ToArray());

    [Fact]
    public void CsvRoundTripsThroughACsvReader()
    {
        // A description with a comma, quotes and a non-ASCII character must come back as written.
        var list = Path.Combine(_dir, "quoted.motors");
        File.WriteAllText(list, "feeder MCC 480V 3ph\n  motor P-1 \"Pump, \\\"north\\\" – Ø 80\" 15hp\n    length 90ft\n");
        var (code, _, err) = Run("schedule", "--format", "json", list);
        var json = JsonNode.Parse(Run("schedule", "--format", "json", list).Out)!;
        var path = Path.Combine(_dir, "motors.csv");
        (code, _, err) = Run("schedule", "--format", "csv", "--output", path, list);
        Assert.True(code == 0, err);
        var bytes = File.ReadAllBytes(path);
        Assert.Equal(new byte[] { 0xEF, 0xBB, 0xBF }, bytes[..3]); // UTF-8 byte order mark for spreadsheet import
        CompareCsv(Encoding.UTF8.GetString(bytes[3..]), json["motors"]!.AsArray(), MotorNumbers, "Tag");
        Assert.Equal((string)json["motors"]![0]!["description"]!, ReadCsv(Encoding.UTF8.GetString(bytes[3..]))[0]["Description"]);
    }

    [Theory]
    [InlineData("dairy-bottling.motors")]
    [InlineData("booster-station.motors")]
    [InlineData("orchard-packhouse.motors")]
    public void CsvTablesHoldTheJsonNumbers(string example)
    {
        var json = Json(example);
        var motors = Run("schedule", "--format", "csv", Example(example)).Out;
        var feeders = Run("schedule", "--format", "csv", "--table", "feeders", Example(example)).Out;
        Assert.StartsWith("\uFEFF", motors);
        CompareCsv(motors[1..], json["motors"]!.AsArray(), MotorNumbers, "Tag");
        CompareCsv(feeders[1..], json["feeders"]!.AsArray(), FeederNumbers, "Feeder");
    }

    private static List<Dictionary<string, string>> ReadCsv(string text)
    {
        using var csv = new CsvReader(new StringReader(text), CultureInfo.InvariantCulture);
        csv.Read();
        csv.ReadHeader();
        var headers = csv.HeaderRecord!;
        var rows = new List<Dictionary<string, string>>();
        while (csv.Read()) rows.Add(headers.ToDictionary(h => h, h => csv.GetField(h)!));
        return rows;
    }

    private static void CompareCsv(string text, JsonArray rows, (string Header, string Field, string? Unit)[] numbers, string tagHeader)
    {
        var records = ReadCsv(text);
        Assert.Equal(rows.Count, records.Count);
        for (var r = 0; r < rows.Count; r++)
        {
            Assert.Equal((string)rows[r]!["tag"]!, records[r][tagHeader]);
            foreach (var (header, field, unit) in numbers)
            {
                var expected = Expected(rows[r]!, field, unit);
                Assert.Equal(expected?.ToString(CultureInfo.InvariantCulture) ?? "", records[r][header]);
            }
        }
    }

    [Fact]
    public void UsageErrorsForXlsxWithoutAFileAndTableOutsideCsv()
    {
        Assert.Equal(2, Run("schedule", "--format", "xlsx", Example("dairy-bottling.motors")).Code);
        Assert.Equal(2, Run("schedule", "--format", "json", "--table", "feeders", Example("dairy-bottling.motors")).Code);
        Assert.Empty(Directory.GetFiles(_dir));
    }
}
