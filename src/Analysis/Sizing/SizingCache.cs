using MotorLang.Sizing;
using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// Remembers sizing-core results for one analysis. A plant repeats the same ratings and settings
/// on many motors, and the sizing functions are pure, so equal inputs share one result (and one
/// set of steps). An update after an edit takes over its previous analysis's cache (only one
/// analysis ever holds it, so it is never used by two threads); past <see cref="Limit"/> entries
/// it is dropped and a fresh one started, so it never grows without bound.
/// </summary>
internal sealed class SizingCache
{
    public const int Limit = 200_000;

    public int Count => _current.Count + _branch.Count + _minimum.Count + _allowable.Count + _protection.Count + _overload.Count + _ground.Count
                        + _groundInstantaneous.Count + _conduit.Count + _disconnect.Count + _nema.Count + _controller.Count
                        + _lockedRotorMax.Count + _codeLetter.Count;

    private readonly Dictionary<MotorRating, Result<decimal>> _current = [];
    private readonly Dictionary<BranchInput, Result<decimal>> _branch = [];
    private readonly Dictionary<(decimal, InstallationConditions, bool), Result<WireSpec>> _minimum = [];
    private readonly Dictionary<(WireSpec, InstallationConditions, bool), Result<decimal>> _allowable = [];
    private readonly Dictionary<ProtectionInput, Result<decimal>> _protection = [];
    private readonly Dictionary<(decimal?, decimal?, decimal?, bool), Result<decimal>> _overload = [];
    private readonly Dictionary<(decimal, ConductorMaterial, WireSpec?, WireSpec?, string), Result<ConductorSize>> _ground = [];
    private readonly Dictionary<(ProtectionInput, ConductorMaterial, WireSpec?, WireSpec?), Result<ConductorSize>> _groundInstantaneous = [];
    private readonly Dictionary<(RacewayContents, RacewayType, string), Result<TradeSize>> _conduit = [];
    private readonly Dictionary<(decimal, decimal), Result<DisconnectRating>> _disconnect = [];
    private readonly Dictionary<(decimal, decimal), (Result<int> Result, string Size)> _nema = [];
    private readonly Dictionary<decimal, Result<decimal>> _controller = [];
    private readonly Dictionary<(decimal, decimal, Phases, DesignLetter?), Result<decimal>> _lockedRotorMax = [];
    private readonly Dictionary<(decimal, decimal, Phases, CodeLetter), Result<CurrentRange>> _codeLetter = [];

    public Result<decimal> DesignCurrent(MotorRating m) => Memo(_current, m, MotorCurrent.DesignCurrent);

    public Result<decimal> RequiredAmpacity(BranchInput b) => Memo(_branch, b, BranchConductors.RequiredAmpacity);

    public Result<WireSpec> MinimumWire(decimal required, InstallationConditions c, bool designBcd) =>
        Memo(_minimum, (required, c, designBcd), k => Ampacity.Minimum(k.Item1, k.Item2, k.Item3));

    public Result<decimal> Allowable(WireSpec wire, InstallationConditions c, bool designBcd) =>
        Memo(_allowable, (wire, c, designBcd), k => Ampacity.Allowable(k.Item1, k.Item2, k.Item3));

    public Result<decimal> MaximumProtection(ProtectionInput p) => Memo(_protection, p, ShortCircuitProtection.Maximum);

    public Result<decimal> Overload(decimal? nameplate, decimal? sf, decimal? rise, bool absolute) =>
        Memo(_overload, (nameplate, sf, rise, absolute), k => k.Item4
            ? Overloads.AbsoluteMaximum(k.Item1, k.Item2, k.Item3)
            : Overloads.Maximum(k.Item1, k.Item2, k.Item3));

    public Result<ConductorSize> Ground(decimal device, ConductorMaterial material, WireSpec? phase, WireSpec? phaseMinimum, string rule) =>
        Memo(_ground, (device, material, phase, phaseMinimum, rule), k => Grounding.Minimum(k.Item1, k.Item2, k.Item3, k.Item4, k.Item5));

    public Result<ConductorSize> GroundForInstantaneousTrip(ProtectionInput p, ConductorMaterial material, WireSpec? phase, WireSpec? phaseMinimum) =>
        Memo(_groundInstantaneous, (p, material, phase, phaseMinimum), k => Grounding.ForInstantaneousTrip(k.Item1, k.Item2, k.Item3, k.Item4));

    public Result<TradeSize> SmallestConduit(RacewayContents contents, RacewayType raceway, string insulation) =>
        Memo(_conduit, (contents, raceway, insulation), k => ConduitFill.SmallestTradeSize(k.Item1, k.Item2, k.Item3));

    public Result<DisconnectRating> Disconnect(decimal flc, decimal hp) => Memo(_disconnect, (flc, hp), k => Disconnects.ForMotor(k.Item1, k.Item2));

    public (Result<int> Result, string Size) Nema(decimal hp, decimal volts) =>
        Memo(_nema, (hp, volts), k => (Controllers.NemaSize(k.Item1, k.Item2, out var size), size));

    public Result<decimal> Controller(decimal hp) => Memo(_controller, hp, Controllers.MinimumHorsepower);

    public Result<decimal> LockedRotorMaximum(decimal hp, decimal volts, Phases phases, DesignLetter? design) =>
        Memo(_lockedRotorMax, (hp, volts, phases, design), k => LockedRotor.TableMaximum(k.Item1, k.Item2, k.Item3, k.Item4));

    public Result<CurrentRange> LockedRotorFromCodeLetter(decimal hp, decimal volts, Phases phases, CodeLetter letter) =>
        Memo(_codeLetter, (hp, volts, phases, letter), k => LockedRotor.FromCodeLetter(k.Item1, k.Item2, k.Item3, k.Item4));

    private static TValue Memo<TKey, TValue>(Dictionary<TKey, TValue> cache, TKey key, Func<TKey, TValue> compute) where TKey : notnull
    {
        if (!cache.TryGetValue(key, out var value)) cache[key] = value = compute(key);
        return value;
    }
}
