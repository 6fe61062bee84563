namespace MotorLang.Parser.Values;

/// <summary>Reads token texts through <see cref="ValueGrammar"/>, remembering each distinct text once per document.</summary>
internal sealed class ValueReader
{
    private readonly Dictionary<string, LexicalValue> _seen = new(StringComparer.Ordinal);
    private readonly Dictionary<(string, Unit), string> _canonical = [];
    private readonly Dictionary<Domain.WireSpec, string> _wires = [];

    /// <summary>How the formatter writes a number with its unit; one string per distinct value.</summary>
    public string Canonical(LexicalValue.Number n)
    {
        if (!_canonical.TryGetValue((n.Digits, n.Unit), out var text))
            // An X/R ratio is written as the word and then the number ("x/r 8"), like the trade writes it.
            _canonical[(n.Digits, n.Unit)] = text = n.Unit == Unit.XOverR ? "x/r " + n.Digits : n.Digits + Units.Canonical(n.Unit);
        return text;
    }

    public string Canonical(Domain.WireSpec wire)
    {
        if (!_wires.TryGetValue(wire, out var text)) _wires[wire] = text = wire.ToString();
        return text;
    }

    public LexicalValue Read(string token)
    {
        if (_seen.TryGetValue(token, out var v)) return v;
        // Tokens that cannot start a number are words; skipping the grammar for them keeps
        // unique tags and descriptions from filling the memo.
        v = token.Length > 0 && (char.IsAsciiDigit(token[0]) || token[0] == '.')
            ? ValueGrammar.Read(token)
            : new LexicalValue.Word(token);
        if (_seen.Count < 100_000) _seen[token] = v;
        return v;
    }
}
