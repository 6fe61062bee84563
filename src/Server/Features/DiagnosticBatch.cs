using MotorLang.Server.Protocol;

namespace MotorLang.Server.Features;

/// <summary>The diagnostics of one file, with the open version they describe (null for a file read from disk).</summary>
public sealed record FileDiagnostics(string Uri, int? Version, Diagnostic[] Diagnostics);

/// <summary>
/// What one analysis publishes: the diagnostics of one document on its own (<see cref="Plant"/> null),
/// or of every file of the plant it belongs to (<see cref="Plant"/> its folder).
/// </summary>
public sealed record DiagnosticBatch(string? Plant, IReadOnlyList<FileDiagnostics> Files);
