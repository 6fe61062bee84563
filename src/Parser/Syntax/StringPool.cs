namespace MotorLang.Parser.Syntax;

/// <summary>
/// Hands out one string instance per distinct short word. A motor list repeats the same keywords
/// and values on every motor, so sharing them removes most of the parser's allocations.
/// </summary>
internal sealed class StringPool
{
    private const int MaxPooledLength = 32;
    private readonly Dictionary<string, string> _strings = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string>.AlternateLookup<ReadOnlySpan<char>> _lookup;

    public StringPool() => _lookup = _strings.GetAlternateLookup<ReadOnlySpan<char>>();

    public string Get(ReadOnlySpan<char> text)
    {
        if (text.Length > MaxPooledLength) return text.ToString();
        if (_lookup.TryGetValue(text, out var s)) return s;
        s = text.ToString();
        if (_strings.Count < 50_000) _strings[s] = s;
        return s;
    }
}
