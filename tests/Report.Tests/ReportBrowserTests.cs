using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using PuppeteerSharp;
using PuppeteerSharp.Media;
using UglyToad.PdfPig;

namespace MotorLang.Report.Tests;

/// <summary>
/// The HTML report of an example opened in headless Chromium: it loads with no console errors and no
/// request beyond itself, every motor is in the schedule with the JSON schedule's numbers, and printing
/// gives one page per sheet with no table row cut by a page break.
/// </summary>
[Collection(BrowserCollection.Name)]
public sealed partial class ReportBrowserTests(ChromiumFixture chromium) : IAsyncLifetime
{
    private const string Example = "dairy-bottling.motors";
    private string _html = "";
    private JsonNode _json = null!;

    public Task InitializeAsync()
    {
        _html = Path.Combine(Path.GetTempPath(), $"motorlang-report-{Guid.NewGuid():N}.html");
        var (code, _, stderr) = Plants.Run("report", Plants.ExamplePath(Example), "-o", _html, "--name", Example, "--date", "2026-01-15");
        Assert.True(code is 0 or 1, stderr);
        var (_, json, _) = Plants.Run("schedule", Plants.ExamplePath(Example), "--format", "json");
        _json = JsonNode.Parse(json)!;
        return Task.CompletedTask;
    }

    public Task DisposeAsync()
    {
        File.Delete(_html);
        return Task.CompletedTask;
    }

    private async Task<(IPage Page, List<string> Problems)> Open()
    {
        var page = await chromium.Browser.NewPageAsync();
        var problems = new List<string>();
        page.Console += (_, e) =>
        {
            if (e.Message.Type is ConsoleType.Error or ConsoleType.Warning) problems.Add($"console {e.Message.Type}: {e.Message.Text}");
        };
        page.PageError += (_, e) => problems.Add("page error: " + e.Message);
        await page.SetRequestInterceptionAsync(true);
        page.Request += async (_, e) =>
        {
            // The report is self-contained: the file itself is the only request it may make.
            if (e.Request.Url == new Uri(_html).AbsoluteUri) await e.Request.ContinueAsync();
            else
            {
                problems.Add("request: " + e.Request.Url);
                await e.Request.AbortAsync();
            }
        };
        await page.SetViewportAsync(new ViewPortOptions { Width = 1400, Height = 900 });
        await page.GoToAsync(new Uri(_html).AbsoluteUri, WaitUntilNavigation.Load);
        return (page, problems);
    }

    [Fact]
    public async Task Loads_cleanly_with_every_motor_and_the_json_schedules_numbers()
    {
        var (page, problems) = await Open();
        await using var _ = page;
        Assert.Empty(problems);

        var rows = _json["motors"]!.AsArray();
        var tags = await page.EvaluateExpressionAsync<string[]>("[...document.querySelectorAll('table.motors tr.motor')].map(r => r.dataset.tag)");
        Assert.Equal(rows.Select(r => (string)r!["tag"]!).ToArray(), tags);
        Assert.Equal(5, tags.Length); // examples/dairy-bottling.motors writes five motors

        // Every JSON field with a number in it is shown in that motor's or feeder's row, with the same numbers.
        var compared = await CompareRows(page, "table.motors tr.motor", rows) + await CompareRows(page, "table.feeders tr.feeder", _json["feeders"]!.AsArray());
        Assert.True(compared >= 5 * 15 + 8, $"only {compared} values compared");

        var feeders = await page.EvaluateExpressionAsync<string[]>("[...document.querySelectorAll('table.feeders tr.feeder')].map(r => r.dataset.tag)");
        Assert.Equal(_json["feeders"]!.AsArray().Select(f => (string)f!["tag"]!).ToArray(), feeders);

        // Every sheet's heading shows the list's title block as the JSON schedule carries it.
        var title = _json["title"]!;
        var headings = await page.EvaluateExpressionAsync<string[]>("[...document.querySelectorAll('header.titleblock')].map(h => h.innerText)");
        Assert.NotEmpty(headings);
        foreach (var field in new[] { "number", "revision", "date", "preparedBy", "checkedBy" })
        {
            var written = (string?)title[field];
            Assert.False(string.IsNullOrEmpty(written), $"the example writes no {field}");
            Assert.All(headings, h => Assert.Contains(written!, h));
        }

        var shot = Path.Combine(Plants.ArtifactFolder(), "report-dairy-bottling.png");
        await page.ScreenshotAsync(shot, new ScreenshotOptions { FullPage = true });
        Assert.True(new FileInfo(shot).Length > 10_000);
    }

    /// <summary>Page sizes and the report's @page margins (14 mm top, 12 mm bottom, 10 mm sides) in CSS pixels, 96 to the inch.</summary>
    public static TheoryData<string, decimal, decimal> Papers => new()
    {
        { "A3", 420m, 297m },     // ISO 216 A3, landscape
        { "Tabloid", 431.8m, 279.4m }, // 17 × 11 in, landscape
        { "Letter", 279.4m, 215.9m }, // 11 × 8.5 in, landscape
    };

