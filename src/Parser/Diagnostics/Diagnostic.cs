using MotorLang.Parser.Text;

namespace MotorLang.Parser.Diagnostics;

public enum Severity { Error, Warning, Information }

/// <summary>A problem found in the text, with a stable code so tools and docs can refer to it.</summary>
public sealed record Diagnostic(string Code, Severity Severity, SourceRange Range, string Message)
{
    public override string ToString() =>
        $"{Range.Start}: {Severity.ToString().ToLowerInvariant()} {Code}: {Message}";
}
