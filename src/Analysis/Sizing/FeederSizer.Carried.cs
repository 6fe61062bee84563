using MotorLang.Domain;
using MotorLang.Parser.Model;
using MotorLang.Sizing.Rules;

namespace MotorLang.Analysis.Sizing;

/// <summary>
/// What a feeder carries, directly and through the feeders supplied from it, worked out once per
/// feeder from its own motors and loads and the summaries of the feeders below it (children
/// before parents, without recursion). A chain of n feeders costs n steps instead of the n²/2 a
/// list of everything downstream per feeder costs. "First" and ties mean what they meant for that
/// list, in breadth-first order: nearer the feeder first, then in the order written.
/// </summary>
internal sealed partial class FeederSizer
{
    /// <summary>One feeder's summary of everything it carries, at one feeder voltage and device type.</summary>
    private sealed class Carried
    {
        /// <summary>The first feeder supplied at another voltage (then nothing else counts), and how deep.</summary>
        public FeederNode? OtherVoltage;
        public int OtherVoltageDepth;

        /// <summary>The first motor with no full-load current, and how deep.</summary>
        public MotorResult? Unsized;
        public int UnsizedDepth;

        /// <summary>Loads with no current or kVA, in breadth-first order (null when none).</summary>
        public List<(LoadNode Load, int Depth)>? UnknownLoads;

        /// <summary>The motor-compressors carried (440.33), in breadth-first order (null when none).</summary>
        public List<(string Tag, int Depth)>? Compressors;

        /// <summary>Something carried is a fire pump (then its supply rules need every part, listed).</summary>
        public bool FirePump;

        /// <summary>The running totals; null when a motor has no full-load current.</summary>
        public FeederSummary? Totals;

        /// <summary>The motors written with an 'interlock' (430.24 Exception No. 3), in breadth-first order (null when none).</summary>
        public List<InterlockedMotor>? Interlocked;

        /// <summary>The largest full-load current of a motor in no interlock.</summary>
        public decimal FreeLargest;

        /// <summary>A duty-cycle motor is carried (430.24 Exception No. 1): then Exception No. 3 is not applied, the conservative reading.</summary>
        public bool DutyCycle;

        /// <summary>Sum of the Table 430.251 locked-rotor currents (and other loads' currents) for a 430.110(C) disconnect; null when one is not known.</summary>
        public decimal? LockedRotorAmps = 0m;

        /// <summary>The first motor whose locked-rotor current is not known, and why.</summary>
        public string? LockedRotorMissing;
    }

    private readonly Dictionary<(FeederNode Feeder, decimal Volts, Phases Phases, ProtectiveDevice Device), Carried> _carried = [];

    /// <summary>Supplied at another voltage and phases than the feeder being sized: behind a transformer.</summary>
    private static bool OtherVoltage(FeederNode f, decimal volts, Phases phases) =>
        f.Voltage is { } v && f.Phases is { } p && (v.Value.Value != volts || p.Value != phases);

    /// <summary>
    /// A feeder supplied through the transformer written at its head, as the supplying feeder sees
    /// it: one continuous load at the transformer's rated primary current (kVA at the primary
    /// voltage, single-phase kVA ÷ V), the conservative reading of docs/checks.md (M216). Null
    /// where that cannot stand for what is behind it: no transformer, no kVA, a primary voltage
    /// other than the supplying feeder's, a three-phase transformer on a single-phase feeder, or a
    /// fire pump behind it (its supply rules, 695.4(B)(2), need every part).
    /// </summary>
    private FeederLoad? TransformerLoad(FeederNode child, decimal volts, Phases phases)
    {
        if (child.Transformer is null || child.TransformerRating is not { } kva || child.TransformerPrimary is not { } vp || vp.Value.Value != volts) return null;
        if (child.Phases?.Value is not { } behind || behind == Phases.Dc || phases == Phases.Dc) return null;
        if (behind == Phases.Three && phases != Phases.Three) return null;
        if (FirePumpBehind(child)) return null;
        var amps = behind == Phases.Three ? kva.Value.Value * 1000m / (Sqrt3 * volts) : kva.Value.Value * 1000m / volts;
        return new FeederLoad(child.Tag?.Value ?? "", amps, true);
    }

