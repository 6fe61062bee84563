using MotorLang.Domain;
using Sprache;

namespace MotorLang.Parser.Values;

/// <summary>
/// The lexical grammar of values inside one token, in Sprache: numbers (decimal, fraction,
/// mixed), units, wire sizes and parallel-set prefixes. Results are memoised per token text by
/// <see cref="ValueReader"/>, because motor lists repeat the same few values thousands of times.
/// </summary>
internal static class ValueGrammar
{
    private static readonly Parser<string> Digits = Parse.Digit.AtLeastOnce().Text();

    private static readonly Parser<string> Decimal =
        from whole in Digits
        from frac in Parse.Char('.').Then(_ => Digits).Optional()
        select frac.IsDefined ? whole + "." + frac.Get() : whole;

    private static readonly Parser<string> LeadingDot =
        from dot in Parse.Char('.')
        from frac in Digits
        select "." + frac;

    // 1/2 and 4/0 both read as fractions here; only a wire-size context accepts a zero denominator.
    private static readonly Parser<string> Fraction =
        from num in Digits
        from slash in Parse.Char('/')
        from den in Digits
        select num + "/" + den;

    private static readonly Parser<string> Mixed =
        from whole in Digits
        from dash in Parse.Char('-')
        from fraction in Fraction
        select whole + "-" + fraction;

    private static readonly Parser<string> NumberText = Mixed.Or(Fraction).Or(Decimal).Or(LeadingDot);

    private static readonly Parser<string> UnitText =
        Parse.Char('°').Optional().Then(deg => Parse.Letter.Or(Parse.Char('%')).AtLeastOnce().Text()
            .Select(u => deg.IsDefined ? "°" + u : u));

    private static readonly Parser<LexicalValue.Number> NumberWithUnit =
        from digits in NumberText
        from unit in UnitText.Optional()
        select MakeNumber(digits, unit.GetOrDefault() ?? "");

    private static readonly Parser<LexicalValue> ParallelPrefix =
        from sets in Digits
        from x in Parse.Chars('x', 'X')
        from size in NumberWithUnit.Optional()
        select (LexicalValue)new LexicalValue.Parallel(int.TryParse(sets, out var n) ? n : 0, size.GetOrDefault());

    private static readonly Parser<LexicalValue> Value =
        ParallelPrefix.Or(NumberWithUnit.Select(n => (LexicalValue)n));

    public static LexicalValue Read(string token)
    {
        var result = Value.End().TryParse(token);
        return result.WasSuccessful ? result.Value : new LexicalValue.Word(token);
    }

    private static LexicalValue.Number MakeNumber(string digits, string unitText)
    {
        var unit = Unit.None;
        if (unitText.Length > 0 && !Units.TryParse(unitText, out unit)) unit = Unit.None;
        // Null for a fraction with a zero denominator: 4/0 is a wire size, not a number.
        return new LexicalValue.Number(digits, Numbers.Parse(digits), unit, unitText);
    }
}
