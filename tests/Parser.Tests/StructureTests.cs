using static MotorLang.Parser.Tests.TestSupport;

namespace MotorLang.Parser.Tests;

public class StructureTests
{
    [Fact]
    public void MotorsAndLoadsBelongToTheFeederAbove()
    {
        var r = DocumentParser.Parse(Lines(
            "feeder A 480V 3ph", "  motor M1 5hp", "  load L1 3A",
            "feeder B 208V 3ph", "  motor M2 3hp", "    nameplate 10.6A"));
        Assert.Empty(r.Diagnostics);
        Assert.Equal(["M1"], r.Model.Feeders[0].Motors.Select(m => m.Tag!.Value));
        Assert.Equal(["L1"], r.Model.Feeders[0].Loads.Select(m => m.Tag!.Value));
        Assert.Equal(10.6m, r.Model.Feeders[1].Motors[0].Nameplate!.Value.Value);
    }

    [Fact]
    public void AnyConsistentIndentationWorks()
    {
        var r = DocumentParser.Parse(Lines("feeder A 480V 3ph", "    motor M1 5hp", "       nameplate 7A"));
        Assert.Empty(r.Diagnostics);
        Assert.Equal(7m, r.Model.Motors.Single().Nameplate!.Value.Value);
    }

    [Fact]
    public void InconsistentSiblingIndentationIsReportedOnThatLineOnly()
    {
        Assert.Equal(["3:1-3:4 P005"], Codes(Lines("feeder A 480V 3ph", "  length 10ft", "   wire 10 AWG", "  ground 10 AWG")));
    }

    [Fact]
    public void AnIndentedLineAtTheTopIsReported()
    {
        Assert.Equal(["1:1-1:3 P005"], Codes(Lines("  feeder A 480V 3ph")));
    }

    [Fact]
    public void TabsInIndentationAreReported()
    {
        Assert.Equal(["2:1-2:2 P006"], Codes("feeder A 480V 3ph\n\tlength 10ft\n"));
    }

    [Fact]
    public void ATabIndentedLineInAMotorGivesOneMessageAndKeepsTheMotorWhole()
    {
        // Before: the tab's width (1) closed the motor, and every line after it was misplaced in the feeder.
        var r = DocumentParser.Parse(Lines(
            "feeder A 480V 3ph", "  wire 3/0 AWG", "  motor P-101 15hp", "\tnameplate 18.5A",
            "    service-factor 1.15", "    design B", "    wire 10 AWG", "  motor P-102 10hp", "    nameplate 14A"));
        Assert.Equal(["4:1-4:2 P006"], r.Diagnostics.Select(Describe));
        var p101 = r.Model.Motors.Single(m => m.Tag!.Value == "P-101");
        Assert.Equal(18.5m, p101.Nameplate!.Value.Value);
        Assert.NotNull(p101.Wire);
        Assert.Equal(["P-101", "P-102"], r.Model.Motors.Select(m => m.Tag!.Value));
        Assert.Equal(2, r.Model.Feeders.Single().Motors.Count);
    }

    [Fact]
    public void ATabIndentedHeaderOpensItsBlockWhereItBelongs()
    {
        var r = DocumentParser.Parse(Lines(
            "feeder A 480V 3ph", "  motor M1 5hp", "    nameplate 7A", "\tmotor M2 3hp", "    nameplate 4.8A"));
        Assert.Equal(["4:1-4:2 P006"], r.Diagnostics.Select(Describe));
        Assert.Equal(4.8m, r.Model.Motors.Single(m => m.Tag!.Value == "M2").Nameplate!.Value.Value);
        Assert.Equal(7m, r.Model.Motors.Single(m => m.Tag!.Value == "M1").Nameplate!.Value.Value);
    }

    [Fact]
    public void ATabIndentedLineThatBelongsNowhereOpenIsStillReported()
    {
        Assert.Equal(["2:1-2:2 P006", "2:2-2:11 P012"], Codes(Lines("project \"x\"", "\tnameplate 7A")));
    }

    [Fact]
    public void AnUnknownHeaderHidesItsChildrenInsteadOfFloodingDiagnostics()
    {
        var r = DocumentParser.Parse(Lines("feeder A 480V 3ph", "  moter M1 5hp", "    nameplate 7A", "    wire 10 AWG", "  motor M2 3hp"));
        Assert.Equal(["2:3-2:8 P001"], r.Diagnostics.Select(Describe));
        Assert.Equal(["M2"], r.Model.Motors.Select(m => m.Tag!.Value));
        Assert.True(r.Tree.Lines[3].IsBroken);
    }

    [Fact]
    public void OneTypoNeverHidesTheRestOfTheFile()
    {
        var r = DocumentParser.Parse(Lines("feeder A 480V 3ph", "  lenght 10ft", "  wire 10 AWG", "  motor M1 5hp"));
        Assert.Single(r.Diagnostics);
        Assert.NotNull(r.Model.Feeders[0].Wire);
        Assert.Single(r.Model.Motors);
    }

    [Fact]
    public void MotorOutsideAFeederIsMisplaced()
    {
        Assert.Equal(["1:1-1:6 P012"], Codes(Lines("motor M1 5hp", "  nameplate 7A")));
    }

    [Fact]
    public void DuplicateTagsAcrossFeedersMotorsAndLoadsAreReported()
    {
        Assert.Equal(["3:8-3:9 P013", "4:8-4:9 P013"],
            Codes(Lines("feeder A 480V 3ph", "  motor M 5hp", "  load A 3A", "  load m 3A")));
    }

    [Fact]
    public void FeederHierarchyFromAnotherFeeder()
    {
        var r = DocumentParser.Parse(Lines("feeder SWBD 480V 3ph", "feeder MCC 480V 3ph", "  from swbd"));
        Assert.Empty(r.Diagnostics);
        Assert.Same(r.Model.Feeders[0], r.Model.Find(r.Model.Feeders[1].From!.Value));
    }

    [Fact]
    public void FromMustNameAFeederAndLikeAMotor()
    {
        Assert.Equal(["2:8-2:9 P014", "4:10-4:11 P014"],
            Codes(Lines("feeder A 480V 3ph", "  from M", "  motor M 5hp", "    like A")));
    }

    [Fact]
    public void AReferenceCycleIsReportedOnceOnItsFirstMember()
    {
        Assert.Equal(["2:8-2:9 P016"],
            Codes(Lines("feeder A 480V 3ph", "  from B", "feeder B 480V 3ph", "  from A")));
    }

    [Fact]
    public void DuplicateSettingsAndProjectsAreReported()
    {
        Assert.Equal(["3:3-3:10 P015", "4:1-4:8 P020"],
            Codes(Lines("project \"A\"", "  ambient 30C", "  ambient 40C", "project \"B\"")));
    }

    [Fact]
    public void BlockExtentsCoverChildren()
    {
        var r = DocumentParser.Parse(Lines("feeder A 480V 3ph", "  length 5ft", "  motor M 5hp", "    wire 12 AWG", "", "feeder B 480V 3ph"));
        var a = r.Model.Feeders[0];
        Assert.Equal(3, a.LastLine);
        Assert.Equal(1, a.LastOwnLine);
        Assert.Equal(2, a.ChildIndent);
        Assert.Equal(4, a.Motors[0].ChildIndent);
    }

    [Fact]
    public void DiagnosticsNeverRunPastTheirLine()
    {
        var text = Lines("feeder A \"open string 480V 3ph", "  motor M1 5hp \"x", "  load L 3A");
        foreach (var d in DocumentParser.Parse(text).Diagnostics) Assert.Equal(d.Range.Start.Line, d.Range.End.Line);
    }
}
