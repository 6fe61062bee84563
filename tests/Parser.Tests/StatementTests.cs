using MotorLang.Parser.Values;
using MotorLang.Domain;
using static MotorLang.Parser.Tests.TestSupport;

namespace MotorLang.Parser.Tests;

public class StatementTests
{
    private const string Feeder = "feeder MCC-1 \"Main\" 480V 3ph";

    private static Model.MotorNode Motor(params string[] body) =>
        DocumentParser.Parse(Lines([Feeder, "  motor P-1 \"Pump\" 15hp", .. body.Select(b => "    " + b)])).Model.Motors.Single();

    [Fact]
    public void FeederHeaderReadsTagDescriptionVoltageAndPhases()
    {
        var f = DocumentParser.Parse(Lines(Feeder)).Model.Feeders.Single();
        Assert.Equal("MCC-1", f.Tag!.Value);
        Assert.Equal("Main", f.Description!.Value);
        Assert.Equal(480m, f.Voltage!.Value.Value);
        Assert.Equal(Phases.Three, f.Phases!.Value);
        Assert.Equal("1:21-1:25", $"{f.Voltage.Range.Start}-{f.Voltage.Range.End}");
    }

    [Theory]
    [InlineData("15hp", 15, Unit.Hp)]
    [InlineData("15 HP", 15, Unit.Hp)]
    [InlineData("1/2hp", 0.5, Unit.Hp)]
    [InlineData("1-1/2hp", 1.5, Unit.Hp)]
    [InlineData("7.5hp", 7.5, Unit.Hp)]
    [InlineData("11kW", 11, Unit.Kw)]
    [InlineData("11 kw", 11, Unit.Kw)]
    public void MotorPowerAcceptsDecimalsFractionsAndKilowatts(string power, double value, Unit unit)
    {
        var m = DocumentParser.Parse(Lines(Feeder, $"  motor P-1 {power}")).Model.Motors.Single();
        Assert.Equal(new Quantity((decimal)value, unit), m.Power!.Value);
    }

    [Theory]
    [InlineData("10 AWG", 1, "10")]
    [InlineData("10awg", 1, "10")]
    [InlineData("4/0 AWG", 1, "4/0")]
    [InlineData("4/0awg", 1, "4/0")]
    [InlineData("250 kcmil", 1, "250")]
    [InlineData("250MCM", 1, "250")]
    [InlineData("2x 250 kcmil", 2, "250")]
    [InlineData("2x250kcmil", 2, "250")]
    [InlineData("3X 500 MCM", 3, "500")]
    public void WireSizesAndAliases(string written, int sets, string size)
    {
        var m = Motor($"wire {written}");
        Assert.Equal(new WireSpec(sets, ConductorSize.Parse(size)), m.Wire!.Value);
    }

    [Fact]
    public void EveryMotorAttributeIsRead()
    {
        var m = Motor(
            "nameplate 19.6A", "service-factor 1.15", "temp-rise 40C", "design B", "code-letter G", "kind wound-rotor",
            "efficiency premium", "duty intermittent 15min", "starting drive 24A", "length 90ft", "wire 10 AWG",
            "ground 10 AWG", "raceway RMC", "protection dual-element-fuse 35A", "overload 22.5A", "disconnect 30A 20hp",
            "controller 20hp", "quantity 2", "application low-speed", "hard-start", "ambient 104F", "ccc 6",
            "conductor al XHHW-2 90C", "drop-limit 3%", "power-factor 0.9");
        Assert.Equal(19.6m, m.Nameplate!.Value.Value);
        Assert.Equal(1.15m, m.ServiceFactor!.Value);
        Assert.Equal(new Quantity(40, Unit.Celsius), m.TemperatureRise!.Value);
        Assert.Equal(DesignLetter.B, m.Design!.Value);
        Assert.Equal(CodeLetter.G, m.CodeLetter!.Value);
        Assert.Equal(MotorKind.WoundRotor, m.Kind!.Value);
        Assert.Equal(Efficiency.Premium, m.Efficiency!.Value);
        Assert.Equal(DutyKind.Intermittent, m.Duty!.Value);
        Assert.Equal(new Quantity(15, Unit.Minute), m.DutyRating!.Value);
        Assert.Equal(StartingMethod.Drive, m.Starting!.Value);
        Assert.Equal(24m, m.DriveInputCurrent!.Value.Value);
        Assert.Equal(new Quantity(90, Unit.Foot), m.Length!.Value);
        Assert.Equal(RacewayType.Rmc, m.Raceway!.Value);
        Assert.Equal(ProtectiveDevice.DualElementFuse, m.Protection!.Value);
        Assert.Equal(35m, m.ProtectionRating!.Value.Value);
        Assert.Equal(22.5m, m.Overload!.Value.Value);
        Assert.Equal(30m, m.DisconnectRating!.Value.Value);
        Assert.Equal(new Quantity(20, Unit.Hp), m.DisconnectPower!.Value);
        Assert.Equal(20m, m.ControllerPower!.Value.Value);
        Assert.Equal(2, m.Quantity!.Value);
        Assert.Equal(NameplateBasis.LowSpeed, m.Application!.Value);
        Assert.True(m.HardStart);
        Assert.Equal(new Quantity(104, Unit.Fahrenheit), m.Ambient!.Value);
        Assert.Equal(6, m.CurrentCarrying!.Value);
        Assert.Equal(ConductorMaterial.Aluminum, m.Material!.Value);
        Assert.Equal("XHHW-2", m.Insulation!.Value);
        Assert.Equal(90, m.InsulationRating!.Value);
        Assert.Equal(new Quantity(3, Unit.Percent), m.BranchDropLimit!.Value);
        Assert.Equal(0.9m, m.PowerFactor!.Value);
    }

