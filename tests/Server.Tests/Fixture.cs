using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>A document with a cursor marker "$0": the text without the marker and the marker's position.</summary>
public sealed record Fixture(string Text, Position Cursor)
{
    public const string Marker = "$0";

    public static Fixture Parse(string marked)
    {
        var at = marked.IndexOf(Marker, StringComparison.Ordinal);
        if (at < 0) throw new ArgumentException("the fixture has no $0 cursor marker");
        var before = marked[..at];
        var line = before.Count(c => c == '\n');
        var column = at - (before.LastIndexOf('\n') + 1);
        return new Fixture(marked.Remove(at, Marker.Length), new Position(line, column));
    }

    public static string Root
    {
        get
        {
            var dir = AppContext.BaseDirectory;
            while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
            return dir;
        }
    }
}
