using MotorLang.Parser.Model;
using MotorLang.Parser.Values;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Resolution;

/// <summary>
/// The installation settings in force for a block: its own, else its parent's, up to the project,
/// else the defaults below. Each value remembers the block it came from, for hovers.
/// </summary>
public sealed record Settings(
    decimal AmbientCelsius,
    ConductorMaterial Material,
    string Insulation,
    int InsulationRating,
    int? TerminationRating,
    RacewayType Raceway,
    int CurrentCarrying,
    decimal BranchDropLimit,
    decimal TotalDropLimit,
    decimal PowerFactor,
    decimal MotorDipLimit,
    decimal BusDipLimit)
{
    /// <summary>
    /// Defaults where nothing is written: 30 °C (the table base), copper THWN (75 °C), EMT, three
    /// conductors, 3 % / 5 %, PF 0.85; a starting dip of 15 % at the motor and 10 % at its bus
    /// (common practice, no source).
    /// </summary>
    public static readonly Settings Defaults = new(30m, ConductorMaterial.Copper, "THWN", 75, null, RacewayType.Emt, 3, 3m, 5m, 0.85m, 15m, 10m);

    public InstallationConditions Conditions => new(Material, InsulationRating, TerminationRating, AmbientCelsius, CurrentCarrying, Raceway, Insulation);

    private static readonly string[] SettingKeywords = ["ambient", "conductor", "raceway", "ccc", "drop-limit", "power-factor", "code", "dip-limit"];

    /// <summary>True when the block writes any installation setting of its own.</summary>
    public static bool HasOwn(BlockNode block)
    {
        foreach (var keyword in SettingKeywords)
        {
            if (block.Has(keyword)) return true;
        }

        return false;
    }

    public static Settings For(BlockNode block, MotorList model) => For(block, model, null);

    /// <summary>
    /// As <see cref="For(BlockNode, MotorList)"/>; with <paramref name="likes"/>, a motor's chain of
    /// 'like' motors is read through its remembered lookups, so long chains stay linear.
    /// </summary>
    internal static Settings For(BlockNode block, MotorList model, LikeResolver? likes)
    {
        // The block, then (for a motor written "like" another) that motor's own settings before its feeder's, then the parents.
        (Located<T> Value, BlockNode Block)? First<T>(Func<BlockNode, Located<T>?> get)
        {
            var parents = block;
            if (block is MotorNode { Like: not null } motor)
            {
                if (likes is not null)
                {
                    if (likes.Get<T>(motor, get) is { } found) return (found.Value, found.Owner);
                }
                else
                {
                    foreach (var m in Likes.Chain(motor, model))
                    {
                        if (get(m) is { } v) return (v, m);
                    }
                }

                parents = block.Parent;
            }

            for (var b = parents; b is not null; b = b.Parent)
            {
                if (get(b) is { } v) return (v, b);
            }

            return null;
        }

        T Pick<T>(Func<BlockNode, Located<T>?> get, T fallback) => First(get) is { } found ? found.Value.Value : fallback;

        // The conductor's material, insulation and ratings come together from the first block that names a material.
        var conductorBlock = First(static b => b.Material)?.Block;
        var d = Defaults;
        return new Settings(
            Pick(b => b.Ambient, new Quantity(d.AmbientCelsius, Unit.Celsius)) is var amb ? Conversions.Celsius(amb) : d.AmbientCelsius,
            conductorBlock?.Material?.Value ?? d.Material,
            conductorBlock?.Insulation?.Value ?? d.Insulation,
            conductorBlock?.InsulationRating?.Value ?? (conductorBlock is null ? d.InsulationRating : 75),
            conductorBlock?.Termination is { } t ? (int)Conversions.Celsius(t.Value) : null,
            Pick(b => b.Raceway, d.Raceway),
            Pick(b => b.CurrentCarrying, d.CurrentCarrying),
            Pick(b => b.BranchDropLimit, new Quantity(d.BranchDropLimit, Unit.Percent)).Value,
            Pick(b => b.TotalDropLimit, new Quantity(d.TotalDropLimit, Unit.Percent)).Value,
            Pick(b => b.PowerFactor, d.PowerFactor),
            Pick(b => b.MotorDipLimit, new Quantity(d.MotorDipLimit, Unit.Percent)).Value,
            Pick(b => b.BusDipLimit, new Quantity(d.BusDipLimit, Unit.Percent)).Value);
    }
}
