using MotorLang.Parser.Text;

namespace MotorLang.Parser.Model;

/// <summary>A value from the text together with where it was written.</summary>
public sealed record Located<T>(T Value, SourceRange Range);
