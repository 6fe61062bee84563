using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Text;
using MotorLang.Server.Protocol;
using LspRange = MotorLang.Server.Protocol.Range;
using LspTextEdit = MotorLang.Server.Protocol.TextEdit;

namespace MotorLang.Server.Features;

/// <summary>Analysis types to protocol types. Columns are UTF-16 on both sides, so positions copy straight across.</summary>
public static class Convert
{
    public static Position ToLsp(TextPosition p) => new(p.Line, p.Column);

    public static LspRange ToLsp(SourceRange r) => new(ToLsp(r.Start), ToLsp(r.End));

    public static TextPosition FromLsp(Position p) => new(p.Line, p.Character);

    public static LspTextEdit ToLsp(Parser.Text.TextEdit e) => new(ToLsp(e.Range), e.NewText);

    public static int Severity(Severity s) => s switch { Parser.Diagnostics.Severity.Error => 1, Parser.Diagnostics.Severity.Warning => 2, _ => 3 };

    public static Protocol.Diagnostic ToLsp(Finding f, string uri) =>
        new(ToLsp(f.Range), Severity(f.Severity), f.Code, "motorlang", f.Message,
            f.RelatedLocations.IsEmpty ? null : f.RelatedLocations.Select(r => new DiagnosticRelatedInformation(new Location(uri, ToLsp(r.Range)), r.Message)).ToArray());

    /// <summary>A finding of a plant: each related location in its own file (<paramref name="relatedUris"/>, one per location).</summary>
    public static Protocol.Diagnostic ToLsp(Finding f, string uri, IReadOnlyList<string> relatedUris) =>
        new(ToLsp(f.Range), Severity(f.Severity), f.Code, "motorlang", f.Message,
            f.RelatedLocations.IsEmpty ? null : f.RelatedLocations.Select((r, i) => new DiagnosticRelatedInformation(
                new Location(i < relatedUris.Count ? relatedUris[i] : uri, ToLsp(r.Range)), r.Message)).ToArray());
}
