using System.Collections.Concurrent;
using Json.Schema;

namespace MotorLang.Cli.Tests;

/// <summary>
/// JSON schemas loaded once per test run: the validator registers each schema under its $id for the
/// whole process and refuses a second registration, so every test class shares these.
/// </summary>
internal static class Schemas
{
    private static readonly ConcurrentDictionary<string, Lazy<JsonSchema>> Loaded = new();

    public static JsonSchema Load(string path) =>
        Loaded.GetOrAdd(Path.GetFullPath(path), p => new Lazy<JsonSchema>(() => JsonSchema.FromText(File.ReadAllText(p)))).Value;

    public static JsonSchema Docs(string name) => Load(Path.Combine(Executable.RepoRoot, "docs", "schemas", name));
}
