using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>What 430.22 needs to know about how the motor runs and starts.</summary>
public readonly record struct BranchInput(
    decimal FullLoadAmps,
    decimal? NameplateAmps = null,
    DutyKind Duty = DutyKind.Continuous,
    DutyRating Rating = DutyRating.Continuous,
    StartingMethod Starting = StartingMethod.FullVoltage,
    decimal? DriveInputAmps = null,
    bool DriveBypass = false);

/// <summary>Branch-circuit conductor ampacity for a single motor, 430.22.</summary>
public static class BranchConductors
{
    /// <summary>The ampacity the branch-circuit conductors on the line side must have.</summary>
    public static Result<decimal> RequiredAmpacity(BranchInput b)
    {
        if (b.Starting == StartingMethod.Drive)
        {
            if (b.DriveInputAmps is not { } input)
                return Result<decimal>.Missing("needs the drive's rated input current (430.122(A)): write 'starting drive 62A'");
            var required = input * 1.25m;
            if (b.DriveBypass)
            {
                // 430.122(C): with a bypass the motor can run across the line, so the larger of the two currents.
                var motor = b.FullLoadAmps * 1.25m;
                var larger = Math.Max(required, motor);
                return Result<decimal>.Of(larger,
                    Step.Amps("Drive input at 125 %", required, "NEC 430.122(C)", $"125 % × drive rated input current {Format.Amps(input)}"),
                    Step.Amps("Motor at 125 %", motor, "NEC 430.122(C)", $"125 % × motor full-load current {Format.Amps(b.FullLoadAmps)} (430.6(A)(1))"),
                    Step.Amps("Required ampacity", larger, "NEC 430.122(C)", "the drive has a bypass device: the larger of the two"));
            }

            return Result<decimal>.Of(required, Step.Amps("Required ampacity", required, "NEC 430.122(A)",
                $"125 % × drive rated input current {Format.Amps(input)}"));
        }

        if (b.Duty != DutyKind.Continuous && DutyPercent(b.Duty, b.Rating) is { } percent)
        {
            var basis = b.NameplateAmps ?? b.FullLoadAmps;
            var why = b.NameplateAmps is null ? " (nameplate not given: table full-load current used instead)" : "";
            var required = basis * percent / 100m;
            return Result<decimal>.Of(required, Step.Amps("Required ampacity", required, "NEC 430.22(E), Table 430.22(E)",
                $"{Format.Percent(percent)} × {Format.Amps(basis)} for {b.Duty.ToString().ToLowerInvariant()} duty{why}"));
        }

        var continuous = b.FullLoadAmps * 1.25m;
        var steps = new List<Step>
        {
            Step.Amps("Required ampacity", continuous, "NEC 430.22", $"125 % × full-load current {Format.Amps(b.FullLoadAmps)}"),
        };
        if (b.Starting == StartingMethod.WyeDelta)
            steps.Add(Step.Amps("Controller-to-motor conductors", b.FullLoadAmps * 0.72m, "NEC 430.22(C)", "72 % of full-load current for the conductors between controller and motor"));
        if (b.Starting == StartingMethod.PartWinding)
            steps.Add(Step.Amps("Each of the two winding sets", b.FullLoadAmps * 0.625m, "NEC 430.22(D)", "62.5 % of full-load current for each set"));
        return new Result<decimal>(continuous, [.. steps]);
    }

    /// <summary>
    /// The ampacity of the conductors between the controller (or drive) and the motor, where they are not
    /// the branch conductors: wye-delta 72 % (430.22(C)), part-winding 62.5 % (430.22(D)), drive output
    /// 125 % (430.122(B)), each of the motor's 430.6(A)(1) full-load current. Null for other starting.
    /// </summary>
    public static Result<decimal>? LeadAmpacity(decimal fullLoadAmps, StartingMethod starting) => starting switch
    {
        StartingMethod.WyeDelta => Result<decimal>.Of(fullLoadAmps * 0.72m, Step.Amps("Controller-to-motor conductors", fullLoadAmps * 0.72m, "NEC 430.22(C)",
            $"72 % × {Format.Amps(fullLoadAmps)}: the leads carry 58 % of the line current (Informational Note), × 125 %")),
        StartingMethod.PartWinding => Result<decimal>.Of(fullLoadAmps * 0.625m, Step.Amps("Controller-to-motor conductors, each winding set", fullLoadAmps * 0.625m, "NEC 430.22(D)",
            $"62.5 % × {Format.Amps(fullLoadAmps)}: each set carries 50 % (Informational Note), × 125 %")),
        StartingMethod.Drive => Result<decimal>.Of(fullLoadAmps * 1.25m, Step.Amps("Drive output conductors", fullLoadAmps * 1.25m, "NEC 430.122(B)",
            $"125 % × motor full-load current {Format.Amps(fullLoadAmps)} (its exception for drives marked for output conductor protection not applied)")),
        _ => null,
    };

    /// <summary>Table 430.22(E); null where the table has no entry (a continuous-rated motor on short-time duty).</summary>
    public static decimal? DutyPercent(DutyKind duty, DutyRating rating)
    {
        var t = CodeTables.DutyCycle;
        var row = t.Rows.First(r => r[0] == duty switch
        {
            DutyKind.ShortTime => "short-time",
            DutyKind.Intermittent => "intermittent",
            DutyKind.Periodic => "periodic",
            _ => "varying",
        });
        var column = rating switch
        {
            DutyRating.Minutes5 => "min5",
            DutyRating.Minutes15 => "min15",
            DutyRating.Minutes30To60 => "min30to60",
            _ => "continuous",
        };
        return CsvTable.Number(row[t.Column(column)]);
    }
}
