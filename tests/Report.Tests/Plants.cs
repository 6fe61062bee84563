using MotorLang.Cli;

namespace MotorLang.Report.Tests;

/// <summary>The lists the tests report on: the examples, and a generated plant of 10 feeders × 30 motors (invented).</summary>
public static class Plants
{
    public static readonly string RepoRoot = FindRoot();

    public static string ExamplePath(string name) => Path.Combine(RepoRoot, "examples", name);

    public static string Example(string name) => File.ReadAllText(ExamplePath(name));

    /// <summary>Ten feeders from one switchboard, each with thirty motors of varied ratings and long descriptions.</summary>
    public static string Large(int feeders = 10, int motors = 30)
    {
        var sb = new System.Text.StringBuilder();
        sb.Append("project \"Generated plant\"\n  raceway EMT\n\n");
        sb.Append("feeder SWBD \"Main switchboard\" 480V 3ph\n  protection inverse-time-breaker 2000A\n\n");
        decimal[] hp = [1, 2, 3, 5, 7.5m, 10, 15, 20, 25, 30];
        for (var f = 1; f <= feeders; f++)
        {
            sb.Append($"feeder MCC-{f:00} \"Motor control center number {f} serving process area {f}\" 480V 3ph\n  from SWBD\n  length 150ft\n\n");
            for (var m = 1; m <= motors; m++)
            {
                sb.Append($"  motor M-{f:00}{m:00} \"Process motor {m} of area {f} with a long description\" {hp[m % hp.Length]}hp\n");
                sb.Append($"    length {40 + m}ft\n");
                if (m % 3 == 0) sb.Append("    protection dual-element-fuse 30A\n");
                sb.Append('\n');
            }
        }

        return sb.ToString();
    }

    /// <summary>Runs the command line in-process and returns its exit code and standard output.</summary>
    public static (int Code, string Stdout, string Stderr) Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>A folder for what CI keeps after a run (screenshots, PDFs): artifacts/browser under the repository.</summary>
    public static string ArtifactFolder()
    {
        var dir = Path.Combine(RepoRoot, "artifacts", "browser");
        Directory.CreateDirectory(dir);
        return dir;
    }

    private static string FindRoot()
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir) ?? throw new InvalidOperationException("MotorLang.sln not found above the test folder");
        return dir;
    }
}
