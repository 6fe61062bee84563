using MotorLang.Analysis.Findings;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Cli.Output;

/// <summary>The one-line text form shared by every command: file:line:col: severity code: message.</summary>
public static class FindingText
{
    public static string Line(string file, Finding f, bool color = false) =>
        $"{file}:{f.Range.Start.Line + 1}:{f.Range.Start.Column + 1}: {Colors.Severity(f.Severity, Name(f.Severity), color)} {f.Code}: {f.Message}";

    /// <summary>An acknowledged finding: its place, code and message, and the reason the list gives.</summary>
    public static string Line(string file, Acknowledgement a) =>
        $"{file}:{a.Finding.Range.Start.Line + 1}:{a.Finding.Range.Start.Column + 1}: acknowledged {a.Finding.Code}: {a.Finding.Message} (reason: {a.Reason})";

    public static string Name(Severity s) => s.ToString().ToLowerInvariant();
}
