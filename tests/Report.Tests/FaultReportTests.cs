using System.Text.RegularExpressions;

namespace MotorLang.Report.Tests;

/// <summary>The report of a list with a 'source' shows the available fault current at each bus (feeder schedule) and step by step (calculation sheets).</summary>
public sealed class FaultReportTests
{
    private static string Report(string example)
    {
        var (code, html, err) = Plants.Run("report", Plants.ExamplePath(example), "--date", "2026-12-03");
        Assert.True(code is 0 or 1, err);
        return html;
    }

    [Fact]
    public void The_feeder_schedule_gives_each_bus_its_fault_current_and_X_over_R()
    {
        var html = Report("orchard-packhouse.motors");
        Assert.Contains("<th>Fault current at bus</th>", html);
        var mcc = Regex.Match(html, "<tr class=\"feeder [^\"]*\" data-tag=\"MCC-1\".*?</tr>", RegexOptions.Singleline).Value;
        // Ohmic method, hand calculation in Cli.Tests ScheduleDataFormatTests: 13,577 A at MCC-1, X/R 1.187.
        Assert.Contains("<span data-json=\"faultCurrent\">13.5768 kA</span>", mcc);
        Assert.Contains("X/R <span data-json=\"faultXOverR\">1.1869</span>", mcc);
        Assert.Contains("with motors <span data-json=\"faultCurrentWithMotors\">", mcc);
    }

    [Fact]
    public void The_calculation_sheets_work_the_fault_current_out_step_by_step()
    {
        var html = Report("orchard-packhouse.motors");
        var sheet = Regex.Match(html, "<section[^>]* id=\"calc-feeder-MCC-1\".*?</section>", RegexOptions.Singleline).Value;
        Assert.Contains("Available fault current at MCC-1&#39;s bus", sheet.Replace("'", "&#39;"));
        Assert.Contains("NFPA 70-2023 Chapter 9 Table 9", sheet);
        var motor = Regex.Match(html, "<section[^>]* id=\"calc-motor-CV-1\".*?</section>", RegexOptions.Singleline).Value;
        // CV-1's starter is rated 5 kA against about 13.8 kA with the motors: the sheet says so.
        Assert.Contains("Available fault current at the controller", motor);
        Assert.Contains("✗ controller SCCR 5 kA", motor);
    }

    [Fact]
    public void A_list_without_a_source_keeps_its_feeder_schedule_as_it_was()
    {
        var html = Report("dairy-bottling.motors");
        Assert.DoesNotContain("Fault current at bus", html);
        Assert.DoesNotContain("data-json=\"faultCurrent\"", html);
    }
}
