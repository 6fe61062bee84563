namespace MotorLang.Server.Protocol;

public sealed record Hover(MarkupContent Contents, Range? Range);

public sealed record CodeActionContext(Diagnostic[] Diagnostics, string[]? Only);

public sealed record CodeActionParams(TextDocumentIdentifier TextDocument, Range Range, CodeActionContext Context);

/// <summary>A code action; <see cref="Edit"/> is left out (and <see cref="Data"/> says what to compute) when the client resolves it later.</summary>
public sealed record CodeAction(string Title, string Kind, Diagnostic[]? Diagnostics, bool? IsPreferred, WorkspaceEdit? Edit, CodeActionData? Data = null);

/// <summary>What an unresolved "size everything" action is for: the document and the version it was offered on.</summary>
public sealed record CodeActionData(string Uri, int Version);

public sealed record CompletionParams(TextDocumentIdentifier TextDocument, Position Position);

public sealed record CompletionItem(string Label, int Kind, string? Detail, MarkupContent? Documentation, string SortText, string? FilterText = null);

public sealed record CompletionList(bool IsIncomplete, CompletionItem[] Items);

public sealed record FormattingOptions(int TabSize, bool InsertSpaces);

public sealed record DocumentFormattingParams(TextDocumentIdentifier TextDocument, FormattingOptions? Options);

public sealed record DocumentRangeFormattingParams(TextDocumentIdentifier TextDocument, Range Range, FormattingOptions? Options);

public sealed record DocumentSymbolParams(TextDocumentIdentifier TextDocument);

public sealed record DocumentSymbol(string Name, string? Detail, int Kind, Range Range, Range SelectionRange, DocumentSymbol[]? Children);

public sealed record WorkspaceSymbolParams(string Query);

public sealed record SymbolInformation(string Name, int Kind, Location Location, string? ContainerName);

public sealed record FoldingRangeParams(TextDocumentIdentifier TextDocument);

public sealed record FoldingRange(int StartLine, int EndLine, string? Kind);

public sealed record InlayHintParams(TextDocumentIdentifier TextDocument, Range Range);

public sealed record InlayHint(Position Position, string Label, int? Kind, bool? PaddingLeft);

public sealed record CodeLensParams(TextDocumentIdentifier TextDocument);

public sealed record CodeLens(Range Range, Command? Command);

public sealed record RenameParams(TextDocumentIdentifier TextDocument, Position Position, string NewName);

public sealed record PrepareRenameResult(Range Range, string Placeholder);

public sealed record ReferenceContext(bool IncludeDeclaration);

public sealed record ReferenceParams(TextDocumentIdentifier TextDocument, Position Position, ReferenceContext? Context);

public sealed record SemanticTokensParams(TextDocumentIdentifier TextDocument);

public sealed record SemanticTokens(int[] Data);

/// <summary>A debug request: the server's copy of a document, so tests can check that edits were applied in order.</summary>
public sealed record DocumentTextResult(int Version, string Text);
