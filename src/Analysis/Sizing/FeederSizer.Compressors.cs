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
    private static List<FeederLoad> EquipmentLoads(IEnumerable<MotorResult> motors) =>
        motors.Where(m => m.EquipmentOtherLoads is > 0)
            .Select(m => new FeederLoad($"{m.Tag} (loads within the equipment)", m.EquipmentOtherLoads!.Value * m.Quantity, false))
            .ToList();

    /// <summary>A feeder result's steps with a first step saying which motor-compressors were counted as motors, and by what rule.</summary>
    private static Result<decimal> WithCompressors(Result<decimal> result, IReadOnlyList<MotorResult> motors, string rule, string note)
    {
        var compressors = motors.Where(m => m.IsCompressor).Select(m => m.Tag).ToList();
        if (compressors.Count == 0) return result;
        var step = new Step("Motor-compressors", string.Join(", ", compressors), rule, note);
        return new Result<decimal>(result.Value, [step, .. result.Steps], result.Unavailable);
    }
}
