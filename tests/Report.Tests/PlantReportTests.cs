using System.Text.RegularExpressions;

namespace MotorLang.Report.Tests;

/// <summary>The report of a plant of several files (the harbor-cannery example): every file's circuits, each place named by its own file and line.</summary>
public sealed class PlantReportTests
{
    private static readonly string Folder = Plants.ExamplePath("harbor-cannery");

    [Fact]
    public void Every_circuit_of_every_file_gets_a_row_and_its_own_calculation_sheet()
    {
        var (code, html, err) = Plants.Run("report", Folder, "--date", "2026-12-03");
        Assert.True(code == 1, err); // the example's planted mistake: P-101 written in two files (P013)

        foreach (var file in Directory.GetFiles(Folder, "*.motors"))
        {
            var lines = File.ReadAllLines(file);
            for (var i = 0; i < lines.Length; i++)
            {
                var header = Regex.Match(lines[i], @"^\s*(motor|compressor)\s+(\S+)");
                if (!header.Success) continue;
                // The schedule row of this motor names this file and this line (1-based).
                var row = Regex.Match(html, $"<tr class=\"motor [^\"]*\" data-tag=\"{Regex.Escape(header.Groups[2].Value)}\" data-line=\"{i + 1}\"");
                Assert.True(row.Success, $"no schedule row for {header.Groups[2].Value} at {Path.GetFileName(file)} line {i + 1}");
                Assert.Contains($"{Path.GetFileName(file)} line {i + 1} of the list", html);
            }
        }

        // Anchors are unique even where a tag is written twice, and the contents link to each.
        var ids = Regex.Matches(html, "<section[^>]* id=\"([^\"]+)\"").Select(m => m.Groups[1].Value).ToList();
        Assert.Equal(ids.Count, ids.Distinct().Count());
        foreach (var id in ids.Where(i => i.StartsWith("calc-", StringComparison.Ordinal))) Assert.Contains($"href=\"#{id}\"", html);

        // The finding names the file it is written in.
        Assert.Matches(@"mcc-3-cold-store\.motors line \d+</td><td class=""code"">P013", html);
    }

    [Fact]
    public void The_diagram_of_a_plant_draws_the_feeders_of_every_file()
    {
        var (_, svg, err) = Plants.Run("diagram", Folder);
        Assert.True(svg.Length > 0, err);
        foreach (var file in Directory.GetFiles(Folder, "*.motors"))
        foreach (var line in File.ReadAllLines(file))
        {
            var feeder = Regex.Match(line, @"^feeder\s+(\S+)");
            if (feeder.Success) Assert.Contains(feeder.Groups[1].Value, svg);
        }
    }
}
