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
    decimal? DriveInputAmps = null);

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
