using MotorLang.Domain;

namespace MotorLang.Sizing.Rules;

/// <summary>
/// Where the conductors run. <paramref name="TerminationRating"/> null means "not marked": 110.14(C)
/// then decides (60 °C up to 100 A or 14–1 AWG, 75 °C above, 75 °C for design B, C and D motors).
/// </summary>
public readonly record struct InstallationConditions(
    ConductorMaterial Material = ConductorMaterial.Copper,
    int InsulationRating = 75,
    int? TerminationRating = null,
    decimal AmbientCelsius = 30,
    int CurrentCarrying = 3,
    RacewayType Raceway = RacewayType.Emt,
    string Insulation = "THWN");