    [Fact]
    public void FirePumpDriveAndPartWindingWordsAreRead()
    {
        var m = Motor("fire-service pump", "locked-rotor 790A", "protection inverse-time-breaker 800A fire-pump-listed", "drive-overload");
        Assert.Equal(FireServiceRole.FirePump, m.FireService!.Value);
        Assert.Equal("3:18-3:22", $"{m.FireService.Range.Start}-{m.FireService.Range.End}");
        Assert.Equal(790m, m.LockedRotorCurrent!.Value.Value);
        Assert.True(m.ProtectionListed!.Value);
        Assert.Equal("5:42-5:58", $"{m.ProtectionListed.Range.Start}-{m.ProtectionListed.Range.End}");
        Assert.True(m.DriveOverload!.Value);
        var pw = Motor("starting part-winding", "protection dual-element-fuse both-windings 175A", "overload 60A per-winding");
        Assert.Equal(WindingScope.BothWindings, pw.ProtectionWindings!.Value);
        Assert.Equal(175m, pw.ProtectionRating!.Value.Value);
        Assert.Equal(WindingScope.PerWinding, pw.OverloadWindings!.Value);
        Assert.Equal(FireServiceRole.PressureMaintenance, Motor("fire-service jockey").FireService!.Value);
        var load = DocumentParser.Parse(Lines(Feeder, "  load L-1 2A", "    fire-service accessory")).Model.Feeders.Single().Loads.Single();
        Assert.Equal(FireServiceRole.Accessory, load.FireService!.Value);
    }

    [Theory]
    [InlineData("    fire-service sprinkler", "3:18-3:27 P010")]
    [InlineData("    fire-service", "3:5-3:17 P002")]
    [InlineData("    drive-overload 20A", "3:20-3:23 P003")]
    [InlineData("    protection inverse-time-breaker 800A listed", "3:42-3:48 P010")]
    public void FirePumpWordsReportBadValuesOnTheirOwnSpan(string line, string expected) =>
        Assert.Equal([expected], Codes(Lines(Feeder, "  motor P-1 15hp", line)));

    [Fact]
    public void CapacitorAndWyeDeltaWordsAreRead()
    {
        var m = Motor("capacitor 7.5kVAR 480V line-side", "capacitor-wire 12 AWG", "improved-current 26.5A", "overload 33A line-leads");
        Assert.Equal(new Quantity(7.5m, Unit.Kvar), m.CapacitorKvar!.Value);
        Assert.Equal(480m, m.CapacitorVoltage!.Value.Value);
        Assert.Equal(CapacitorPosition.LineSide, m.CapacitorPosition!.Value);
        Assert.Equal("12 AWG", m.CapacitorWire!.Value.ToString());
        Assert.Equal(26.5m, m.ImprovedCurrent!.Value.Value);
        Assert.Equal(OverloadLocation.LineLeads, m.OverloadLocation!.Value);
        Assert.Equal(20m, Motor("capacitor 20A").CapacitorCurrent!.Value.Value);
    }

    [Theory]
    [InlineData("    capacitor 480V load-side", "3:5-3:14 P045")]
    [InlineData("    capacitor 10kVA", "3:15-3:20 P003")]
    public void ACapacitorNeedsItsKvarOrCurrent(string line, string expected) =>
        Assert.Equal([expected], Codes(Lines(Feeder, "  motor P-1 15hp", line)));

    [Fact]
    public void LoadsTakeCurrentOrKvaAndContinuity()
    {
        var f = DocumentParser.Parse(Lines(Feeder, "  load L-1 \"Lights\" 12A continuous", "  load L-2 6kVA")).Model.Feeders.Single();
        Assert.True(f.Loads[0].Continuous);
        Assert.Equal(12m, f.Loads[0].Current!.Value.Value);
        Assert.False(f.Loads[1].Continuous);
        Assert.Equal(new Quantity(6, Unit.Kva), f.Loads[1].ApparentPower!.Value);
    }

    [Fact]
    public void ValuesWithUnitsMayComeInAnyOrder()
    {
        var m = DocumentParser.Parse(Lines(Feeder, "  motor P-1 \"Pump\" 3ph 460V 15hp")).Model.Motors.Single();
        Assert.Equal(460m, m.RatedVoltage!.Value.Value);
        Assert.Equal(Phases.Three, m.Phases!.Value);
        Assert.Equal(15m, m.Power!.Value.Value);
    }

