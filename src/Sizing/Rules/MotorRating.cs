using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// What the tables need to know about a motor. <paramref name="Volts"/> is the motor's rated
/// voltage when known, otherwise the system voltage; the table headnotes map either to a column.
/// <paramref name="LowerRow"/> asks, for a rating between table rows, for the next smaller row
/// instead of the next larger (the 430.52 maximum is worked out from it, see <see cref="MotorCurrent.Lookup"/>).
/// </summary>
public readonly record struct MotorRating(
    decimal Power,
    bool Kilowatts,
    decimal Volts,
    Phases Phases,
    MotorKind Kind = MotorKind.Induction,
    DesignLetter? Design = null,
    Efficiency Efficiency = Efficiency.Standard,
    NameplateBasis Basis = NameplateBasis.None,
    decimal? NameplateAmps = null,
    decimal PowerFactor = 1.0m,
    bool LowerRow = false);
