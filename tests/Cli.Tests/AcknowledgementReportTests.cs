using System.Text.Json.Nodes;

namespace MotorLang.Cli.Tests;

/// <summary>
/// How `check` reports acknowledged findings. The motor: 10 hp, 13 A nameplate, SF 1.15, so the
/// 430.32(A)(1) overload limit is 125 % x 13 A = 16.25 A and the 430.32(C) maximum 140 % = 18.2 A;
/// 19 A is above both (M103, an error) and is acknowledged here.
/// </summary>
public sealed class AcknowledgementReportTests : IDisposable
{
    private const string Reason = "owner's engineer accepted in writing";

    private const string List =
        "feeder F 480V 3ph\n  wire 8 AWG\n  ground 10 AWG\n  protection inverse-time-breaker 35A\n" +
        "  motor M 10hp\n    nameplate 13A\n    service-factor 1.15\n    design B\n    wire 12 AWG\n    ground 12 AWG\n" +
        "    protection inverse-time-breaker 35A\n    overload 19A  # acknowledge M103: " + Reason + "\n";

    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-ack-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private (int Code, string Out, string Err) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private string Write(string text)
    {
        var path = Path.Combine(_dir, "a.motors");
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void WithoutTheDirectiveTheListFails()
    {
        var (code, output, _) = Run("check", Write(List[..List.IndexOf("  #", StringComparison.Ordinal)] + "\n"));
        Assert.Equal(1, code);
        Assert.Contains(": error M103: ", output);
    }

    [Fact]
    public void CheckPassesAndListsTheAcknowledgementWithItsReason()
    {
        var path = Write(List);
        var (code, output, err) = Run("check", path);
        Assert.Equal(0, code);
        Assert.StartsWith($"{path}:12:14: acknowledged M103: ", output);
        Assert.EndsWith($"(reason: {Reason})", output.Trim());
        Assert.Contains("0 errors, 0 warnings, 1 acknowledged", err);
        Assert.Equal("", Run("check", "--severity", "warning", path).Out);
    }

    [Fact]
    public void JsonListsItUnderAcknowledgedAndMatchesTheSchema()
    {
        var (_, json, _) = Run("check", "--format", "json", Write(List));
        ExecutableTests.AssertValid(Path.Combine(Executable.RepoRoot, "docs", "schemas", "check-report.schema.json"), json);
        var file = JsonNode.Parse(json)!["files"]![0]!;
        Assert.Empty(file["findings"]!.AsArray());
        var ack = file["acknowledged"]![0]!;
        Assert.Equal("M103", (string?)ack["code"]);
        Assert.Equal(Reason, (string?)ack["reason"]);
        Assert.Equal(1, (int)JsonNode.Parse(json)!["summary"]!["acknowledged"]!);
    }

    [Fact]
    public void SarifMarksItSuppressedWithTheJustification()
    {
        var (_, sarif, _) = Run("check", "--format", "sarif", Write(List));
        ExecutableTests.AssertValid(Path.Combine(AppContext.BaseDirectory, "Schemas", "sarif-2.1.0-subset.schema.json"), sarif);
        var result = JsonNode.Parse(sarif)!["runs"]![0]!["results"]!.AsArray().Single()!;
        Assert.Equal("M103", (string?)result["ruleId"]);
        var suppression = result["suppressions"]![0]!;
        Assert.Equal("inSource", (string?)suppression["kind"]);
        Assert.Equal(Reason, (string?)suppression["justification"]);
    }
}