    [Fact]
    public void DegreeSignIsAcceptedInTemperatures()
    {
        var p = DocumentParser.Parse(Lines("project \"A\"", "  ambient 40°C")).Model.Project!;
        Assert.Equal(new Quantity(40, Unit.Celsius), p.Ambient!.Value);
    }

    [Theory]
    [InlineData("  ambiant 40C", "2:3-2:10 P001")]                // unknown keyword
    [InlineData("  ambient 40", "2:11-2:13 P003")]                // missing unit
    [InlineData("  ambient 40K", "2:11-2:14 P003")]               // unknown unit
    [InlineData("  ambient", "2:3-2:10 P002")]                    // missing value
    [InlineData("  ambient 4.0.1C", "2:11-2:17 P004")]            // bad number
    [InlineData("  ambient 40C 50C", "2:15-2:18 P003")]           // one value too many
    [InlineData("  raceway ENT", "2:11-2:14 P010")]               // unknown word
    [InlineData("  ccc 2.5", "2:7-2:10 P004")]                    // not a whole number
    [InlineData("  power-factor 1.2", "2:16-2:19 P009")]          // out of range
    [InlineData("  nameplate 5A", "2:3-2:12 P012")]               // misplaced
    [InlineData("    ambient 40C", "2:1-2:5 P005")]               // project children are at 2, not 4... first child sets it
    public void SettingDiagnosticsHaveExactSpans(string line, string expected)
    {
        var text = line.StartsWith("    ") ? Lines("project \"A\"", "  code NEC-2023", line) : Lines("project \"A\"", line);
        var expectLine = line.StartsWith("    ") ? expected.Replace("2:", "3:") : expected;
        Assert.Equal([expectLine], Codes(text));
    }

    [Theory]
    [InlineData("    service-factor 0.95", "P009")]
    [InlineData("    wire 13 AWG", "P008")]
    [InlineData("    wire 300 AWG", "P008")]
    [InlineData("    wire 4/0 kcmil", "P008")]
    [InlineData("    wire 10", "P003")]
    [InlineData("    wire 25x 10 AWG", "P009")]
    [InlineData("    wire #10", "P002")]
    [InlineData("    protection fuse 30A", "P010")]
    [InlineData("    code-letter I", "P010")]
    [InlineData("    overload 5A 6A", "P003")]
    [InlineData("    like P-9", "P014")]
    [InlineData("    like P-1", "P016")]
    [InlineData("    \"loose text\"", "P001")]
    [InlineData("    motor P-2 5hp", "P012")]
    public void MotorDiagnostics(string line, string code)
    {
        Assert.Equal([code], DocumentParser.Parse(Lines(Feeder, "  motor P-1 15hp", line)).Diagnostics.Select(d => d.Code));
    }

    [Theory]
    [InlineData("    nameplate 20 amps", "3:15-3:22", "'20 amps': write the unit as its symbol, '20A'")]
    [InlineData("    nameplate 20amps", "3:15-3:21", "'20amps': write the unit as its symbol, '20A'")]
    [InlineData("    nameplate 20 Amperes", "3:15-3:25", "'20 Amperes': write the unit as its symbol, '20A'")]
    [InlineData("    length 90 feet", "3:12-3:19", "'90 feet': write the unit as its symbol, '90ft'")]
    public void AUnitWrittenOutGivesOneMessageWithItsSymbol(string line, string span, string message)
    {
        // Before: '20' needs a unit (P003) and then 'amps' was unexpected (P010), two messages for one mistake.
        var d = DocumentParser.Parse(Lines(Feeder, "  motor P-1 15hp", line)).Diagnostics.Single();
        Assert.Equal("P003", d.Code);
        Assert.Equal(span + " P003", Describe(d));
        Assert.StartsWith(message, d.Message);
    }

    [Fact]
    public void HashTenHintsThatTheHashStartsAComment()
    {
        var d = DocumentParser.Parse(Lines(Feeder, "  motor P-1 15hp", "    wire #10")).Diagnostics.Single();
        Assert.Contains("write '10 AWG'", d.Message);
    }

    [Theory]
    [InlineData("  motor P-1 0hp", "P009")]
    [InlineData("  motor P-1 -5hp", "P009")]
    [InlineData("  motor P-1", "P002")]
    [InlineData("  motor \"Pump\" 5hp", "P002")]
    [InlineData("  motor P-1 5hp 2ph", "P009")]
    [InlineData("  motor P-1 5hp 230V 1ph 240V", "P003")]
    [InlineData("  motor P#1 5hp", "P002")]
    [InlineData("  motor (P1) 5hp", "P017")]
    [InlineData("  load L-1 5A 3kVA", "P010")]
    public void HeaderDiagnostics(string line, string code)
    {
        var codes = DocumentParser.Parse(Lines(Feeder, line)).Diagnostics.Select(d => d.Code).ToArray();
        Assert.Contains(code, codes);
    }

    [Fact]
    public void DidYouMeanSuggestsTheClosestKeyword()
    {
        var d = DocumentParser.Parse(Lines(Feeder, "  motor P-1 5hp", "    namplate 5A")).Diagnostics.Single();
        Assert.Equal("unknown keyword 'namplate'; did you mean 'nameplate'?", d.Message);
    }
}
