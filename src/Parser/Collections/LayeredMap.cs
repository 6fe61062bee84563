using System.Collections;
using System.Diagnostics.CodeAnalysis;

namespace MotorLang.Parser.Collections;

/// <summary>
/// An immutable map kept as a large shared base and a small layer of changes on top, so that a
/// version after a small edit costs the size of the edit, not of the whole map (tens of thousands
/// of motors, copied on every keystroke, would be megabytes a second). Once the layer grows past a
/// quarter of the base it is folded in.
/// </summary>
public sealed class LayeredMap<TKey, TValue> : IReadOnlyDictionary<TKey, TValue> where TKey : notnull
{
    private readonly Dictionary<TKey, TValue> _base;
    private readonly Dictionary<TKey, TValue> _set;
    private readonly HashSet<TKey> _removed;

    private LayeredMap(Dictionary<TKey, TValue> @base, Dictionary<TKey, TValue> set, HashSet<TKey> removed, int count)
    {
        _base = @base;
        _set = set;
        _removed = removed;
        Count = count;
    }

    public static LayeredMap<TKey, TValue> Empty(IEqualityComparer<TKey>? comparer = null) =>
        new(new Dictionary<TKey, TValue>(comparer), new Dictionary<TKey, TValue>(comparer), new HashSet<TKey>(comparer), 0);

    /// <summary>A map whose base is <paramref name="entries"/> itself, not a copy: the caller must not change it afterwards.</summary>
    public static LayeredMap<TKey, TValue> Over(Dictionary<TKey, TValue> entries) =>
        new(entries, new Dictionary<TKey, TValue>(entries.Comparer), new HashSet<TKey>(entries.Comparer), entries.Count);

    public int Count { get; }

    public TValue this[TKey key] => TryGetValue(key, out var v) ? v : throw new KeyNotFoundException($"{key} is not in the map");

    public bool ContainsKey(TKey key) => TryGetValue(key, out _);

    public bool TryGetValue(TKey key, [MaybeNullWhen(false)] out TValue value)
    {
        if (_set.TryGetValue(key, out value)) return true;
        if (_removed.Contains(key) || !_base.TryGetValue(key, out value))
        {
            value = default;
            return false;
        }

        return true;
    }

    public IEnumerable<TKey> Keys => this.Select(kv => kv.Key);

    public IEnumerable<TValue> Values => this.Select(kv => kv.Value);

    public IEnumerator<KeyValuePair<TKey, TValue>> GetEnumerator()
    {
        foreach (var kv in _base)
        {
            if (!_set.ContainsKey(kv.Key) && !_removed.Contains(kv.Key)) yield return kv;
        }

        foreach (var kv in _set) yield return kv;
    }

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    /// <summary>A builder that starts from this map; this map itself never changes.</summary>
    public Builder ToBuilder() => new(this);

    /// <summary>Changes to make to a map; <see cref="ToMap"/> gives the new version.</summary>
    public sealed class Builder
    {
        private readonly Dictionary<TKey, TValue> _base;
        private readonly Dictionary<TKey, TValue> _set;
        private readonly HashSet<TKey> _removed;
        private int _count;
        private bool _built;

        internal Builder(LayeredMap<TKey, TValue> from)
        {
            _base = from._base;
            _set = new Dictionary<TKey, TValue>(from._set, from._set.Comparer);
            _removed = new HashSet<TKey>(from._removed, from._removed.Comparer);
            _count = from.Count;
        }

        public int Count => _count;

        public TValue this[TKey key]
        {
            get => TryGetValue(key, out var v) ? v : throw new KeyNotFoundException($"{key} is not in the map");
            set
            {
                NotBuilt();
                if (!ContainsKey(key)) _count++;
                _set[key] = value;
                _removed.Remove(key);
            }
        }

        public bool ContainsKey(TKey key) => TryGetValue(key, out _);

        public bool TryGetValue(TKey key, [MaybeNullWhen(false)] out TValue value)
        {
            if (_set.TryGetValue(key, out value)) return true;
            if (_removed.Contains(key) || !_base.TryGetValue(key, out value))
            {
                value = default;
                return false;
            }

            return true;
        }

        public TValue? GetValueOrDefault(TKey key) => TryGetValue(key, out var v) ? v : default;

        public bool Remove(TKey key, [MaybeNullWhen(false)] out TValue value)
        {
            NotBuilt();
            if (!TryGetValue(key, out value)) return false;
            _set.Remove(key);
            if (_base.ContainsKey(key)) _removed.Add(key);
            _count--;
            return true;
        }

        /// <summary>The new version. The builder is spent afterwards: its layer may now be the map's.</summary>
        public LayeredMap<TKey, TValue> ToMap()
        {
            NotBuilt();
            _built = true;
            if (_set.Count + _removed.Count <= Math.Max(256, _base.Count / 4))
                return new LayeredMap<TKey, TValue>(_base, _set, _removed, _count);
            // Fold the layer in: a map built from nothing simply adopts its layer as the base.
            if (_base.Count == 0 && _removed.Count == 0)
                return new LayeredMap<TKey, TValue>(_set, new(_set.Comparer), new(_removed.Comparer), _count);
            var folded = new Dictionary<TKey, TValue>(_count, _set.Comparer);
            foreach (var kv in _base)
            {
                if (!_set.ContainsKey(kv.Key) && !_removed.Contains(kv.Key)) folded[kv.Key] = kv.Value;
            }

            foreach (var kv in _set) folded[kv.Key] = kv.Value;
            return new LayeredMap<TKey, TValue>(folded, new(_set.Comparer), new(_removed.Comparer), _count);
        }

        private void NotBuilt()
        {
            if (_built) throw new InvalidOperationException("this builder has made its map already; start another from the map");
        }
    }
}
