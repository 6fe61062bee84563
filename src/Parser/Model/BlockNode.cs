using MotorLang.Parser.Statements;
using MotorLang.Parser.Values;
using MotorLang.Domain;

namespace MotorLang.Parser.Model;

/// <summary>
/// A project, feeder, motor or load: its header statement and the statements written directly
/// under it, by keyword. Values are read from the statements on demand, so the model keeps one
/// copy of each fact and every value keeps its source range.
/// </summary>
public abstract class BlockNode
{
    // A block has a handful of statements: a list searched by keyword costs less than a dictionary
    // per block, and a list of 10,000 motors has 10,000 blocks.
    private readonly List<Statement> _statements = new(8);
    private static int _nextId;
    private readonly int _id = Interlocked.Increment(ref _nextId);

    protected BlockNode(Statement header, BlockNode? parent)
    {
        Header = header;
        Parent = parent;
        LastLine = header.Line.Index;
        LastOwnLine = header.Line.Index;
    }

    public Statement Header { get; }

    public BlockNode? Parent { get; }

    /// <summary>The statements of this block other than its header, by keyword.</summary>
    public IReadOnlyDictionary<string, Statement> Statements => _statements.ToDictionary(s => s.Keyword, StringComparer.OrdinalIgnoreCase);

    /// <summary>This block's statement with the given keyword, if written.</summary>
    /// <remarks>Keywords are compared exactly: statements carry the canonical (lower-case) keyword whatever the text's case.</remarks>
    public Statement? Statement(string keyword)
    {
        foreach (var s in _statements)
        {
            if (ReferenceEquals(s.Keyword, keyword) || string.Equals(s.Keyword, keyword, StringComparison.Ordinal)) return s;
        }

        return null;
    }

    /// <summary>Blocks are compared by identity; a stored number makes them cheap dictionary keys.</summary>
    public override int GetHashCode() => _id;

    public override bool Equals(object? obj) => ReferenceEquals(this, obj);

    /// <summary>The last line that belongs to the block, children included.</summary>
    public int LastLine { get; internal set; }

    /// <summary>The last line of the header or of one of the block's own statements (not children's).</summary>
    public int LastOwnLine { get; internal set; }

    /// <summary>The indentation the block's own statements use, or null when it has none yet.</summary>
    public int? ChildIndent { get; internal set; }

    /// <summary>Adds a statement; returns the earlier one when the keyword was already given.</summary>
    internal Statement? Add(Statement s)
    {
        if (Statement(s.Keyword) is { } earlier) return earlier;
        _statements.Add(s);
        return null;
    }

    /// <summary>
    /// Gives a fresh node (for a new version of the model) this block's statements and extents,
    /// with <paramref name="old"/> swapped for <paramref name="replacement"/> where it appears.
    /// </summary>
    internal void CopyTo(BlockNode copy, Statement old, Statement replacement)
    {
        foreach (var s in _statements) copy._statements.Add(ReferenceEquals(s, old) ? replacement : s);
        copy.LastLine = LastLine;
        copy.LastOwnLine = LastOwnLine;
        copy.ChildIndent = ChildIndent;
    }

    /// <summary>An argument of the header or of one of this block's statements.</summary>
    public Located<T>? Get<T>(string keyword, string arg)
    {
        var statement = string.Equals(keyword, Header.Keyword, StringComparison.Ordinal)
            ? Header
            : Statement(keyword);
        return statement?.Arg(arg) is { Value: T value } a ? a.Located(value) : null;
    }

    /// <summary>An argument's text as the formatter writes it (e.g. the insulation name).</summary>
    public Located<string>? GetText(string keyword, string arg) =>
        (string.Equals(keyword, Header.Keyword, StringComparison.Ordinal) ? Header : Statement(keyword))
            ?.Arg(arg) is { } a ? new Located<string>(a.Canonical, a.Range) : null;

    public bool Has(string keyword) => Statement(keyword) is not null;

    // Installation settings, as written on this block only (inheritance is resolved by analysis).
    public Located<Quantity>? Ambient => Get<Quantity>("ambient", "temperature");
    public Located<ConductorMaterial>? Material => Get<ConductorMaterial>("conductor", "material");
    public Located<int>? InsulationRating => Get<int>("conductor", "insulation");
    public Located<string>? Insulation => GetText("conductor", "insulation");
    public Located<Quantity>? Termination => Get<Quantity>("conductor", "termination");
    public Located<RacewayType>? Raceway => Get<RacewayType>("raceway", "type");
    public Located<int>? CurrentCarrying => Get<int>("ccc", "count");
    public Located<Quantity>? BranchDropLimit => Get<Quantity>("drop-limit", "branch");
    public Located<Quantity>? TotalDropLimit => Get<Quantity>("drop-limit", "total");
    public Located<decimal>? PowerFactor => Get<decimal>("power-factor", "value");
    public Located<Quantity>? MotorDipLimit => Get<Quantity>("dip-limit", "motor");
    public Located<Quantity>? BusDipLimit => Get<Quantity>("dip-limit", "bus");
    public Located<string>? CodeEdition => Get<string>("code", "edition");
}

