using System.Text;
using MotorLang.Cli.Usage;

namespace MotorLang.Cli.Tests;

/// <summary>
/// The conventions people expect of formatters and linters: usage errors with suggestions, `-` for
/// standard input, check-only modes that exit 1, colour choices, quiet and severity filters, a
/// schedule that fits the terminal, and `explain`.
/// </summary>
public sealed class ConventionTests : IDisposable
{
    private const string Typo = "feeder F 480V 3ph\n  lenght 10ft\n";
    private const string Messy = "FEEDER F 480v 3ph\n  motor M 5 hp\n";
    private const string Tidy = "feeder F 480V 3ph\n  motor M 5hp\n";

    private readonly string _dir = Directory.CreateTempSubdirectory("motorlang-conv-").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static (int Code, string Out, string Err) Run(CliEnvironment env, params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = CommandLine.Run(args, stdout, stderr, env);
        return (code, stdout.ToString(), stderr.ToString());
    }

    private static (int Code, string Out, string Err) Run(params string[] args) => Run(CliEnvironment.Plain(), args);

    private static CliEnvironment Stdin(string text) => CliEnvironment.Plain(new MemoryStream(Encoding.UTF8.GetBytes(text)));

    private static CliEnvironment Terminal(int width, params (string Name, string Value)[] variables) =>
        new(() => Stream.Null, true, width, name => variables.FirstOrDefault(v => v.Name == name).Value);

