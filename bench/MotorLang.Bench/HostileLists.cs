using System.Diagnostics;
using System.Globalization;
using System.Text;

namespace MotorLang.Bench;

/// <summary>
/// `hostile`: peak resident memory and wall time of the real `motorlang check` process on lists
/// made to be large or deep rather than realistic — a million bare motors, a 10 MB line of values,
/// and chains of 10,000 'like' and 'from' references. Linux: it runs the command under GNU time
/// (/usr/bin/time) for the peak resident set. Invented data, for measurement only.
/// </summary>
internal static class HostileLists
{
    public static void Run(string motorlang, int scale)
    {
        var dir = Directory.CreateTempSubdirectory("motorlang-hostile-");
        try
        {
            Measure(motorlang, dir.FullName, $"{1_000_000 / scale:N0} bare motors", BareMotors(1_000_000 / scale));
            Measure(motorlang, dir.FullName, $"{10 / (double)scale:0.#} MB line of values", ValueLine(10_000_000 / scale));
            Measure(motorlang, dir.FullName, $"'like' chain of {10_000 / scale:N0}", LikeChain(10_000 / scale));
            Measure(motorlang, dir.FullName, $"'from' chain of {10_000 / scale:N0}", FromChain(10_000 / scale));
            Measure(motorlang, dir.FullName, $"'from' cycle of {10_000 / scale:N0}", FromCycle(10_000 / scale));
        }
        finally
        {
            dir.Delete(recursive: true);
        }
    }

    private static string BareMotors(int n)
    {
        var b = new StringBuilder("feeder F-1 480V 3ph\n");
        for (var i = 1; i <= n; i++) b.Append("  motor M-").Append(i).Append(" 5hp\n");
        return b.ToString();
    }

    private static string ValueLine(int chars)
    {
        var b = new StringBuilder("feeder F-1 480V 3ph\n  motor M-1 5hp");
        for (var i = 0; i < chars / 3; i++) b.Append(" 1A");
        return b.Append('\n').ToString();
    }

    private static string LikeChain(int n)
    {
        var b = new StringBuilder("feeder F-1 480V 3ph\n  motor M-1 5hp\n    length 50ft\n");
        for (var i = 2; i <= n; i++) b.Append($"  motor M-{i} 5hp\n    like M-{i - 1}\n");
        return b.ToString();
    }

    private static string FromChain(int n)
    {
        var b = new StringBuilder();
        for (var i = 1; i <= n; i++)
        {
            b.Append($"feeder F-{i} 480V 3ph\n");
            if (i > 1) b.Append($"  from F-{i - 1}\n");
            b.Append($"  length 100ft\n  motor M-{i} 5hp\n    length 50ft\n");
        }

        return b.ToString();
    }

    private static string FromCycle(int n)
    {
        var b = new StringBuilder();
        for (var i = 1; i <= n; i++) b.Append($"feeder F-{i} 480V 3ph\n  from F-{i % n + 1}\n");
        return b.ToString();
    }

    private static void Measure(string motorlang, string dir, string name, string text)
    {
        var file = Path.Combine(dir, "list.motors");
        File.WriteAllText(file, text);
        var info = new ProcessStartInfo("/usr/bin/time") { RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in new[] { "-f", "%e %M" }) info.ArgumentList.Add(a);
        if (motorlang.EndsWith(".dll", StringComparison.Ordinal))
        {
            info.ArgumentList.Add("dotnet");
            info.ArgumentList.Add("exec");
        }

        foreach (var a in new[] { motorlang, "check", file }) info.ArgumentList.Add(a);
        using var process = Process.Start(info)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEnd();
        process.WaitForExit();
        var lines = stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var figures = lines[^1].Split(' ');
        var seconds = double.Parse(figures[0], CultureInfo.InvariantCulture);
        var peakMb = long.Parse(figures[1], CultureInfo.InvariantCulture) / 1024.0;
        var summary = lines.FirstOrDefault(l => l.Contains("checked:")) ?? "(no summary)";
        var shown = stdout.Result.Count(c => c == '\n');
        Console.WriteLine($"{name,-28} {text.Length / 1e6,6:0.0} MB  {seconds,7:0.00} s  peak {peakMb,7:0} MB  {shown} lines shown; {summary}");
    }
}
