namespace MotorLang.Parser.Values;

/// <summary>Reads token texts through <see cref="ValueGrammar"/>, remembering each distinct text once per document.</summary>
internal sealed class ValueReader
{
    private readonly Dictionary<string, LexicalValue> _seen = new(StringComparer.Ordinal);

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
