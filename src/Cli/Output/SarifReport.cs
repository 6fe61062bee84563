using System.Text.Json.Nodes;
using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Cli.Output;

/// <summary>
/// Findings as SARIF 2.1.0, so code-scanning tools can annotate pull requests. Columns are 1-based
/// UTF-16 code units, which is SARIF's default column kind.
/// </summary>
public static class SarifReport
{
    public const string Schema = "https://json.schemastore.org/sarif-2.1.0.json";

    public static JsonObject Write(IReadOnlyList<(string File, IReadOnlyList<Finding> Findings)> files, string toolVersion)
    {
        var all = files.SelectMany(f => f.Findings.Select(x => (f.File, Finding: x))).ToList();
        var rules = all.Select(x => x.Finding.Code).Distinct().Order(StringComparer.Ordinal).ToList();
        return new JsonObject
        {
            ["$schema"] = Schema,
            ["version"] = "2.1.0",
            ["runs"] = new JsonArray(new JsonObject
            {
                ["tool"] = new JsonObject
                {
                    ["driver"] = new JsonObject
                    {
                        ["name"] = "motorlang",
                        ["version"] = toolVersion,
                        ["rules"] = new JsonArray(rules.Select(r => (JsonNode)new JsonObject
                        {
                            ["id"] = r,
                            ["shortDescription"] = new JsonObject { ["text"] = RuleText(r) },
                        }).ToArray()),
                    },
                },
                ["columnKind"] = "utf16CodeUnits",
                ["results"] = new JsonArray(all.Select(x => (JsonNode)Result(x.File, x.Finding, rules.IndexOf(x.Finding.Code))).ToArray()),
            }),
        };
    }

    private static JsonObject Result(string file, Finding f, int ruleIndex) => new()
    {
        ["ruleId"] = f.Code,
        ["ruleIndex"] = ruleIndex,
        ["level"] = f.Severity switch { Severity.Error => "error", Severity.Warning => "warning", _ => "note" },
        ["message"] = new JsonObject { ["text"] = f.Message },
        ["locations"] = new JsonArray(new JsonObject
        {
            ["physicalLocation"] = new JsonObject
            {
                ["artifactLocation"] = new JsonObject { ["uri"] = file.Replace('\\', '/') },
                ["region"] = new JsonObject
                {
                    ["startLine"] = f.Range.Start.Line + 1,
                    ["startColumn"] = f.Range.Start.Column + 1,
                    ["endLine"] = f.Range.End.Line + 1,
                    ["endColumn"] = Math.Max(f.Range.End.Column + 1, f.Range.Start.Column + 1),
                },
            },
        }),
    };

    private static string RuleText(string code) => code[0] == 'P' ? "motor-list syntax or structure problem" : "motor-circuit sizing check (see docs/checks.md)";
}
