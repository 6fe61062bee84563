using System.Text.Json.Serialization;

namespace MotorLang.Server.Protocol;

// The small part of the Language Server Protocol (3.17) this server speaks, as plain records.
// Property names become camelCase on the wire; null members are left out.

public sealed record Position(int Line, int Character);

public sealed record Range(Position Start, Position End);

public sealed record Location(string Uri, Range Range);

public sealed record TextEdit(Range Range, string NewText);

public sealed record TextDocumentIdentifier(string Uri);

public sealed record VersionedTextDocumentIdentifier(string Uri, int Version);

public sealed record TextDocumentItem(string Uri, string LanguageId, int Version, string Text);

public sealed record TextDocumentPositionParams(TextDocumentIdentifier TextDocument, Position Position);

public sealed record MarkupContent(string Kind, string Value);

public sealed record WorkspaceEdit(Dictionary<string, TextEdit[]> Changes);

public sealed record Command(string Title, [property: JsonPropertyName("command")] string CommandName, object[]? Arguments = null);

public static class ErrorCodes
{
    public const int ContentModified = -32801;
    public const int RequestFailed = -32803;
    public const int InvalidParams = -32602;
}
