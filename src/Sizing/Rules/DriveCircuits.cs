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

    /// <summary>
    /// 430.130(A)(2): a maximum branch short-circuit and ground-fault device stated in the drive's
    /// instructions or marked on it is not exceeded even where 430.130(A)(1) (430.52) permits more.
    /// Where 430.52 gives no value, none is given here either: the marking is a ceiling, not a permission.
    /// </summary>
    public static Result<decimal> MarkedMaximum(Result<decimal> code, decimal marked)
    {
        if (code.Value is not { } max) return code;
        if (marked >= max)
            return new Result<decimal>(max, [.. code.Steps,
                Step.Amps("Drive's marked maximum", marked, "NEC 430.130(A)(2)", $"above the {Format.Amps(max)} of 430.52, which still governs")]);
        return new Result<decimal>(marked, [.. code.Steps,
            Step.Amps("Maximum rating or setting", marked, "NEC 430.130(A)(2)", $"the drive's marked or instructed maximum, below the {Format.Amps(max)} 430.52 permits: never exceeded")]);
    }
}