    private string Write(string name, string text)
    {
        var path = Path.Combine(_dir, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void AMisspeltCommandIsAUsageErrorWithTheClosestCommand()
    {
        var (code, _, err) = Run("chek", "a.motors");
        Assert.Equal(2, code);
        Assert.Contains("unknown command 'chek'; did you mean 'check'?", err);

        // Nothing is close to this word, so nothing is offered.
        var far = Run("xyzzy");
        Assert.Equal(2, far.Code);
        Assert.Contains("unknown command 'xyzzy'", far.Err);
        Assert.DoesNotContain("did you mean", far.Err);
    }

    [Fact]
    public void AnUnknownOptionIsAUsageErrorNotAFileName()
    {
        var path = Write("a.motors", Tidy);
        var (code, _, err) = Run("fmt", "--chek", path);
        Assert.Equal(2, code);
        Assert.Contains("unknown option '--chek' for 'motorlang fmt'; did you mean '--check'?", err);
        Assert.DoesNotContain("cannot read", err);
        Assert.Equal(2, Run("check", "--bogus", path).Code);

        // After `--` a word starting with a dash is a file name.
        var dashed = Write("-odd.motors", Tidy);
        Assert.Equal(0, Run("check", "--", dashed).Code);
    }

    [Fact]
    public void CheckReadsStandardInputUnderTheGivenName()
    {
        var (code, output, err) = Run(Stdin(Typo), "check", "-", "--stdin-filename", "plant/a.motors");
        Assert.Equal(1, code);
        Assert.StartsWith("plant/a.motors:2:3: error P001: unknown keyword 'lenght'", output);
        Assert.Contains("1 file checked: 1 error", err);

        Assert.StartsWith("<stdin>:2:3: error P001", Run(Stdin(Typo), "check", "-").Out);
        Assert.Equal(2, Run(Stdin(Typo), "check", "-", Write("b.motors", Tidy)).Code); // stdin or files, not both
        Assert.Equal(2, Run("check", "--stdin-filename", "x.motors", Write("c.motors", Tidy)).Code); // the name needs '-'
    }

    [Fact]
    public void StandardInputIsHeldToTheSameEncodingRule()
    {
        var env = CliEnvironment.Plain(new MemoryStream([.. Encoding.ASCII.GetBytes("project \"Caf"), 0xE9, (byte)'"', (byte)'\n']));
        var (code, _, err) = Run(env, "check", "-");
        Assert.Equal(2, code);
        Assert.Contains("'<stdin>' is not UTF-8", err);
    }

    [Fact]
    public void FmtOfStandardInputWritesTheFormattedTextToStandardOutput()
    {
        var (code, output, _) = Run(Stdin(Messy), "fmt", "-");
        Assert.Equal(0, code);
        Assert.Equal(Tidy, output);

        var check = Run(Stdin(Messy), "fmt", "--check", "-", "--stdin-filename", "in.motors");
        Assert.Equal(1, check.Code);
        Assert.Equal("in.motors: would be reformatted", check.Out.Trim());
        Assert.Equal(0, Run(Stdin(Tidy), "fmt", "--check", "-").Code);
    }

    [Fact]
    public void FmtDiffShowsTheChangeAndWritesNothing()
    {
        var path = Write("m.motors", Messy);
        var (code, output, _) = Run("fmt", "--diff", path);
        Assert.Equal(0, code);
        Assert.Equal(
            $"--- {path}\n+++ {path} (formatted)\n@@ -1,2 +1,2 @@\n-FEEDER F 480v 3ph\n-  motor M 5 hp\n+feeder F 480V 3ph\n+  motor M 5hp\n",
            output);
        Assert.Equal(Messy, File.ReadAllText(path));

        var both = Run("fmt", "--check", "--diff", path);
        Assert.Equal(1, both.Code);
        Assert.Contains("@@ -1,2 +1,2 @@", both.Out);
        Assert.Contains($"{path}: would be reformatted", both.Out);
    }

    [Theory]
    [InlineData("--check", "--stdout")]
    [InlineData("--diff", "--stdout")]
    public void ContradictoryFmtFlagsAreRejected(string a, string b)
    {
        var path = Write("m.motors", Messy);
        var (code, output, err) = Run("fmt", a, b, path);
        Assert.Equal(2, code);
        Assert.Contains($"{a} and {b} cannot be used together", err);
        Assert.Equal("", output);
        Assert.Equal(Messy, File.ReadAllText(path));
    }

    [Fact]
    public void SizeCheckAndDryRunExitOneWhenTheListWouldChange()
    {
        var path = Write("s.motors", Tidy); // no sizes written yet, so size would add them
        var check = Run("size", "--check", path);
        Assert.Equal(1, check.Code);
        Assert.Equal($"{path}: would be sized", check.Out.Trim());
        Assert.Equal(Tidy, File.ReadAllText(path));

        var dry = Run("size", "--dry-run", path);
        Assert.Equal(1, dry.Code);
        Assert.Contains("+    wire ", dry.Out);
        Assert.Equal(Tidy, File.ReadAllText(path));

        Assert.Equal(2, Run("size", "--check", "--dry-run", path).Code);

        Assert.Equal(0, Run("size", path).Code);
        Assert.Equal(0, Run("size", "--check", path).Code);
        Assert.Equal(0, Run("size", "--dry-run", path).Code);
    }

    [Fact]
    public void DiffExitCodeSaysWhetherTheVersionsDiffer()
    {
        var a = Write("a.motors", Tidy);
        var b = Write("b.motors", Tidy.Replace("5hp", "10hp"));
        Assert.Equal(0, Run("diff", a, b).Code); // without the option a difference is no failure
        Assert.Equal(1, Run("diff", "--exit-code", a, b).Code);
        Assert.Equal(0, Run("diff", "--exit-code", a, Write("c.motors", Tidy)).Code);
    }

    [Fact]
    public void SeveritiesAreColouredOnlyWhenAskedOrOnATerminalWithoutNoColor()
    {
        var path = Write("t.motors", Typo);
        const string red = "\u001b[1;31merror\u001b[0m";
        Assert.Contains(red, Run("check", "--color", "always", path).Out);
        Assert.DoesNotContain("\u001b[", Run("check", path).Out); // auto, not a terminal
        Assert.Contains(red, Run(Terminal(120), "check", path).Out); // auto on a terminal
        Assert.DoesNotContain("\u001b[", Run(Terminal(120, ("NO_COLOR", "1")), "check", path).Out);
        Assert.DoesNotContain("\u001b[", Run(Terminal(120, ("TERM", "dumb")), "check", path).Out);
        Assert.DoesNotContain("\u001b[", Run(Terminal(120), "check", "--color", "never", path).Out);
        Assert.Contains(red, Run(Terminal(120, ("NO_COLOR", "1")), "check", "--color", "always", path).Out); // explicit wins
        Assert.Contains(red, Run("--color", "always", "check", path).Out); // before the command too
        Assert.Equal(2, Run("check", "--color", "sometimes", path).Code);
    }

    [Fact]
    public void QuietDropsTheTotalsAndTheSeverityFilterHidesLesserFindings()
    {
        var path = Write("q.motors", Tidy + "  motor N 5hp\n    wire 20 AWG\n");
        var all = Run("check", path);
        Assert.Contains(": warning M204", all.Out);
        Assert.Contains(": information M301", all.Out);

        var errorsOnly = Run("check", "--severity", "error", "-q", path);
        Assert.Equal(all.Code, errorsOnly.Code);
        Assert.Equal("", errorsOnly.Err);
        Assert.All(errorsOnly.Out.Trim().Split('\n'), l => Assert.Contains(": error ", l));
        Assert.NotEmpty(errorsOnly.Out.Trim());

        var warnings = Run("check", "--severity", "warning", path).Out;
        Assert.Contains(": warning M204", warnings);
        Assert.DoesNotContain(": information ", warnings);
    }

    [Fact]
    public void TheScheduleFitsANarrowTerminalAndSaysWhatItLeftOut()
    {
        var example = Path.Combine(Executable.RepoRoot, "examples", "dairy-bottling.motors");
        var (_, narrow, _) = Run(Terminal(100), "schedule", example);
        Assert.All(narrow.Split('\n'), l => Assert.True(l.Length <= 100, $"{l.Length} columns: {l}"));
        Assert.Contains("Not shown, to fit 100 columns: Voltage drop", narrow);
        Assert.Contains("--format markdown or csv", narrow);
        Assert.Contains("Status", narrow);

        var (_, piped, _) = Run("schedule", example);
        Assert.Contains("Voltage drop", piped.Split('\n')[1]);
        Assert.DoesNotContain("Not shown", piped);
        // The abbreviations the cells use are spelt out under the table (as prose wrapped to the width).
        var prose = piped.Replace("\n", " ");
        Assert.Contains("FLC = full-load current", prose);
        Assert.Contains("ITB = inverse-time breaker", prose);
        Assert.Contains("DE fuse = dual-element (time-delay) fuse", prose);
    }

    [Fact]
    public void ExplainPrintsTheDocumentationsOwnEntry()
    {
        var doc = File.ReadAllLines(Path.Combine(Executable.RepoRoot, "docs", "checks.md"));
        var row = doc.Single(l => l.StartsWith("| M103 |"));
        var cells = row.Split('|').Select(c => c.Trim()).Where(c => c.Length > 0).ToList();

        var (code, output, _) = Run("explain", "m103");
        Assert.Equal(0, code);
        Assert.StartsWith("M103 (docs/checks.md)", output);
        Assert.Contains($"Rule: {cells[2]}", output);
        Assert.Contains($"What it means: {cells[3]}", output);
        Assert.Contains($"Fix: {cells[5]}", output);

        var format = File.ReadAllLines(Path.Combine(Executable.RepoRoot, "docs", "format.md")).Single(l => l.StartsWith("| P005 |"));
        Assert.Contains($"Meaning: {format.Split('|')[2].Trim()}", Run("explain", "P005").Out);

        var missing = Run("explain", "M13");
        Assert.Equal(2, missing.Code);
        Assert.Contains("no finding code 'M13' (did you mean 'M103'?)", missing.Err);
    }
}
