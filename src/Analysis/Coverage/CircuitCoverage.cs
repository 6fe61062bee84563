using MotorLang.Analysis.Sizing;

namespace MotorLang.Analysis.Coverage;

/// <summary>What MotorLang checked on one circuit and what it did not: shown in the hover and the schedule.</summary>
public sealed record CircuitCoverage(IReadOnlyList<AppliedRule> Applied, IReadOnlyList<NotCheckedRule> NotChecked)
{
    public static CircuitCoverage For(MotorResult motor, Power.FaultStudy? power = null) => new(RulesApplied.Of(motor), Coverage.NotChecked.For(motor, power));

    public static CircuitCoverage For(FeederResult feeder, Power.FaultStudy? power = null) => new(RulesApplied.Of(feeder), Coverage.NotChecked.For(feeder, power));
}
