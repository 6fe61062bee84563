using System.Text.Json;
using System.Text.Json.Serialization;
using MotorLang.Analysis.Reports.Data;

namespace MotorLang.Cli.Output;

/// <summary>The typed schedule as JSON (docs/schemas/schedule.schema.json): camelCase like `check`, every field present, null where unknown.</summary>
public static class ScheduleJson
{
    public static readonly JsonSerializerOptions Options = new()
    {
        WriteIndented = true,
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        DefaultIgnoreCondition = JsonIgnoreCondition.Never,
        Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    public static string Write(ScheduleData schedule) => JsonSerializer.Serialize(schedule, Options) + "\n";
}
