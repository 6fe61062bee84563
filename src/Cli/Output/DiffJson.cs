using System.Text.Json;
using System.Text.Json.Serialization;

namespace MotorLang.Cli.Output;

/// <summary>
/// `diff --format json` (docs/schemas/diff.schema.json): camelCase like `check`'s JSON, change kinds as
/// words ("added", "removed", "changed"). A list's diff is an array of record changes; a plant's is an
/// object with the files added and removed and the record changes, each under its file.
/// </summary>
public static class DiffJson
{
    private static readonly JsonSerializerOptions Options = new()
    {
        WriteIndented = true,
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        Converters = { new JsonStringEnumConverter(JsonNamingPolicy.CamelCase) },
    };

    public static string Write<T>(T changes) => JsonSerializer.Serialize(changes, Options);
}