    private Dictionary<FeederNode, bool>? _firePumpBehind;

    /// <summary>A fire pump motor or load on the feeder or anywhere below it (remembered per transformer feeder).</summary>
    private bool FirePumpBehind(FeederNode feeder)
    {
        _firePumpBehind ??= [];
        if (_firePumpBehind.TryGetValue(feeder, out var known)) return known;
        var found = false;
        foreach (var f in Downstream(feeder))
        {
            Steps += 1 + f.Motors.Count + f.Loads.Count;
            found = f.Motors.Any(m => motors.GetValueOrDefault(m) is { FireService: FireServiceRole.FirePump })
                    || f.Loads.Any(l => l.FireService?.Value == FireServiceRole.FirePump);
            if (found) break;
        }

        return _firePumpBehind[feeder] = found;
    }

    /// <summary>
    /// The summary of what <paramref name="top"/> carries, kVA loads converted at the feeder's
    /// voltage and instantaneous-trip branch breakers counted for its device type. Summaries of
    /// the feeders below are kept, so each is worked out once per pass.
    /// </summary>
    private Carried CarriedBy(FeederNode top, decimal volts, Phases phases, ProtectiveDevice device)
    {
        if (_carried.TryGetValue((top, volts, phases, device), out var known)) return known;
        _suppliedFrom ??= SuppliedFrom();
        var entered = new HashSet<FeederNode>();
        var stack = new Stack<(FeederNode Feeder, bool Below)>();
        stack.Push((top, false));
        while (stack.Count > 0)
        {
            var (f, below) = stack.Pop();
            if (_carried.ContainsKey((f, volts, phases, device))) continue;
            var children = _suppliedFrom.GetValueOrDefault(f);
            if (!below)
            {
                // Every feeder below is summed before this one; a feeder met twice (never in a tree of 'from') is summed once.
                if (!entered.Add(f)) continue;
                stack.Push((f, true));
                foreach (var child in children ?? [])
                {
                    if (!OtherVoltage(child, volts, phases) && !_carried.ContainsKey((child, volts, phases, device))) stack.Push((child, false));
                }

                continue;
            }

            _carried[(f, volts, phases, device)] = Summarise(f, children, volts, phases, device);
        }

        return _carried[(top, volts, phases, device)];
    }

    /// <summary>What the interlock and group-disconnect rules need of one motor the feeder carries.</summary>
    private static void NoteRunning(Carried c, MotorResult m)
    {
        var flc = m.FullLoadCurrent.Value!.Value;
        var count = Math.Max(1, m.Quantity);
        c.DutyCycle |= m.DutyCycleAmps is not null;
        // Read on the motor itself, never through 'like': a copied interlock would quietly take a motor out of the sum.
        if (m.Motor.Interlock is { } name)
            (c.Interlocked ??= []).Add(new InterlockedMotor(m.Tag, name.Value, m.Motor.InterlockSet?.Value.ToString(System.Globalization.CultureInfo.InvariantCulture) ?? "\u0000" + m.Tag, flc, count));
        else
            c.FreeLargest = Math.Max(c.FreeLargest, flc);
        // 430.110(C)(1): each motor's locked-rotor current from Table 430.251(A)/(B) for its horsepower.
        if (m.LockedRotorTableMaximum?.Value is { } lra) c.LockedRotorAmps += lra * count;
        else
        {
            c.LockedRotorAmps = null;
            c.LockedRotorMissing ??= $"{m.Tag}: {m.LockedRotorTableMaximum?.Unavailable ?? "no Table 430.251 locked-rotor current"}";
        }
    }