public sealed class ProjectNode(Statement header) : BlockNode(header, null)
{
    public Located<string>? Name => Get<string>("project", "name");

    // The title block, as written (free text; printed on schedules and reports).
    public Located<string>? JobNumber => Get<string>("job-number", "number");
    public Located<string>? Revision => Get<string>("revision", "revision");
    public Located<string>? Dated => Get<string>("dated", "date");
    public Located<string>? PreparedBy => Get<string>("prepared-by", "name");
    public Located<string>? CheckedBy => Get<string>("checked-by", "name");

    /// <summary>Written 'plant': the project spans every motor list in its file's folder and below (docs/format.md, Plants).</summary>
    public Statement? Plant => Statement("plant");

    /// <summary>What supplies the plant ('source'), for the available fault current.</summary>
    public Located<SourceKind>? Source => Get<SourceKind>("source", "kind");
    public Located<Quantity>? SourceFaultCurrent => Get<Quantity>("source", "fault-current");
    public Located<Quantity>? SourceXOverR => Get<Quantity>("source", "x-r");
    public Located<Quantity>? SourceRating => Get<Quantity>("source", "rating");
    public Located<Quantity>? SourceReactance => Get<Quantity>("source", "reactance");
}

/// <summary>Circuit attributes shared by feeders and motors.</summary>
public abstract class CircuitNode(Statement header, BlockNode? parent) : BlockNode(header, parent)
{
    public abstract string Keyword { get; }
    public Located<string>? Tag => Get<string>(Keyword, "tag");
    public Located<string>? Description => Get<string>(Keyword, "description");
    public Located<Quantity>? Length => Get<Quantity>("length", "length");
    public Located<WireSpec>? Wire => Get<WireSpec>("wire", "size");
    public Located<WireSpec>? Ground => Get<WireSpec>("ground", "size");
    public Located<Quantity>? Conduit => Get<Quantity>("conduit", "trade-size");
    public Located<ProtectiveDevice>? Protection => Get<ProtectiveDevice>("protection", "device");
    public Located<Quantity>? ProtectionRating => Get<Quantity>("protection", "rating");
    /// <summary>The protective device is stated to be listed for fire pump service.</summary>
    public Located<bool>? ProtectionListed => Get<bool>("protection", "listing");
    public Located<WindingScope>? ProtectionWindings => Get<WindingScope>("protection", "windings");
    /// <summary>The device is stated to be part of a listed combination motor controller.</summary>
    public Located<bool>? ProtectionCombination => Get<bool>("protection", "combination");
    /// <summary>The fuse is stated to be Class CC.</summary>
    public Located<bool>? ProtectionClassCc => Get<bool>("protection", "class");
    /// <summary>The short-circuit current rating of the feeder's bus equipment, or of a motor's controller or drive.</summary>
    public Located<Quantity>? Sccr => Get<Quantity>("sccr", "rating");
    /// <summary>The interrupting rating of this circuit's protective device.</summary>
    public Located<Quantity>? Interrupting => Get<Quantity>("interrupting", "rating");
    public Located<Quantity>? DisconnectRating => Get<Quantity>("disconnect", "rating");
    public Located<Quantity>? DisconnectPower => Get<Quantity>("disconnect", "power");
    /// <summary>The device is stated to provide the motor's overload protection as well (430.55).</summary>
    public Located<bool>? ProtectionCombinedOverload => Get<bool>("protection", "combined");
}

public sealed class FeederNode(Statement header, ProjectNode? project) : CircuitNode(header, project)
{
    private readonly List<MotorNode> _motors = [];
    private readonly List<LoadNode> _loads = [];

    public override string Keyword => "feeder";

