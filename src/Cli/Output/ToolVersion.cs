using System.Reflection;

namespace MotorLang.Cli.Output;

/// <summary>The tool's version as built (the project's Version, without the source revision), and where its docs are published.</summary>
public static class ToolVersion
{
    private static readonly Assembly Cli = typeof(ToolVersion).Assembly;

    public static string Text { get; } =
        Cli.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0]
        ?? Cli.GetName().Version?.ToString() ?? "0";

    /// <summary>
    /// The published docs folder (the `MotorLangDocsUrl` build property, ending in '/'), or null when
    /// the build names none: help links are then left out rather than pointing somewhere made up.
    /// </summary>
    public static Uri? DocsBase { get; } =
        Cli.GetCustomAttributes<AssemblyMetadataAttribute>().FirstOrDefault(a => a.Key == "MotorLangDocsUrl")?.Value is { Length: > 0 } url
        && Uri.TryCreate(url.EndsWith('/') ? url : url + "/", UriKind.Absolute, out var uri) ? uri : null;
}