    private Carried Summarise(FeederNode f, List<FeederNode>? children, decimal volts, Phases phases, ProtectiveDevice device)
    {
        Steps += 1 + f.Motors.Count + f.Loads.Count;
        var c = new Carried();
        var ownMotors = new List<FeederMotor>(f.Motors.Count);
        var equipment = new List<FeederLoad>();
        foreach (var motor in f.Motors)
        {
            if (motors.GetValueOrDefault(motor) is not { } m) continue;
            if (!m.FullLoadCurrent.HasValue)
            {
                c.Unsized ??= m;
                continue;
            }

            c.FirePump |= m.FireService == FireServiceRole.FirePump;
            if (m.IsCompressor) (c.Compressors ??= []).Add((m.Tag, 0));
            if (c.Unsized is not null) continue;
            ownMotors.Add(AsFeederMotor(m, device));
            if (EquipmentLoad(m) is { } inside) equipment.Add(inside);
            NoteRunning(c, m);
        }

        var ownLoads = new List<FeederLoad>(f.Loads.Count);
        foreach (var load in f.Loads)
        {
            if (LoadOf(load, volts, phases) is { } l)
            {
                c.FirePump |= load.FireService?.Value == FireServiceRole.FirePump;
                ownLoads.Add(l);
                // 430.110(C)(1): other loads add their rated current to the locked-rotor sum.
                c.LockedRotorAmps += l.Amps;
            }
            else
            {
                (c.UnknownLoads ??= []).Add((load, 0));
            }
        }

        var complete = c.Unsized is null;
        var below = new List<FeederSummary>(children?.Count ?? 0);
        bool unknownBelow = false, compressorsBelow = false;
        foreach (var child in children ?? [])
        {
            Steps++;
            if (OtherVoltage(child, volts, phases) && TransformerLoad(child, volts, phases) is { } transformer)
            {
                // Through a transformer written on the feeder: the supplying side carries the transformer, not the currents behind it.
                ownLoads.Add(transformer);
                continue;
            }

            if (OtherVoltage(child, volts, phases))
            {
                // Scanning in the order written, an earlier feeder at the same depth stays first.
                if (c.OtherVoltage is null || c.OtherVoltageDepth > 1) (c.OtherVoltage, c.OtherVoltageDepth) = (child, 1);
                continue;
            }

            if (_carried.GetValueOrDefault((child, volts, phases, device)) is not { } s) continue;
            if (s.OtherVoltage is { } other && (c.OtherVoltage is null || c.OtherVoltageDepth > s.OtherVoltageDepth + 1))
                (c.OtherVoltage, c.OtherVoltageDepth) = (other, s.OtherVoltageDepth + 1);
            if (s.Unsized is { } unsized && (c.Unsized is null || c.UnsizedDepth > s.UnsizedDepth + 1))
                (c.Unsized, c.UnsizedDepth) = (unsized, s.UnsizedDepth + 1);
            if (s.UnknownLoads is { } loads)
            {
                c.UnknownLoads ??= [];
                foreach (var (load, depth) in loads) c.UnknownLoads.Add((load, depth + 1));
                unknownBelow = true;
            }

            if (s.Compressors is { } compressors)
            {
                c.Compressors ??= [];
                foreach (var (tag, depth) in compressors) c.Compressors.Add((tag, depth + 1));
                compressorsBelow = true;
            }

            c.FirePump |= s.FirePump;
            if (s.Interlocked is { } locked) (c.Interlocked ??= []).AddRange(locked);
            c.FreeLargest = Math.Max(c.FreeLargest, s.FreeLargest);
            c.DutyCycle |= s.DutyCycle;
            c.LockedRotorAmps = c.LockedRotorAmps is { } lr && s.LockedRotorAmps is { } slr ? lr + slr : null;
            c.LockedRotorMissing ??= s.LockedRotorMissing;
            if (s.Totals is { } t) below.Add(t);
            else complete = false;
        }

        // Breadth-first order: by depth, and at one depth in the order the feeders are written (a stable sort keeps it).
        if (unknownBelow) c.UnknownLoads = [.. c.UnknownLoads!.OrderBy(static u => u.Depth)];
        if (compressorsBelow) c.Compressors = [.. c.Compressors!.OrderBy(static u => u.Depth)];
        if (complete && c.Unsized is null) c.Totals = FeederSummary.Combine(FeederSummary.Of(ownMotors, ownLoads, equipment), below);
        return c;
    }
}
