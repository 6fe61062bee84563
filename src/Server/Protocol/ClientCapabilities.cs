using System.Text.Json;

namespace MotorLang.Server.Protocol;

/// <summary>The few client capabilities the server acts on, read from initialize's raw JSON.</summary>
public static class ClientCapabilities
{
    /// <summary>True when the client says it fills in a code action's edit through codeAction/resolve.</summary>
    public static bool ResolvesCodeActionEdits(JsonElement? capabilities)
    {
        if (capabilities is not { ValueKind: JsonValueKind.Object } root) return false;
        if (!root.TryGetProperty("textDocument", out var doc) || doc.ValueKind != JsonValueKind.Object) return false;
        if (!doc.TryGetProperty("codeAction", out var action) || action.ValueKind != JsonValueKind.Object) return false;
        if (!action.TryGetProperty("resolveSupport", out var resolve) || resolve.ValueKind != JsonValueKind.Object) return false;
        if (!resolve.TryGetProperty("properties", out var properties) || properties.ValueKind != JsonValueKind.Array) return false;
        return properties.EnumerateArray().Any(p => p.ValueKind == JsonValueKind.String && p.GetString() == "edit");
    }

    /// <summary>True when the client lets the server register file watchers (workspace.didChangeWatchedFiles.dynamicRegistration).</summary>
    public static bool RegistersFileWatchers(JsonElement? capabilities) =>
        capabilities is { ValueKind: JsonValueKind.Object } root
        && root.TryGetProperty("workspace", out var ws) && ws.ValueKind == JsonValueKind.Object
        && ws.TryGetProperty("didChangeWatchedFiles", out var watched) && watched.ValueKind == JsonValueKind.Object
        && watched.TryGetProperty("dynamicRegistration", out var dynamic) && dynamic.ValueKind == JsonValueKind.True;
}
