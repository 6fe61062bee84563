namespace MotorLang.Server.Protocol;

public sealed record DidOpenTextDocumentParams(TextDocumentItem TextDocument);

/// <summary>A change: with a range it replaces that range; without one it replaces the whole text.</summary>
public sealed record TextDocumentContentChangeEvent(Range? Range, string Text);

public sealed record DidChangeTextDocumentParams(VersionedTextDocumentIdentifier TextDocument, TextDocumentContentChangeEvent[] ContentChanges);

public sealed record DidCloseTextDocumentParams(TextDocumentIdentifier TextDocument);

public sealed record DidSaveTextDocumentParams(TextDocumentIdentifier TextDocument);

public sealed record DiagnosticRelatedInformation(Location Location, string Message);

public sealed record Diagnostic(Range Range, int Severity, string Code, string Source, string Message, DiagnosticRelatedInformation[]? RelatedInformation = null);

public sealed record PublishDiagnosticsParams(string Uri, int? Version, Diagnostic[] Diagnostics);

/// <summary>A file created (1), changed (2) or deleted (3) on disk.</summary>
public sealed record FileEvent(string Uri, int Type);

public sealed record DidChangeWatchedFilesParams(FileEvent[] Changes);
