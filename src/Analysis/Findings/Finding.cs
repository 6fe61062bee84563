using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Text;

namespace MotorLang.Analysis.Findings;

/// <summary>A change to the document that mends a finding, as edits on the original text.</summary>
public sealed record Fix(string Title, ImmutableArray<TextEdit> Edits);

/// <summary>Another place that explains a finding (e.g. the motor a value was inherited from).</summary>
public sealed record RelatedLocation(SourceRange Range, string Message);

/// <summary>What analysis reports about the document: a stable code, a severity, where, why, and how to fix it.</summary>
public sealed record Finding(string Code, Severity Severity, SourceRange Range, string Message, Fix? Fix = null,
    ImmutableArray<RelatedLocation> Related = default)
{
    public ImmutableArray<RelatedLocation> RelatedLocations => Related.IsDefault ? [] : Related;

    public static Finding From(Diagnostic d) => new(d.Code, d.Severity, d.Range, d.Message);
}
