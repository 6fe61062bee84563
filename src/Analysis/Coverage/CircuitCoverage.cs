using MotorLang.Analysis.Sizing;

namespace MotorLang.Analysis.Coverage;

/// <summary>What MotorLang checked on one circuit and what it did not: shown in the hover and the schedule.</summary>
public sealed record CircuitCoverage(IReadOnlyList<AppliedRule> Applied, IReadOnlyList<NotCheckedRule> NotChecked)
{
    /// <summary>With <paramref name="power"/>, the fault-current steps shown for the circuit count among the rules it applied.</summary>
    public static CircuitCoverage For(MotorResult motor, Power.FaultStudy? power = null)
    {
        var fault = power is { HasSource: true } && power.AtController(motor.Motor) is { } bus ? Editing.FaultSections.ForMotor(motor.Motor, bus).SelectMany(s => s.Steps) : [];
        return new(RulesApplied.From(RulesApplied.StepsOf(motor).Concat(fault)), Coverage.NotChecked.For(motor, power));
    }

    public static CircuitCoverage For(FeederResult feeder, Power.FaultStudy? power = null)
    {
        var fault = power is { HasSource: true } && power.Feeders.GetValueOrDefault(feeder.Feeder) is { } f ? Editing.FaultSections.ForFeeder(f).SelectMany(s => s.Steps) : [];
        return new(RulesApplied.From(RulesApplied.StepsOf(feeder).Concat(fault)), Coverage.NotChecked.For(feeder, power));
    }
}
