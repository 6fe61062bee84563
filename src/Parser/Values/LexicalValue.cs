namespace MotorLang.Parser.Values;

/// <summary>What one word token reads as before the statement decides what it means.</summary>
public abstract record LexicalValue
{
    /// <summary>A number, written as a decimal (19.6), a fraction (1/2) or a mixed number (1-1/2), with an optional unit.</summary>
    public sealed record Number(string Digits, decimal? Value, Unit Unit, string UnitText) : LexicalValue;

    /// <summary>A parallel-set prefix such as "2x" on its own, or "2x" glued to a wire size.</summary>
    public sealed record Parallel(int Sets, Number? Size) : LexicalValue;

    /// <summary>Anything else: keywords, tags, enumerated words.</summary>
    public sealed record Word(string Text) : LexicalValue;
}
