using MotorLang.Parser.Model;

namespace MotorLang.Analysis.Resolution;

/// <summary>
/// The 'like' lookups of one sizing pass, remembered per motor and attribute so that a chain of n
/// motors written 'like' each other costs n steps per attribute in all, not n² (every motor would
/// otherwise walk the whole chain above it). Iterative, so a chain of any length needs no stack.
/// Gives exactly what <see cref="Likes"/> gives: the first motor along the chain, the motor itself
/// first, that writes the attribute; a cycle in which nobody writes it gives none.
/// </summary>
internal sealed class LikeResolver(MotorList model)
{
    // Keyed by the attribute's getter: the callers pass lambdas that capture nothing, which the
    // compiler creates once, so each attribute has one table.
    private readonly Dictionary<Delegate, Dictionary<MotorNode, MotorNode?>> _owners = new(ReferenceEqualityComparer.Instance);
    private const int MaxTables = 256;
    private readonly List<MotorNode> _path = [];
    private readonly HashSet<MotorNode> _onPath = [];

    /// <summary>Motors visited while walking chains; tests use it to check the work grows linearly.</summary>
    internal long Steps { get; private set; }

    /// <summary>The first value found along the chain, with the motor it was written on.</summary>
    public (Located<T> Value, MotorNode Owner)? Get<T>(MotorNode motor, Func<MotorNode, Located<T>?> get)
    {
        if (get(motor) is { } own) return (own, motor);
        if (motor.Like is null) return null;
        return Owner(motor, get, static (m, g) => g(m) is not null) is { } owner ? (get(owner)!, owner) : null;
    }

    public bool Has(MotorNode motor, Func<MotorNode, bool> has) =>
        has(motor) || (motor.Like is not null && Owner(motor, has, static (m, h) => h(m)) is not null);

    /// <summary>The first motor along the chain for which <paramref name="writes"/> holds, remembered for every motor walked.</summary>
    private MotorNode? Owner<TKey>(MotorNode motor, TKey key, Func<MotorNode, TKey, bool> writes) where TKey : Delegate
    {
        if (!_owners.TryGetValue(key, out var memo))
        {
            // A getter that captures a variable is a new delegate on every call; do not let such tables pile up.
            if (_owners.Count >= MaxTables) _owners.Clear();
            _owners[key] = memo = [];
        }

        if (memo.TryGetValue(motor, out var known)) return known;
        _path.Clear();
        _onPath.Clear();
        MotorNode? found = null;
        for (MotorNode? m = motor; m is not null; m = m.Like is { } like ? model.Find(like.Value) as MotorNode : null)
        {
            Steps++;
            if (memo.TryGetValue(m, out known))
            {
                found = known;
                break;
            }

            if (writes(m, key))
            {
                found = m;
                break;
            }

            // Back at a motor of this walk: a cycle in which nobody writes it.
            if (!_onPath.Add(m)) break;
            _path.Add(m);
        }

        // Every motor walked lacks the attribute, so each finds what the walk found.
        foreach (var m in _path) memo[m] = found;
        return found;
    }
}