    public Located<Quantity>? Voltage => Get<Quantity>("feeder", "voltage");
    public Located<Phases>? Phases => Get<Phases>("feeder", "phases");
    public Located<string>? From => Get<string>("from", "source");
    /// <summary>A transformer at the head of the feeder: the feeder's wire is then its secondary conductors.</summary>
    public Statement? Transformer => Statement("transformer");
    public Located<Quantity>? TransformerRating => Get<Quantity>("transformer", "rating");
    public Located<Quantity>? TransformerPrimary => Get<Quantity>("transformer", "primary");
    public Located<Quantity>? TransformerSecondary => Get<Quantity>("transformer", "secondary");
    public Located<Quantity>? TransformerImpedance => Get<Quantity>("transformer", "impedance");
    public Located<Quantity>? TransformerXOverR => Get<Quantity>("transformer", "x-r");
    public Located<ProtectiveDevice>? PrimaryProtection => Get<ProtectiveDevice>("primary-protection", "device");
    public Located<Quantity>? PrimaryProtectionRating => Get<Quantity>("primary-protection", "rating");
    public Located<Quantity>? PrimaryInterrupting => Get<Quantity>("primary-protection", "interrupting");
    /// <summary>The block is one branch circuit supplying several motors, under this 430.53 permission.</summary>
    public Located<BranchGroupKind>? BranchGroup => Get<BranchGroupKind>("branch-group", "permission");
    /// <summary>A 430.26 demand factor, with the authority's permission as written.</summary>
    public Located<Quantity>? DemandFactor => Get<Quantity>("demand-factor", "factor");
    public Located<string>? DemandPermission => Get<string>("demand-factor", "permission");
    public IReadOnlyList<MotorNode> Motors => _motors;
    public IReadOnlyList<LoadNode> Loads => _loads;

    internal void Add(MotorNode m) => _motors.Add(m);
    internal void Add(LoadNode l) => _loads.Add(l);
}

public sealed class MotorNode(Statement header, FeederNode feeder) : CircuitNode(header, feeder)
{
    /// <summary>'motor', or 'compressor' for a hermetic refrigerant motor-compressor (Article 440).</summary>
    public override string Keyword => Header.Keyword;
    /// <summary>Written as a 'compressor': sized to Article 440 from its marked currents, not from horsepower.</summary>
    public bool IsCompressor => Header.Keyword == "compressor";
    public FeederNode Feeder => feeder;
    public Located<Quantity>? Power => Get<Quantity>("motor", "power");
    /// <summary>Feeder tap conductors from the feeder to this motor's branch device (430.28): their length and size.</summary>
    public Located<Quantity>? TapLength => Get<Quantity>("tap", "length");
    public Located<WireSpec>? TapWire => Get<WireSpec>("tap", "size");
    public Located<Quantity>? RatedVoltage => Get<Quantity>(Keyword, "voltage");
    public Located<Phases>? Phases => Get<Phases>(Keyword, "phases");
    public Located<Quantity>? Nameplate => Get<Quantity>("nameplate", "current");
    public Located<decimal>? ServiceFactor => Get<decimal>("service-factor", "value");
    public Located<Quantity>? TemperatureRise => Get<Quantity>("temp-rise", "temperature");
    public Located<DesignLetter>? Design => Get<DesignLetter>("design", "letter");
    public Located<CodeLetter>? CodeLetter => Get<CodeLetter>("code-letter", "letter");
    public Located<MotorKind>? Kind => Get<MotorKind>("kind", "kind");
    public Located<Efficiency>? Efficiency => Get<Efficiency>("efficiency", "class");
    public Located<decimal>? RatedPowerFactor => Get<decimal>("rated-pf", "value");
    public Located<DutyKind>? Duty => Get<DutyKind>("duty", "duty");
    public Located<Quantity>? DutyRating => Get<Quantity>("duty", "rating");
    public Located<StartingMethod>? Starting => Get<StartingMethod>("starting", "method");
    public Located<Quantity>? DriveInputCurrent => Get<Quantity>("starting", "input-current");
    public Located<Quantity>? Overload => Get<Quantity>("overload", "setting");
    public Located<Quantity>? ControllerPower => Get<Quantity>("controller", "power");
    public Located<int>? Quantity => Get<int>("quantity", "count");
    /// <summary>Read for every attribute a motor inherits, so kept once read (a node never changes).</summary>
    public Located<string>? Like => _likeRead ? _like : ReadLike();

    private Located<string>? _like;
    private volatile bool _likeRead;

