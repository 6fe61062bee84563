using System.Text.Json;
using System.Text.Json.Serialization;

namespace MotorLang.Server.Protocol;

public sealed record ClientInfo(string Name, string? Version);

public sealed record InitializeParams(int? ProcessId, string? RootUri, JsonElement? Capabilities, JsonElement? InitializationOptions, ClientInfo? ClientInfo);

public sealed record ServerInfo(string Name, string Version);

public sealed record InitializeResult(ServerCapabilities Capabilities, ServerInfo ServerInfo);

public sealed record SaveOptions(bool IncludeText);

public sealed record TextDocumentSyncOptions(bool OpenClose, int Change, SaveOptions Save);

public sealed record CompletionOptions(string[] TriggerCharacters, bool ResolveProvider);

public sealed record CodeActionOptions(string[] CodeActionKinds, bool ResolveProvider);

public sealed record RenameOptions(bool PrepareProvider);

public sealed record CodeLensOptions(bool ResolveProvider);

public sealed record SemanticTokensLegend(string[] TokenTypes, string[] TokenModifiers);

public sealed record SemanticTokensOptions(SemanticTokensLegend Legend, bool Full, bool Range);

/// <summary>Exactly what is implemented, no more.</summary>
public sealed record ServerCapabilities(
    string PositionEncoding,
    TextDocumentSyncOptions TextDocumentSync,
    bool HoverProvider,
    CompletionOptions CompletionProvider,
    CodeActionOptions CodeActionProvider,
    bool DocumentFormattingProvider,
    bool DocumentRangeFormattingProvider,
    bool DocumentSymbolProvider,
    bool WorkspaceSymbolProvider,
    bool FoldingRangeProvider,
    bool InlayHintProvider,
    CodeLensOptions CodeLensProvider,
    RenameOptions RenameProvider,
    bool ReferencesProvider,
    bool DefinitionProvider,
    SemanticTokensOptions SemanticTokensProvider);

public sealed record SetTraceParams(string Value);

public sealed record LogMessageParams(int Type, string Message);

public sealed record DidChangeConfigurationParams(JsonElement? Settings);

/// <summary>Editor settings that only change presentation; installation settings live in the motor list.</summary>
public sealed record PresentationSettings(bool InlayFlc = true, bool InlayWire = true, bool CodeLens = true)
{
    public static PresentationSettings From(JsonElement? json)
    {
        if (json is not { ValueKind: JsonValueKind.Object } root) return new PresentationSettings();
        var motorlang = root.TryGetProperty("motorlang", out var m) ? m : root;
        bool Flag(string a, string? b, bool fallback)
        {
            if (!motorlang.TryGetProperty(a, out var x)) return fallback;
            if (b is null) return x.ValueKind != JsonValueKind.False;
            return !x.TryGetProperty(b, out var y) || y.ValueKind != JsonValueKind.False;
        }

        return new PresentationSettings(Flag("inlayHints", "fullLoadCurrent", true), Flag("inlayHints", "minimumWire", true), Flag("codeLens", null, true));
    }
}

