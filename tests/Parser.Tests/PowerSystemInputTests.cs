using MotorLang.Domain;
using MotorLang.Parser.Formatting;
using MotorLang.Parser.Values;
using static MotorLang.Parser.Tests.TestSupport;

namespace MotorLang.Parser.Tests;

/// <summary>The inputs of the fault-current study: source, transformer, primary protection, SCCR and interrupting ratings.</summary>
public class PowerSystemInputTests
{
    private static ParseResult Parse(params string[] lines) => DocumentParser.Parse(Lines(lines));

    [Fact]
    public void UtilitySourceReadsKiloAmperesAndXOverR()
    {
        var p = Parse("project \"P\"", "  source utility 42kA x/r 8");
        Assert.Empty(p.Diagnostics);
        var project = p.Model.Project!;
        Assert.Equal(SourceKind.Utility, project.Source!.Value);
        Assert.Equal(new Quantity(42m, Unit.KiloAmp), project.SourceFaultCurrent!.Value);
        Assert.Equal(new Quantity(8m, Unit.XOverR), project.SourceXOverR!.Value);
    }

    [Theory]
    [InlineData("  source utility 42 kA X/R 8", "source utility 42kA x/r 8")]
    [InlineData("  source   utility  x/r 6.6  65KA", "source utility x/r 6.6 65kA")]
    [InlineData("  source generator 500kva 12%", "source generator 500kVA 12%")]
    [InlineData("  source infinite-bus", "source infinite-bus")]
    public void SourceFormatsCanonically(string written, string canonical)
    {
        var formatted = Formatter.Format(Lines("project \"P\"", written)).Text;
        Assert.Equal(Lines("project \"P\"", "  " + canonical), formatted);
        Assert.Empty(DocumentParser.Parse(formatted).Diagnostics);
    }

    [Theory]
    [InlineData("  source utility 42kA", "P035")] // no X/R
    [InlineData("  source utility x/r 8", "P035")] // no kA
    [InlineData("  source generator 500kVA", "P035")] // no X"d
    [InlineData("  source infinite-bus 42kA", "P035")] // an infinite bus has no stated current
    [InlineData("  source utility 42kA x/r", "P002")] // x/r without its number
    [InlineData("  source utility 42kA x/r 0", "P009")]
    [InlineData("  source utility 42 x/r 8", "P003")] // no unit
    [InlineData("  source mains 42kA x/r 8", "P010")]
    public void SourceProblemsAreReportedNotThrown(string line, string code)
    {
        var p = Parse("project \"P\"", line, "feeder F-1 480V 3ph");
        Assert.Contains(p.Diagnostics, d => d.Code == code);
        // One bad line hides nothing else.
        Assert.Single(p.Model.Feeders);
        // The formatter leaves a line with a problem byte for byte.
        Assert.Contains(line, Formatter.Format(p).Text);
    }

    [Fact]
    public void TransformerPrimaryProtectionAndRatingsOnAFeeder()
    {
        var p = Parse(
            "feeder MCC-2 208V 3ph",
            "  transformer 112.5kVA 480V 208V 4.5% x/r 5.2",
            "  primary-protection dual-element-fuse 175A 65kA",
            "  sccr 22kA",
            "  interrupting 25kA",
            "  motor P-1 5hp",
            "    sccr 5kA",
            "    interrupting 10kA");
        Assert.Empty(p.Diagnostics);
        var f = p.Model.Feeders.Single();
        Assert.Equal(112.5m, f.TransformerRating!.Value.Value);
        Assert.Equal(480m, f.TransformerPrimary!.Value.Value);
        Assert.Equal(208m, f.TransformerSecondary!.Value.Value);
        Assert.Equal(4.5m, f.TransformerImpedance!.Value.Value);
        Assert.Equal(5.2m, f.TransformerXOverR!.Value.Value);
        Assert.Equal(ProtectiveDevice.DualElementFuse, f.PrimaryProtection!.Value);
        Assert.Equal(175m, f.PrimaryProtectionRating!.Value.Value);
        Assert.Equal(65m, f.PrimaryInterrupting!.Value.Value);
        Assert.Equal(22m, f.Sccr!.Value.Value);
        Assert.Equal(25m, f.Interrupting!.Value.Value);
        var m = f.Motors.Single();
        Assert.Equal(5m, m.Sccr!.Value.Value);
        Assert.Equal(10m, m.Interrupting!.Value.Value);
    }

    [Fact]
    public void TransformerRoundTripsThroughTheFormatter()
    {
        var text = Lines("feeder MCC-2 208V 3ph", "  transformer 112.5 kVA 480 V 208 V 4.5 % X/R 5.2", "  sccr 22 kA");
        var formatted = Formatter.Format(text).Text;
        Assert.Equal(Lines("feeder MCC-2 208V 3ph", "  transformer 112.5kVA 480V 208V 4.5% x/r 5.2", "  sccr 22kA"), formatted);
        Assert.Equal(formatted, Formatter.Format(formatted).Text);
    }

    [Theory]
    [InlineData("  transformer 480V 208V 4.5%", "P002")] // no kVA
    [InlineData("  sccr 22A", "P003")] // amperes, not kA
    [InlineData("  interrupting", "P002")]
    public void TransformerAndRatingProblems(string line, string code)
    {
        var p = Parse("feeder MCC-2 208V 3ph", line, "  motor P-1 5hp");
        Assert.Contains(p.Diagnostics, d => d.Code == code);
        Assert.Single(p.Model.Motors);
    }

    [Fact]
    public void SourceBelongsInTheProjectOnly()
    {
        var p = Parse("feeder F-1 480V 3ph", "  source utility 42kA x/r 8");
        Assert.Contains(p.Diagnostics, d => d.Code == "P012");
    }
}
