using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Rules;

/// <summary>Adjustable-speed drive systems, Part X of Article 430: sized from the drive's rated input current.</summary>
public static class DriveCircuits
{
    /// <summary>430.128: the disconnecting means is rated at least 115 % of the drive's rated input current.</summary>
    public static Result<DisconnectRating> Disconnect(decimal inputAmps, decimal horsepower)
    {
        var amps = inputAmps * 1.15m;
        return Result<DisconnectRating>.Of(new DisconnectRating(amps, horsepower),
            Step.Amps("Disconnect ampere rating", amps, "NEC 430.128", $"115 % × drive rated input current {Format.Amps(inputAmps)}"),
            new Step("Disconnect horsepower rating", $"{Numbers.Horsepower(horsepower)} hp", "NEC 430.109(A)", "horsepower-rated at least the motor's rating"));
    }
}
