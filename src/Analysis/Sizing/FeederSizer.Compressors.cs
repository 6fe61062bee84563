using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Motor-compressors on a feeder (440.33): counted as motors at their rated-load or selection
/// current, with the 440.22 device for 430.62(A); marked equipment's other loads are added to the
/// conductors' sum only.
/// </summary>
internal sealed partial class FeederSizer
{
    /// <summary>
    /// The loads inside marked equipment other than its compressor (its marked minimum circuit
    /// ampacity less 125 % of the compressor's current), for 430.24 and 440.33. They are left out of
    /// 430.62(A): a smaller feeder device limit is the safe side of not knowing them exactly.
    /// </summary>
    private static FeederLoad? EquipmentLoad(MotorResult m) =>
        m.EquipmentOtherLoads is > 0 ? new FeederLoad($"{m.Tag} (loads within the equipment)", m.EquipmentOtherLoads.Value * m.Quantity, false) : null;

    /// <summary>A feeder result's steps with a first step saying which motor-compressors were counted as motors, and by what rule.</summary>
    private static Result<decimal> WithCompressors(Result<decimal> result, List<(string Tag, int Depth)>? compressors, string rule, string note)
    {
        if (compressors is not { Count: > 0 }) return result;
        var step = new Step("Motor-compressors", string.Join(", ", compressors.Select(static c => c.Tag)), rule, note);
        return new Result<decimal>(result.Value, [step, .. result.Steps], result.Unavailable);
    }
}
