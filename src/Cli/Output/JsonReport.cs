using System.Text.Json;
using System.Text.Json.Nodes;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Text;

namespace MotorLang.Cli.Output;

/// <summary>Findings as JSON: one object per file, positions 1-based in UTF-16 code units, fixes as edits.</summary>
public static class JsonReport
{
    public static readonly JsonSerializerOptions Options = new() { WriteIndented = true };

    /// <summary>The report; <paramref name="acknowledged"/> holds, by file, the findings the lists acknowledge.</summary>
    public static JsonObject Write(IReadOnlyList<(string File, IReadOnlyList<Finding> Findings)> files,
        IReadOnlyDictionary<string, IReadOnlyList<Acknowledgement>>? acknowledged = null)
    {
        IReadOnlyList<Acknowledgement> Of(string file) => acknowledged?.GetValueOrDefault(file) ?? [];
        var summary = Summary(files.SelectMany(f => f.Findings).ToList());
        summary["acknowledged"] = files.Sum(f => Of(f.File).Count);
        return new JsonObject
        {
            ["version"] = 1,
            ["files"] = new JsonArray(files.Select(f => (JsonNode)new JsonObject
            {
                ["path"] = f.File,
                ["findings"] = new JsonArray(f.Findings.Select(Finding).ToArray()),
                ["acknowledged"] = new JsonArray(Of(f.File).Select(Acknowledged).ToArray()),
            }).ToArray()),
            ["summary"] = summary,
        };
    }

    private static JsonNode Acknowledged(Acknowledgement a) => new JsonObject
    {
        ["code"] = a.Finding.Code,
        ["severity"] = FindingText.Name(a.Finding.Severity),
        ["message"] = a.Finding.Message,
        ["range"] = Range(a.Finding.Range),
        ["reason"] = a.Reason,
        ["directive"] = Range(a.Directive),
    };

    private static JsonNode Finding(Finding f) => new JsonObject
    {
        ["code"] = f.Code,
        ["severity"] = FindingText.Name(f.Severity),
        ["message"] = f.Message,
        ["range"] = Range(f.Range),
        ["fix"] = f.Fix is { } fix
            ? new JsonObject
            {
                ["title"] = fix.Title,
                ["edits"] = new JsonArray(fix.Edits.Select(e => (JsonNode)new JsonObject { ["range"] = Range(e.Range), ["newText"] = e.NewText }).ToArray()),
            }
            : null,
    };

    private static JsonObject Range(SourceRange r) => new()
    {
        ["startLine"] = r.Start.Line + 1, ["startColumn"] = r.Start.Column + 1,
        ["endLine"] = r.End.Line + 1, ["endColumn"] = r.End.Column + 1,
    };

    private static JsonObject Summary(IReadOnlyList<Finding> all) => new()
    {
        ["errors"] = all.Count(f => f.Severity == Parser.Diagnostics.Severity.Error),
        ["warnings"] = all.Count(f => f.Severity == Parser.Diagnostics.Severity.Warning),
        ["information"] = all.Count(f => f.Severity == Parser.Diagnostics.Severity.Information),
    };
}