    private Located<string>? ReadLike()
    {
        _like = Get<string>("like", "motor");
        _likeRead = true;
        return _like;
    }
    public Located<NameplateBasis>? Application => Get<NameplateBasis>("application", "kind");
    public bool HardStart => Has("hard-start");
    /// <summary>The interlock this motor belongs to (430.24 Exception No. 3) and its set in it.</summary>
    public Located<string>? Interlock => Get<string>("interlock", "name");
    public Located<int>? InterlockSet => Get<int>("interlock", "set");
    public Located<FireServiceRole>? FireService => Get<FireServiceRole>("fire-service", "role");
    public Located<Quantity>? LockedRotorCurrent => Get<Quantity>("locked-rotor", "current");
    public Located<WindingScope>? OverloadWindings => Get<WindingScope>("overload", "windings");
    /// <summary>The drive provides the motor's overload protection (430.124(A)).</summary>
    /// <summary>A motor-compressor's marked rated-load current (RLA, 440.6(A)).</summary>
    public Located<Quantity>? RatedLoad => Get<Quantity>("rated-load", "current");
    /// <summary>A motor-compressor's marked branch-circuit selection current (440.4(C)).</summary>
    public Located<Quantity>? SelectionCurrent => Get<Quantity>("selection-current", "current");
    /// <summary>The equipment's marked minimum circuit ampacity (440.4(B)).</summary>
    public Located<Quantity>? MinimumAmpacity => Get<Quantity>("min-ampacity", "current");
    /// <summary>The equipment's marked maximum branch short-circuit and ground-fault device rating (440.4(B)).</summary>
    public Located<Quantity>? MarkedMaximumProtection => Get<Quantity>("max-protection", "current");
    /// <summary>A power-factor capacitor on the motor circuit (Article 460): its kvar, rated current, voltage and position.</summary>
    public Located<Quantity>? CapacitorKvar => Get<Quantity>("capacitor", "reactive-power");
    public Located<Quantity>? CapacitorCurrent => Get<Quantity>("capacitor", "current");
    public Located<Quantity>? CapacitorVoltage => Get<Quantity>("capacitor", "voltage");
    public Located<CapacitorPosition>? CapacitorPosition => Get<CapacitorPosition>("capacitor", "position");
    public Located<WireSpec>? CapacitorWire => Get<WireSpec>("capacitor-wire", "size");
    /// <summary>The motor circuit's current with the capacitor connected (460.9).</summary>
    public Located<Quantity>? ImprovedCurrent => Get<Quantity>("improved-current", "current");
    /// <summary>Conductors between the controller or drive and the motor (430.22(C), (D), 430.122(B)).</summary>
    public Located<WireSpec>? MotorLeads => Get<WireSpec>("motor-leads", "size");
    public Located<OverloadLocation>? OverloadLocation => Get<OverloadLocation>("overload", "location");
    public bool DriveBypass => Has("drive-bypass");
    /// <summary>The drive's marked or instructed maximum branch device rating (430.130(A)(2)).</summary>
    public Located<Quantity>? DriveMaximumProtection => Get<Quantity>("drive-max-protection", "current");
    /// <summary>The motor control circuit (430.72): its conductors, their protection and a control transformer.</summary>
    public Located<WireSpec>? ControlWire => Get<WireSpec>("control-wire", "size");
    public Located<ConductorMaterial>? ControlWireMaterial => Get<ConductorMaterial>("control-wire", "material");
    public Located<ControlRoute>? ControlRoute => Get<ControlRoute>("control-wire", "route");
    public Located<Quantity>? ControlProtection => Get<Quantity>("control-protection", "rating");
    public Statement? ControlTransformer => Statement("control-transformer");
    public Located<Quantity>? ControlTransformerRating => Get<Quantity>("control-transformer", "rating");
    public Located<Quantity>? ControlTransformerPrimary => Get<Quantity>("control-transformer", "primary");
    public Located<Quantity>? ControlTransformerSecondary => Get<Quantity>("control-transformer", "secondary");
    public Located<Quantity>? ControlPrimaryProtection => Get<Quantity>("control-primary-protection", "rating");
    /// <summary>The number of overload units in the motor's overload device (430.37).</summary>
    public Located<int>? OverloadUnits => Get<int>("overload-units", "count");
    /// <summary>A motor of 1 hp or less started by hand (430.32(D)), with how it is installed and seen.</summary>
    public Located<bool>? ManualStart => Has("manual-start") ? new Located<bool>(true, Statement("manual-start")!.Range) : null;
    public bool Portable => Get<Installation>("manual-start", "installation") is not null;
    public bool WithinSight => Get<SightOfController>("manual-start", "sight") is not null;
    public Located<bool>? DriveOverload => Has("drive-overload") ? new Located<bool>(true, Statement("drive-overload")!.Range) : null;
}

public sealed class LoadNode(Statement header, FeederNode feeder) : CircuitNode(header, feeder)
{
    public override string Keyword => "load";
    public FeederNode Feeder => feeder;
    public Located<Quantity>? Current => Get<Quantity>("load", "current");
    public Located<Quantity>? ApparentPower => Get<Quantity>("load", "apparent-power");
    public bool Continuous => Get<bool>("load", "duty")?.Value ?? false;
    public Located<FireServiceRole>? FireService => Get<FireServiceRole>("fire-service", "role");
}
