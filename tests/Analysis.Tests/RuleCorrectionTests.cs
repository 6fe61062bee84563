using MotorLang.Analysis.Findings;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Reports;
using MotorLang.Analysis.Sizing;
using MotorLang.Parser.Diagnostics;
using static MotorLang.Analysis.Tests.AnalysisFixture;

namespace MotorLang.Analysis.Tests;

/// <summary>
/// Rules that once gave a confident wrong answer: each test names the rule and works the expected
/// value out by hand beside it. NFPA 70-2023 unless said otherwise.
/// </summary>
public class RuleCorrectionTests
{
    private static MotorResult Motor(string text, string tag) => Analyzer.Analyze(text).Motors.Values.Single(m => m.Tag == tag);

    private static List<Finding> Findings(string text, string code) => Analyzer.Analyze(text).Findings.Where(f => f.Code == code).ToList();

    // --- 430.22(G) small conductors -------------------------------------------------------------

    // 10 hp 480 V: 14 A (Table 430.250, 460 V column). 430.22(G)(2) permits 16 AWG copper only up to
    // 8 A, so this is an error; the fix is the 430.22 minimum: 125 % × 14 = 17.5 A -> 12 AWG (20 A at
    // 60 C, Table 310.16; 14 AWG at 75 C for design B gives 20 A too, but the base list's motor has
    // 12 AWG as its clean minimum). Before: no finding at all (Table 310.16 has no 75 C value for 16 AWG).
    [Fact]
    public void Sixteen_Awg_On_A_14_A_Motor_Is_An_Error_With_The_Minimum_As_Fix()
    {
        var text = With(8, "    wire 16 AWG");
        var f = Single(text, FindingCodes.SmallConductorNotPermitted);
        Assert.Equal("9:10-9:16 M120", Describe(f));
        Assert.Equal(Severity.Error, f.Severity);
        Assert.Contains("430.22(G)(2)", f.Message);
        Assert.Contains("8 A", f.Message);
        Assert.Contains("    wire 14 AWG\n", ApplyFix(text, f));
    }

    // 3 hp 480 V: 4.8 A (Table 430.250). 4.8 A <= 5.5 A: 16 AWG copper is permitted with Class 20
    // overloads in an enclosure (430.22(G)(2)(b)), which the list cannot show: a warning that says so.
    // 18 AWG on the same motor: 4.8 A is within the 5 A limit of 430.22(G)(1), above 3.5 A, so Class 10.
    // Aluminium 16 AWG: 430.22(G) is copper only -> error.
    [Fact]
    public void Small_Conductors_Within_The_Limit_Say_Their_Conditions_Are_Not_Checked()
    {
        const string list = "feeder F 480V 3ph\n  motor M 3hp\n    nameplate 4.8A\n    wire {0}\n";
        var sixteen = Single(string.Format(list, "16 AWG"), FindingCodes.SmallConductorConditions);
        Assert.Equal(Severity.Warning, sixteen.Severity);
        Assert.Contains("Class 20", sixteen.Message);
        Assert.Empty(Findings(string.Format(list, "16 AWG"), FindingCodes.SmallConductorNotPermitted));
        var eighteen = Single(string.Format(list, "18 AWG"), FindingCodes.SmallConductorConditions);
        Assert.Contains("Class 10", eighteen.Message);
        var al = "project \"P\"\n  conductor al THHN 75C\n" + string.Format(list, "16 AWG");
        Assert.Contains("copper only", Single(al, FindingCodes.SmallConductorNotPermitted).Message);
    }

    // Aluminium 14 AWG has no Table 310.16 value (the smallest aluminium size is 12 AWG): the wire
    // cannot be checked, and that is said (M204), never passed in silence.
    [Fact]
    public void A_Wire_The_Table_Does_Not_Carry_Is_Said_Not_Skipped()
    {
        var text = Text(["project \"P\"", "  conductor al THHN 75C", .. With(8, "    wire 14 AWG").TrimEnd('\n').Split('\n')]);
        var f = Single(text, FindingCodes.CannotCheck);
        Assert.Contains("cannot be checked", f.Message);
    }