    [Theory]
    [MemberData(nameof(Papers))]
    public async Task Prints_one_page_per_sheet_and_cuts_no_row(string paper, decimal widthMm, decimal heightMm)
    {
        var (page, problems) = await Open();
        await using var _ = page;
        const double pxPerMm = 96 / 25.4;
        var contentWidth = (double)(widthMm - 20) * pxPerMm;
        var contentHeight = (double)(heightMm - 26) * pxPerMm;

        // Lay the document out as print does, one page wide, and measure every sheet and row against a page box.
        await page.EmulateMediaTypeAsync(MediaType.Print);
        await page.SetViewportAsync(new ViewPortOptions { Width = (int)Math.Floor(contentWidth), Height = 800 });
        var sheets = await page.EvaluateExpressionAsync<Sheet[]>(
            "[...document.querySelectorAll('section.sheet')].map(s => { const top = s.getBoundingClientRect().top; " +
            "return { id: s.id, height: s.getBoundingClientRect().height, " +
            "rows: [...s.querySelectorAll('tr, .section, li')].map(r => { const b = r.getBoundingClientRect(); return { top: b.top - top, bottom: b.bottom - top }; }) }; })");
        // 5 sheets before the calculations (revision log, motor and feeder schedules, findings, diagram), one per motor (5) and feeder (1), then 3 after.
        Assert.Equal(5 + 5 + 1 + 3, sheets.Length);
        foreach (var s in sheets)
        {
            Assert.True(s.Height <= contentHeight, $"{paper}: sheet {s.Id} is {s.Height:0} px tall, a page holds {contentHeight:0}");
            foreach (var r in s.Rows) Assert.True(Math.Floor(r.Top / contentHeight) == Math.Floor((r.Bottom - 0.5) / contentHeight), $"{paper}: a row of {s.Id} crosses a page");
        }

        var pdf = await page.PdfDataAsync(new PdfOptions
        {
            Format = paper switch { "A3" => PaperFormat.A3, "Tabloid" => PaperFormat.Tabloid, _ => PaperFormat.Letter },
            Landscape = true,
            PrintBackground = true,
        });
        await File.WriteAllBytesAsync(Path.Combine(Plants.ArtifactFolder(), $"report-dairy-bottling-{paper}.pdf"), pdf);
        using var document = PdfDocument.Open(pdf);
        Assert.Equal(sheets.Length, document.NumberOfPages);
        // Each printed page begins its own sheet: its title is on it, and the running footer numbers it.
        for (var i = 0; i < document.NumberOfPages; i++)
        {
            var text = document.GetPage(i + 1).Text;
            Assert.Contains($"Page {i + 1} of {document.NumberOfPages}", text);
        }

        Assert.Contains("Revision log", document.GetPage(1).Text);
        Assert.Contains("Motor schedule", document.GetPage(2).Text);
        Assert.Contains("Calculation sheet — motor P-101", document.GetPage(6).Text);
        Assert.Empty(problems);
    }

    private static async Task<int> CompareRows(IPage page, string rowSelector, JsonArray rows)
    {
        var cells = await page.EvaluateExpressionAsync<Dictionary<string, Dictionary<string, string>>>(
            $"Object.fromEntries([...document.querySelectorAll('{rowSelector}')].map(r => [r.dataset.tag, " +
            "Object.fromEntries([...r.querySelectorAll('[data-json]')].map(s => [s.dataset.json, s.textContent]))]))");
        var compared = 0;
        foreach (var row in rows)
        {
            var tag = (string)row!["tag"]!;
            foreach (var (field, value) in row.AsObject())
            {
                if (NotScheduleValues.Contains(field)) continue;
                // Shown only where they say something: a count above one, a rated voltage other than the system's.
                if (field == "quantity" && (int)value! == 1) continue;
                if (field == "ratedVolts" && value?.ToJsonString() == row["volts"]?.ToJsonString()) continue;
                var expected = Numbers(value);
                if (expected.Count == 0) continue;
                Assert.True(cells[tag].TryGetValue(field, out var shown), $"{tag}: {field} is not in the report");
                Assert.True(expected.SequenceEqual(Numbers(JsonValue.Create(shown))), $"{tag}: {field} is {shown} in the report, {value!.ToJsonString()} in the JSON");
                compared++;
            }
        }

        return compared;
    }

    /// <summary>
    /// Fields that are not the schedule's values: names (a tag such as MCC-B1 holds digits), where the row is
    /// written, and the lists the calculation sheets show (findings, rules applied, rules not checked).
    /// </summary>
    private static readonly HashSet<string> NotScheduleValues = new(StringComparer.Ordinal)
        { "file", "line", "feeder", "tag", "description", "status", "findings", "notComputed", "rulesApplied", "notChecked", "phases" };

    private static List<decimal> Numbers(JsonNode? node) => node switch
    {
        JsonValue v when v.TryGetValue<decimal>(out var d) => [d],
        JsonValue v when v.TryGetValue<string>(out var s) => NumberPattern().Matches(s).Select(m => decimal.Parse(m.Value, System.Globalization.CultureInfo.InvariantCulture)).ToList(),
        JsonObject o => o.SelectMany(p => Numbers(p.Value)).ToList(),
        JsonArray a => a.SelectMany(Numbers).ToList(),
        _ => [],
    };

    [GeneratedRegex(@"\d+(\.\d+)?")]
    private static partial Regex NumberPattern();

    public sealed record Box(double Top, double Bottom);

    public sealed record Sheet(string Id, double Height, Box[] Rows);
}
