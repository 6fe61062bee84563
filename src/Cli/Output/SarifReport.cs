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

    /// <summary>
    /// The log. Findings the lists acknowledge (<paramref name="acknowledged"/>, by file) are results
    /// too, each with an in-source suppression whose justification is the written reason, so
    /// code-scanning tools show them as dismissed with why.
    /// </summary>
    public static JsonObject Write(IReadOnlyList<(string File, IReadOnlyList<Finding> Findings)> files, string toolVersion,
        IReadOnlyDictionary<string, IReadOnlyList<Acknowledgement>>? acknowledged = null, Uri? docsBase = null)
    {
        var all = files.SelectMany(f => f.Findings.Select(x => (f.File, Finding: x, Reason: (string?)null))
            .Concat((acknowledged?.GetValueOrDefault(f.File) ?? []).Select(a => (f.File, a.Finding, Reason: (string?)a.Reason)))).ToList();
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
                        ["rules"] = new JsonArray(rules.Select(r => (JsonNode)Rule(r, docsBase)).ToArray()),
                    },
                },
                ["columnKind"] = "utf16CodeUnits",
                ["results"] = new JsonArray(all.Select(x => (JsonNode)Result(x.File, x.Finding, rules.IndexOf(x.Finding.Code), x.Reason)).ToArray()),
            }),
        };
    }

    private static JsonObject Result(string file, Finding f, int ruleIndex, string? acknowledgedBecause)
    {
        var result = Result(file, f, ruleIndex);
        if (acknowledgedBecause is not null)
            result["suppressions"] = new JsonArray(new JsonObject { ["kind"] = "inSource", ["justification"] = acknowledgedBecause });
        return result;
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

    /// <summary>
    /// A rule's texts come from the same table rows `explain` prints (docs/checks.md, docs/format.md,
    /// embedded at build): the short description is the meaning's first sentence, the full one the
    /// whole meaning, the help every filled cell. The help link is the row's section in the
    /// published docs, when the build names where they are published.
    /// </summary>
    private static JsonObject Rule(string code, Uri? docsBase)
    {
        var rule = new JsonObject { ["id"] = code };
        if (CodeDocs.Find(code) is not { } entry)
        {
            rule["shortDescription"] = new JsonObject { ["text"] = code[0] == 'P' ? "motor-list syntax or structure problem" : "motor-circuit sizing check" };
            return rule;
        }

        rule["shortDescription"] = new JsonObject { ["text"] = FirstSentence(entry.Meaning) };
        rule["fullDescription"] = new JsonObject { ["text"] = entry.Meaning };
        rule["help"] = new JsonObject { ["text"] = string.Join("\n", [.. entry.Lines, $"See {HelpPath(entry)}."]) };
        if (docsBase is not null) rule["helpUri"] = new Uri(docsBase, HelpPath(entry)["docs/".Length..]).AbsoluteUri;
        return rule;
    }

    /// <summary>The entry's section, relative to the repository root ("docs/checks.md#checks").</summary>
    public static string HelpPath(CodeDocs.Entry entry) => $"{entry.Source}#{entry.Anchor}";

    private static string FirstSentence(string text)
    {
        // A sentence ends at ". " followed by a capital or a backtick, not at "No. 1" or "e.g. a".
        for (var i = 0; i + 2 < text.Length; i++)
        {
            if (text[i] == '.' && text[i + 1] == ' ' && (char.IsUpper(text[i + 2]) || text[i + 2] == '`')
                && !text.AsSpan(0, i).EndsWith("No", StringComparison.Ordinal) && !text.AsSpan(0, i).EndsWith("Exc", StringComparison.Ordinal))
                return text[..(i + 1)];
        }

        return text;
    }
}