    // --- 430.52(C)(1)(b) hard-start ---------------------------------------------------------------

    // 1/2 hp 480 V wound-rotor: 1.1 A (Table 430.250). Table 430.52(C)(1), wound rotor, inverse-time
    // breaker 150 % = 1.65 A -> next standard rating 10 A (430.52(C)(1)(a), Table 240.6(A) 2023).
    // (b)(3): 400 % = 4.4 A, below every standard breaker rating. The (b) permission only increases,
    // so the maximum stays 10 A. Before: no maximum at all.
    [Fact]
    public void Hard_Start_Never_Lowers_The_Table_Maximum()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 1/2hp", "    kind wound-rotor", "    hard-start", "    protection inverse-time-breaker");
        Assert.Equal(10m, Motor(text, "M").MaximumProtection!.Value);
        Assert.Contains(Findings(text, FindingCodes.NotWritten), f => f.Message == "no rating given; NEC 430.52 allows this inverse-time breaker up to 10 A");
    }

    // 150 hp 480 V: 180 A (Table 430.250). Non-time-delay fuse, table 300 % = 540 A -> 600 A next size
    // (430.52(C)(1)(a)). Hard start: a non-time-delay fuse not exceeding 600 A may go to 400 % (720 A,
    // so 600 A is within it) (430.52(C)(1)(b)(1)); the 300 % limit (540 A -> 500 A) is only for fuses
    // of 601-6000 A. Maximum 600 A. Before: 500 A, and a 600 A fuse was flagged.
    [Fact]
    public void Non_Time_Delay_Fuses_Up_To_600_A_May_Go_To_400_Percent()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 150hp", "    hard-start", "    protection non-time-delay-fuse 600A");
        Assert.Equal(600m, Motor(text, "M").MaximumProtection!.Value);
        Assert.Empty(Findings(text, FindingCodes.ProtectionTooLarge));
    }

    // 125 hp 480 V: 156 A (Table 430.250). Inverse-time breaker: table 250 % = 390 A -> 400 A (next
    // size). (b)(3): FLC above 100 A -> 300 % = 468 A -> 450 A. The larger, 450 A, is the maximum; a
    // 500 A breaker is too large.
    [Fact]
    public void Hard_Start_Breaker_Above_100_A_Is_Limited_To_300_Percent()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 125hp", "    hard-start", "    protection inverse-time-breaker 500A");
        Assert.Equal(450m, Motor(text, "M").MaximumProtection!.Value);
        Assert.Contains("protection inverse-time-breaker 450A", ApplyFix(text, Single(text, FindingCodes.ProtectionTooLarge)));
    }

    // --- motor and system voltages ------------------------------------------------------------------

    // 10 hp 200 V motor on a 208 V system: Table 430.250 200 V column 32.2 A; 430.24 feeder 125 % =
    // 40.25 A. A normal pair (ANSI C84.1 208 V system, 200 V motor): no M110, and the feeder is sized.
    // Before: "cannot run", feeder unsized.
    [Fact]
    public void A_200_V_Motor_On_208_V_Is_A_Normal_Pair()
    {
        var text = Text("feeder F 208V 3ph", "  motor M 10hp 200V");
        var a = Analyzer.Analyze(text);
        Assert.DoesNotContain(a.Findings, f => f.Code == FindingCodes.VoltageMismatch);
        Assert.Equal(32.2m, Motor(text, "M").FullLoadCurrent.Value);
        Assert.Equal(40.25m, a.Feeders.Values.Single().RequiredAmpacity!.Value);
    }

    // 230 V motor on 208 V: 208 V is outside the 220-240 V headnote range, so Table 430.250's 208 V
    // column: 10 hp = 30.8 A (not the 230 V column's 28 A), with a warning.
    [Fact]
    public void A_230_V_Motor_On_208_V_Is_Sized_From_The_208_V_Column()
    {
        var text = Text("feeder F 208V 3ph", "  motor M 10hp 230V");
        Assert.Equal(30.8m, Motor(text, "M").FullLoadCurrent.Value);
        Assert.Equal(Severity.Warning, Single(text, FindingCodes.VoltageMismatch).Severity);
    }

    // 240 V dc motor on a 250 V dc bus: Table 430.247 10 hp 240 V = 38 A; no M110.
    [Fact]
    public void A_240_V_Dc_Motor_On_A_250_V_Bus_Is_A_Normal_Pair()
    {
        var text = Text("feeder F 250V dc", "  motor M 10hp 240V");
        Assert.Empty(Findings(text, FindingCodes.VoltageMismatch));
        Assert.Equal(38m, Motor(text, "M").FullLoadCurrent.Value);
    }

    // --- over 1000 V -------------------------------------------------------------------------------

    // Article 430 Part XI governs: nothing computed (no Table 310.16 wire, no Table 430.52(C)(1)
    // device), M210 says so; 2300 V on 2400 V and 4000 V on 4160 V are normal pairs (no M110).
    [Theory]
    [InlineData("2400V", "2300V")]
    [InlineData("4160V", "4000V")]
    public void Motors_Over_1000_V_Are_Not_Sized(string system, string motor)
    {
        var text = Text($"feeder F 480V 3ph", $"feeder H {system} 3ph", $"  motor M 500hp {motor}");
        var a = Analyzer.Analyze(text);
        Assert.DoesNotContain(a.Findings, f => f.Code == FindingCodes.VoltageMismatch);
        var m = Motor(text, "M");
        Assert.False(m.FullLoadCurrent.HasValue);
        Assert.Null(m.MinimumWire);
        Assert.Null(m.MaximumProtection);
        Assert.Contains(a.Findings, f => f.Code == FindingCodes.OutsideScope && f.Message.Contains("Article 430 Part XI"));
        Assert.Null(a.Feeders.Values.Single(f => f.Tag == "H").MinimumWire);
    }

    // A 4000 V motor fed through a 480 V feeder's "from" chain is not possible; but a low-voltage
    // feeder that supplies a feeder with a motor it cannot size says its sum is incomplete.
    [Fact]
    public void A_Feeder_With_An_Unsized_Motor_Says_Its_Sum_Is_Incomplete()
    {
        var text = Text("feeder F 480V 3ph", "  motor A 10hp", "  motor B 3hp 115V 1ph");
        var f = Analyzer.Analyze(text).Findings.Single(x => x.Code == FindingCodes.CannotCheck && x.Message.Contains("feeder"));
        Assert.Contains("incomplete", f.Message);
    }

    // --- kW ratings ---------------------------------------------------------------------------------

    // 7.5 kW / 0.746 = 10.05 hp: within 1 % of the 10 hp row, the metric equivalent of 10 hp (common
    // practice, no source). Table 430.250 10 hp 460 V = 14 A (before: 15 hp, 21 A). 430.52: inverse-time
    // breaker 250 % × 14 = 35 A. A controller and a disconnect rated 7.5 kW pass (before: M105, M104).
    [Fact]
    public void Seven_And_A_Half_Kilowatts_Is_Ten_Horsepower()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 7.5kW", "    controller 7.5kW", "    disconnect 20A 7.5kW");
        var m = Motor(text, "M");
        Assert.Equal(14m, m.FullLoadCurrent.Value);
        Assert.Equal(35m, m.MaximumProtection!.Value);
        Assert.Empty(Findings(text, FindingCodes.ControllerTooSmall));
        Assert.Empty(Findings(text, FindingCodes.DisconnectTooSmall));
    }

    // 11 kW / 0.746 = 14.75 hp, between the 10 and 15 hp rows. Conductors from the larger row: 15 hp
    // = 21 A (Table 430.250), 125 % = 26.25 A. The 430.52 maximum from the smaller row: 10 hp = 14 A,
    // 250 % = 35 A (never larger than the motor allows). A 10 hp controller is too small; the fix
    // writes the motor's own 11 kW.
    [Fact]
    public void A_Kilowatt_Rating_Between_Rows_Is_Sized_Safe_Both_Ways()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 11kW", "    controller 10hp");
        var m = Motor(text, "M");
        Assert.Equal(21m, m.FullLoadCurrent.Value);
        Assert.Equal(26.25m, m.RequiredAmpacity!.Value);
        Assert.Equal(35m, m.MaximumProtection!.Value);
        Assert.Contains(m.MaximumProtection.Steps, s => s.Label == "Full-load current for the 430.52 maximum");
        Assert.Contains("controller 11kW", ApplyFix(text, Single(text, FindingCodes.ControllerTooSmall)));
    }

    // --- locked-rotor current at the rated voltage ----------------------------------------------------

    // 10 hp 460 V motor on 480 V, code letter G (5.6-6.29 kVA/hp, Table 430.7(B)):
    // 5.6 × 1000 × 10 / (√3 × 460) = 56000 / 796.743 = 70.29 A (at 480 V it would be 67.36 A).
    [Fact]
    public void Locked_Rotor_Current_From_The_Code_Letter_Uses_The_Rated_Voltage()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 10hp 460V", "    code-letter G");
        var lrc = Motor(text, "M").LockedRotorFromCodeLetter!.Value!.Value;
        Assert.Equal(70.29m, decimal.Round(lrc.Minimum, 2));
    }

    // --- conduit fill -------------------------------------------------------------------------------

    // Feeder: 3 × 8 AWG THWN (0.0366 in² each) + 10 AWG ground (0.0211) = 0.1309 in² (Chapter 9 Table 5).
    // 1/2 in EMT: 0.304 in² × 40 % = 0.1216 in² < 0.1309 -> 43.1 % full; 3/4 in EMT 0.533 × 40 % =
    // 0.2132 in² fits (Table 4). Before: feeders were never checked.
    [Fact]
    public void Feeder_Conduit_Fill_Is_Checked()
    {
        var lines = Base.ToList();
        lines.Insert(3, "  conduit 1/2in");
        var text = Text([.. lines]);
        var f = Single(text, FindingCodes.ConduitOverfilled);
        Assert.Equal("4:11-4:16 M109", Describe(f));
        Assert.Contains("43.1 %", f.Message);
        Assert.Contains("  conduit 3/4in\n", ApplyFix(text, f));
    }

    // XHHW-2 areas are not carried (only THHN/THWN/THWN-2 from Chapter 9 Table 5): the fill is said
    // not to be checked. Before: silently skipped.
    [Fact]
    public void Conduit_Fill_For_Other_Insulations_Is_Said_Not_Checked()
    {
        var text = Text(["project \"P\"", "  conductor cu XHHW-2 75C", .. Base, "    conduit 1/2in"]);
        var f = Single(text, FindingCodes.OutsideScope);
        Assert.Contains("XHHW-2", f.Message);
        Assert.Contains("not checked", f.Message);
    }

    // --- check and size agree on the grounding conductor ----------------------------------------------

    // examples/cabinet-shop.motors, SAW-1 (line 15): 5 hp on 208 V, 16.7 A (Table 430.250, 208 V column)
    // -> 125 % = 20.88 A -> 10 AWG (60 C: 12 AWG 20 A is short, 10 AWG 30 A); protection maximum
    // 250 % × 16.7 = 41.75 A -> 45 A; Table 250.122: 60 A row -> 10 AWG, not larger than the 10 AWG phase
    // conductors (250.122(A)). Check must say 10 AWG and size must write 10 AWG (before: 14 AWG and 10 AWG).
    [Fact]
    public void Check_And_Size_Give_One_Grounding_Conductor()
    {
        var text = File.ReadAllText(Path.Combine(Root(), "examples", "cabinet-shop.motors"));
        var f = Analyzer.Analyze(text).Findings.Single(x => x.Code == FindingCodes.NotWritten && x.Range.Start.Line == 14);
        Assert.Contains("needs 10 AWG", f.Message);
        var sized = SizeAll.Apply(text).Split('\n');
        var start = Array.FindIndex(sized, l => l.StartsWith("  motor SAW-1", StringComparison.Ordinal));
        var block = sized.Skip(start + 1).TakeWhile(l => l.StartsWith("    ", StringComparison.Ordinal)).Select(l => l.TrimEnd('\r'));
        Assert.Contains("    ground 10 AWG", block);
    }

    // Feeder with 14 AWG (too small: 430.24 needs 17.5 A, so its fix writes 12 AWG at 60 C, 20 A) and a
    // 14 AWG ground on a 35 A breaker: Table 250.122 gives 10 AWG, not larger than the 12 AWG circuit
    // conductors the fix writes (250.122(A)) -> 12 AWG. Check must ask for 12 AWG now, not pass the
    // 14 AWG by capping at the wire that is being replaced (it would then fail after size).
    [Fact]
    public void Feeder_Ground_Is_Sized_For_The_Corrected_Wire()
    {
        var lines = Base.ToList();
        lines[1] = "  wire 14 AWG";
        lines[2] = "  ground 14 AWG";
        var text = Text([.. lines]);
        var f = Single(text, FindingCodes.GroundUndersized);
        Assert.Contains("the 12 AWG", f.Message);
        var sized = SizeAll.Apply(text);
        Assert.DoesNotContain(Analyzer.Analyze(sized).Findings, x => x.Severity == Severity.Error);
    }

    // --- small things ---------------------------------------------------------------------------------

    [Fact]
    public void A_Rejected_Device_Type_Is_Not_Shown_As_An_Inverse_Time_Breaker()
    {
        var text = Text("feeder F 480V 3ph", "  motor M 10hp", "    protection motor-circuit-protector 30A");
        var row = Schedule.Of(Analyzer.Analyze(text)).Rows.Single();
        Assert.DoesNotContain("ITB", row.MaximumProtection + row.Protection);
        Assert.Contains(Findings(text, FindingCodes.OutsideScope), f => f.Message.Contains("not one MotorLang sizes"));
        Assert.DoesNotContain(Findings(text, FindingCodes.NotWritten), f => f.Message.Contains("short-circuit"));
    }

    [Fact]
    public void Fractions_Print_As_Written()
    {
        var row = Schedule.Of(Analyzer.Analyze(Text("feeder F 230V 1ph", "  motor M 1/6hp"))).Rows.Single();
        Assert.Equal("1/6hp", row.Power);
    }

    [Theory]
    [InlineData("    code-letter Z")]
    [InlineData("    design E")]
    public void No_Suggestion_When_No_Word_Is_Close(string line)
    {
        var d = Analyzer.Analyze(Text("feeder F 480V 3ph", "  motor M 10hp", line)).Parse.Diagnostics.Single();
        Assert.DoesNotContain("did you mean", d.Message);
    }

    // 430.110(A): 115 % × 14 A = 16.1 A; the next Table 240.6(A) rating at or above is 20 A.
    [Fact]
    public void M104_Ampere_Rating_Has_A_Fix()
    {
        var text = Text([.. Base, "    disconnect 15A 10hp"]);
        var f = Single(text, FindingCodes.DisconnectTooSmall);
        Assert.Contains("    disconnect 20A 10hp\n", ApplyFix(text, f));
    }

    private static string Root()
    {
        var dir = AppContext.BaseDirectory;
        while (!File.Exists(Path.Combine(dir, "MotorLang.sln"))) dir = Path.GetDirectoryName(dir)!;
        return dir;
    }
}
