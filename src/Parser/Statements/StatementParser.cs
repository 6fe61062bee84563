using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;
using MotorLang.Parser.Values;
using MotorLang.Domain;

namespace MotorLang.Parser.Statements;

/// <summary>
/// Matches the tokens after a keyword to the keyword's argument positions. Tag and description
/// come first in order; values with units may then come in any order, since their units say
/// what they are.
/// </summary>
internal sealed class StatementParser(ValueReader reader, List<Diagnostic> diagnostics)
{
    // Reused for every line: a document has one parser and reads one line at a time.
    private readonly List<Item> _items = [];
    private readonly Dictionary<(string Digits, Unit Unit), object> _quantities = [];
    private Argument?[]?[] _filled = new Argument?[]?[8];

    /// <summary>
    /// Problems reported one by one on a line; the rest are counted into one P027 diagnostic, so a
    /// line of a million stray values costs one diagnostic per line, not one per value.
    /// </summary>
    internal const int MaxProblemsPerLine = 10;

    private int _lineStart;
    private int _notShown;
    private SourceRange _notShownFrom;
    private SourceRange _notShownTo;

    /// <summary>A value made of one token or of a number and its unit written apart ("15 hp", "10 AWG").</summary>
    private readonly record struct Item(SyntaxToken First, SyntaxToken Last, LexicalValue Value)
    {
        public SourceRange Range => SourceRange.Cover(First.Range, Last.Range);

        public string Text => First == Last ? First.Text : $"{First.Text} {Last.Text}";
    }

    /// <summary>Parses the statement; returns it with whatever arguments could be read and whether all was well.</summary>
    public Statement Parse(SyntaxLine line, KeywordSpec spec, out bool ok)
    {
        var before = diagnostics.Count;
        _lineStart = before;
        _notShown = 0;
        var items = Group(line.Tokens);
        // Scratch arrays reused across statements (one per number of positions): a list has tens of thousands of statements.
        var n = spec.Args.Length;
        if (_filled.Length <= n) Array.Resize(ref _filled, n + 1);
        var filled = _filled[n] ??= new Argument?[n];
        Array.Clear(filled);
        var next = 0;
        foreach (var item in items)
        {
            var slot = -1;
            if (item.First.Kind == TokenKind.String)
            {
                slot = FirstOpen(spec, filled, a => a.Kind == ArgKind.Text);
                if (slot < 0)
                {
                    Error(SyntaxCodes.UnexpectedValue, item.Range, $"'{spec.Keyword}' takes no description here");
                    continue;
                }

                filled[slot] = new Argument(spec.Args[slot], item.First.StringValue, item.Range, item.First.Text);
                next = 1;
                continue;
            }

            // A tag is positional: the first word after the keyword.
            if (next == 0 && spec.Args.Length > 0 && spec.Args[0].Kind == ArgKind.Tag && filled[0] is null)
            {
                filled[0] = ReadTag(spec.Args[0], item);
                next = 1;
                continue;
            }

            slot = Place(spec, filled, item);
            next = Math.Max(next, 1);
            if (slot >= 0) continue;
        }

        // A value that was there but wrong has been reported already; saying it is missing too is noise.
        for (var i = 0; i < spec.Args.Length && diagnostics.Count == before; i++)
        {
            if (filled[i] is null && spec.Args[i].Required)
            {
                var missing = spec.Args[i];
                var hint = missing.Kind == ArgKind.Wire && line.Comment is { } c && c.Text.Length > 1 && char.IsAsciiDigit(c.Text[1])
                    ? $"; '#' starts a comment, so write '{c.Text[1..].Split(' ')[0]} AWG'"
                    : "";
                Error(SyntaxCodes.MissingValue, SourceRange.Cover(line.Tokens[0].Range, line.Tokens[^1].Range),
                    $"'{spec.Keyword}' needs {Describe(missing)}{hint}");
            }
        }

        if (spec.Keyword == "load" && filled.Any(a => a?.Spec.Kind is ArgKind.Current) && filled.Any(a => a?.Spec.Kind is ArgKind.ApparentPower))
        {
            Error(SyntaxCodes.UnexpectedValue, line.Tokens[0].Range, "give a load's current or its kVA, not both");
        }

        if (spec.Keyword == "source") CheckSource(line, spec, filled);
        // A capacitor is sized from its rated current (460.8(A)): it needs its kvar or that current.
        if (spec.Keyword == "capacitor" && diagnostics.Count == before && !filled.Any(a => a?.Spec.Kind is ArgKind.Current or ArgKind.ReactivePower))
        {
            Error(SyntaxCodes.CapacitorRating, line.Tokens[0].Range, "'capacitor' needs its rating in kvar (e.g. 10kvar) or its rated current (e.g. 12A)");
        }

        if (_notShown > 0)
            diagnostics.Add(new Diagnostic(SyntaxCodes.MoreOnLine, Severity.Error, SourceRange.Cover(_notShownFrom, _notShownTo),
                $"{_notShown} more problem{(_notShown == 1 ? "" : "s")} on this line not shown (at most {MaxProblemsPerLine} are listed per line)"));

        ok = diagnostics.Count == before;
        var count = 0;
        foreach (var a in filled) count += a is null ? 0 : 1;
        var args = ImmutableArray.CreateBuilder<Argument>(count);
        foreach (var a in filled)
        {
            if (a is not null) args.Add(a);
        }

        return new Statement(line, spec, args.MoveToImmutable());
    }

    /// <summary>Each kind of source takes its own values (P035): a utility its fault current and X/R, a generator its kVA and X"d.</summary>
    private void CheckSource(SyntaxLine line, KeywordSpec spec, Argument?[] filled)
    {
        Argument? Filled(string name) => filled[Array.FindIndex(spec.Args, a => a.Name == name)];
        if (Filled("kind")?.Value is not SourceKind kind) return;
        var range = SourceRange.Cover(line.Tokens[0].Range, line.Tokens[^1].Range);
        (string Arg, string Text)[] needs = kind switch
        {
            SourceKind.Utility => [("fault-current", "its available fault current at the service (e.g. 42kA)"), ("x-r", "its X/R (e.g. x/r 8)")],
            SourceKind.Generator => [("rating", "its kVA (e.g. 500kVA)"), ("reactance", "its subtransient reactance X\"d in % (e.g. 15%)")],
            _ => [],
        };
        string[] takes = kind switch
        {
            SourceKind.Utility => ["fault-current", "x-r"],
            SourceKind.Generator => ["rating", "reactance", "x-r"],
            _ => [],
        };
        var name = Keywords.SourceKinds.First(c => Equals(c.Value, kind)).Canonical;
        foreach (var (arg, text) in needs)
        {
            if (Filled(arg) is null) Error(SyntaxCodes.SourceValues, range, $"'source {name}' needs {text}");
        }

        foreach (var a in filled)
        {
            if (a is null || a.Spec.Name == "kind" || takes.Contains(a.Spec.Name)) continue;
            Error(SyntaxCodes.SourceValues, a.Range,
                $"'source {name}' takes no '{a.Canonical}'{(needs.Length == 0 ? "" : $"; it takes {string.Join(" and ", needs.Select(n => n.Text))}")}");
        }
    }

    private int Place(KeywordSpec spec, Argument?[] filled, Item item)
    {
        switch (item.Value)
        {
            case LexicalValue.Word w:
            {
                var slot = FirstOpenForWord(spec, filled, w.Text);
                if (slot >= 0)
                {
                    var a = spec.Args[slot];
                    filled[slot] = a.Kind == ArgKind.Phases
                        ? new Argument(a, Phases.Dc, item.Range, "dc")
                        : Choose(a, w.Text, item.Range);
                    return slot;
                }

                if (IsXOverR(w.Text))
                {
                    Error(SyntaxCodes.MissingValue, item.Range, $"'{w.Text}' needs a plain number after it, e.g. 'x/r 8'");
                    return -1;
                }

                if (w.Text.Length > 1 && w.Text[0] == '-' && char.IsAsciiDigit(w.Text[1]))
                {
                    Error(SyntaxCodes.OutOfRange, item.Range, $"'{item.Text}': values in a motor list are never negative");
                    return -1;
                }

                if (w.Text.Length > 0 && char.IsAsciiDigit(w.Text[0]))
                {
                    Error(SyntaxCodes.BadNumber, item.Range, $"'{item.Text}' is not a number{ExpectedSuffix(spec, filled)}");
                    return -1;
                }

                var open = FirstOpen(spec, filled, a => a.Kind == ArgKind.Word);
                if (open >= 0)
                {
                    var choices = spec.Args[open].Choices!.Select(c => c.Canonical).ToArray();
                    Error(SyntaxCodes.UnexpectedValue, item.Range,
                        $"unknown {spec.Args[open].Name} '{w.Text}'; expected one of {string.Join(", ", choices)}{Suggestions.DidYouMean(w.Text, choices)}");
                }
                else
                {
                    Error(SyntaxCodes.UnexpectedValue, item.Range, $"unexpected '{w.Text}'{ExpectedSuffix(spec, filled)}");
                }

                return -1;
            }

            case LexicalValue.Parallel p:
                return PlaceWire(spec, filled, item, p.Sets, p.Size);

            case LexicalValue.Number n when n.Unit is Unit.Awg or Unit.Kcmil:
                return PlaceWire(spec, filled, item, 1, n);

            case LexicalValue.Number n when n.UnitText.Length > 0 && n.Unit == Unit.None && Units.TryParseWrittenOut(n.UnitText, out var named):
                Error(SyntaxCodes.BadUnit, item.Range,
                    $"'{item.Text}': write the unit as its symbol, '{n.Digits}{Units.Canonical(named)}'{ExpectedSuffix(spec, filled)}");
                return -1;

            case LexicalValue.Number n when n.UnitText.Length > 0 && n.Unit == Unit.None:
                Error(SyntaxCodes.BadUnit, item.Range, $"unknown unit '{n.UnitText}' in '{item.Text}'{ExpectedSuffix(spec, filled)}");
                return -1;

            case LexicalValue.Number n:
            {
                var slot = FirstOpenForUnit(spec, filled, n.Unit);
                if (slot < 0)
                {
                    var expected = ExpectedSuffix(spec, filled);
                    if (n.Unit == Unit.None && FirstOpen(spec, filled, a => a.Kind is not (ArgKind.Word or ArgKind.Text or ArgKind.Tag)) >= 0)
                        Error(SyntaxCodes.BadUnit, item.Range, $"'{item.Text}' needs a unit{expected}");
                    else
                        Error(SyntaxCodes.BadUnit, item.Range, $"'{item.Text}' is {Units.Describe(n.Unit)}{expected}");
                    return -1;
                }

                var arg = spec.Args[slot];
                if (n.Value is not { } value)
                {
                    Error(SyntaxCodes.BadNumber, item.Range, $"'{n.Digits}' is not a number");
                    return -1;
                }

                if (!CheckRange(spec, arg, value, item)) return -1;
                filled[slot] = ToArgument(arg, n, value, item);
                return filled[slot] is null ? -1 : slot;
            }
        }

        return -1;
    }

    private Argument? ToArgument(ArgSpec arg, LexicalValue.Number n, decimal value, Item item)
    {
        var canonical = reader.Canonical(n);
        switch (arg.Kind)
        {
            case ArgKind.Integer:
                if (value != decimal.Truncate(value) || value > int.MaxValue)
                {
                    Error(SyntaxCodes.BadNumber, item.Range, $"'{item.Text}' must be a whole number");
                    return null;
                }

                return new Argument(arg, (int)value, item.Range, canonical);
            case ArgKind.Number:
                return new Argument(arg, value, item.Range, canonical);
            case ArgKind.Phases:
                if (value is not (1 or 3))
                {
                    Error(SyntaxCodes.OutOfRange, item.Range, $"phases must be 1ph, 3ph or dc, not '{item.Text}'");
                    return null;
                }

                return new Argument(arg, value == 1 ? Phases.Single : Phases.Three, item.Range, canonical);
            default:
                return new Argument(arg, BoxedQuantity(n, value), item.Range, canonical);
        }
    }

    /// <summary>
    /// One boxed quantity per distinct spelling of number and unit: a list repeats the same few
    /// values thousands of times, and each argument would otherwise hold a box of its own.
    /// </summary>
    private object BoxedQuantity(LexicalValue.Number n, decimal value)
    {
        var key = (n.Digits, n.Unit);
        if (!_quantities.TryGetValue(key, out var box)) _quantities[key] = box = new Quantity(value, n.Unit);
        return box;
    }

    private bool CheckRange(KeywordSpec spec, ArgSpec arg, decimal value, Item item)
    {
        if (arg.Check?.Invoke(value) is not { } problem) return true;
        Error(SyntaxCodes.OutOfRange, item.Range, $"{spec.Keyword} {arg.Name} {problem}, not '{item.Text}'");
        return false;
    }

    private int PlaceWire(KeywordSpec spec, Argument?[] filled, Item item, int sets, LexicalValue.Number? size)
    {
        var slot = FirstOpen(spec, filled, a => a.Kind == ArgKind.Wire);
        if (slot < 0)
        {
            Error(SyntaxCodes.UnexpectedValue, item.Range, $"'{spec.Keyword}' takes no wire size{ExpectedSuffix(spec, filled)}");
            return -1;
        }

        if (size is null || size.Unit is not (Unit.Awg or Unit.Kcmil))
        {
            Error(SyntaxCodes.BadUnit, item.Range, $"'{item.Text}' needs a size in AWG or kcmil, e.g. '2x 250 kcmil'");
            return -1;
        }

        if (sets is < 1 or > 20)
        {
            Error(SyntaxCodes.OutOfRange, item.Range, $"parallel sets must be between 1 and 20, not {sets}");
            return -1;
        }

        var found = size.Unit == Unit.Awg
            ? ConductorSize.TryFromAwg(size.Digits, out var s)
            : ConductorSize.TryFromKcmil(size.Digits, out s);
        if (!found)
        {
            var series = size.Unit == Unit.Awg ? "18 AWG to 4/0 AWG" : "250 kcmil to 2000 kcmil";
            Error(SyntaxCodes.UnknownWireSize, item.Range, $"'{item.Text}' is not a standard wire size ({series})");
            return -1;
        }

        var wire = new WireSpec(sets, s);
        filled[slot] = new Argument(spec.Args[slot], wire, item.Range, reader.Canonical(wire));
        return slot;
    }

    private Argument ReadTag(ArgSpec arg, Item item)
    {
        var text = item.First.Text;
        if (!IsValidTag(text))
        {
            Error(SyntaxCodes.BadTag, item.First.Range,
                $"'{text}' is not a valid tag: use letters, digits, '-', '_', '.' or '/', starting with a letter or digit");
        }

        return new Argument(arg, text, item.First.Range, text);
    }

    private static bool IsXOverR(string text) => text.Equals("x/r", StringComparison.OrdinalIgnoreCase);

    public static bool IsValidTag(string text) =>
        text.Length > 0 && char.IsLetterOrDigit(text[0]) && text.All(c => char.IsLetterOrDigit(c) || c is '-' or '_' or '.' or '/');

    private static Argument Choose(ArgSpec arg, string text, SourceRange range)
    {
        foreach (var choice in arg.Choices!)
        {
            if (choice.Matches(text)) return new Argument(arg, choice.Value, range, choice.Canonical);
        }

        throw new InvalidOperationException($"'{text}' was placed in '{arg.Name}' without being one of its choices");
    }

    private List<Item> Group(ImmutableArray<SyntaxToken> tokens)
    {
        var items = _items;
        items.Clear();
        for (var i = 1; i < tokens.Length; i++)
        {
            var t = tokens[i];
            if (t.Kind == TokenKind.String)
            {
                items.Add(new Item(t, t, new LexicalValue.Word(t.Text)));
                continue;
            }

            var v = reader.Read(t.Text);
            var hasNext = i + 1 < tokens.Length && tokens[i + 1].Kind == TokenKind.Word;
            var nextWord = hasNext ? tokens[i + 1] : default;
            // An X/R ratio is the word and then a plain number: "x/r 8".
            if (hasNext && IsXOverR(t.Text) && reader.Read(nextWord.Text) is LexicalValue.Number { UnitText: "" } ratio)
            {
                items.Add(new Item(t, nextWord, ratio with { Unit = Unit.XOverR, UnitText = t.Text }));
                i++;
                continue;
            }

            if (v is LexicalValue.Number { UnitText: "" } bare && hasNext && Units.TryParse(nextWord.Text, out var unit))
            {
                items.Add(new Item(t, nextWord, bare with { Unit = unit, UnitText = nextWord.Text }));
                i++;
                continue;
            }

            // "20 amps": one value with a unit the format does not accept, reported once with its symbol.
            if (v is LexicalValue.Number { UnitText: "" } spelled && hasNext && Units.TryParseWrittenOut(nextWord.Text, out _))
            {
                items.Add(new Item(t, nextWord, spelled with { UnitText = nextWord.Text }));
                i++;
                continue;
            }

            if (v is LexicalValue.Parallel { Size: null } p && hasNext)
            {
                // "2x 250 kcmil" is three tokens: the prefix, the number and the unit.
                var sizeTokens = i + 2 < tokens.Length && tokens[i + 2].Kind == TokenKind.Word && Units.TryParse(tokens[i + 2].Text, out _) ? 2 : 1;
                var sizeText = sizeTokens == 2 ? nextWord.Text + tokens[i + 2].Text : nextWord.Text;
                if (reader.Read(sizeText) is LexicalValue.Number n)
                {
                    items.Add(new Item(t, tokens[i + sizeTokens], p with { Size = n }));
                    i += sizeTokens;
                    continue;
                }
            }

            items.Add(new Item(t, t, v));
        }

        return items;
    }

    private static int FirstOpen(KeywordSpec spec, Argument?[] filled, Func<ArgSpec, bool> accepts)
    {
        for (var i = 0; i < spec.Args.Length; i++)
        {
            if (filled[i] is null && accepts(spec.Args[i])) return i;
        }

        return -1;
    }

    // The two searches below run for nearly every value, so they are loops without closures.
    private static int FirstOpenForWord(KeywordSpec spec, Argument?[] filled, string text)
    {
        for (var i = 0; i < spec.Args.Length; i++)
        {
            if (filled[i] is not null) continue;
            var a = spec.Args[i];
            if (a.Kind == ArgKind.Phases && text.Equals("dc", StringComparison.OrdinalIgnoreCase)) return i;
            if (a.Kind != ArgKind.Word) continue;
            foreach (var c in a.Choices!)
            {
                if (c.Matches(text)) return i;
            }
        }

        return -1;
    }

    private static int FirstOpenForUnit(KeywordSpec spec, Argument?[] filled, Unit unit)
    {
        for (var i = 0; i < spec.Args.Length; i++)
        {
            if (filled[i] is null && Accepts(spec.Args[i].Kind, unit)) return i;
        }

        return -1;
    }

    private static bool Accepts(ArgKind kind, Unit unit) => unit switch
    {
        Unit.Hp or Unit.Kw => kind == ArgKind.Power,
        Unit.Volt => kind == ArgKind.Voltage,
        Unit.Amp => kind == ArgKind.Current,
        Unit.Foot or Unit.Metre => kind == ArgKind.Length,
        Unit.Celsius or Unit.Fahrenheit => kind == ArgKind.Temperature,
        Unit.Percent => kind == ArgKind.Percent,
        Unit.Kva => kind is ArgKind.ApparentPower or ArgKind.VoltAmperes,
        Unit.Va => kind == ArgKind.VoltAmperes,
        Unit.Kvar => kind == ArgKind.ReactivePower,
        Unit.Minute => kind == ArgKind.Duration,
        Unit.Phase => kind == ArgKind.Phases,
        Unit.Inch => kind == ArgKind.TradeSize,
        Unit.KiloAmp => kind == ArgKind.FaultCurrent,
        Unit.XOverR => kind == ArgKind.Ratio,
        _ => kind is ArgKind.Number or ArgKind.Integer,
    };

    private static string ExpectedSuffix(KeywordSpec spec, Argument?[] filled)
    {
        var open = spec.Args.Where((a, i) => filled[i] is null).Select(Describe).ToArray();
        return open.Length == 0 ? $"; '{spec.Keyword}' takes nothing more" : $"; '{spec.Keyword}' expects {string.Join(" or ", open)}";
    }

    internal static string Describe(ArgSpec a) => a.Kind switch
    {
        ArgKind.Tag => $"a {a.Name}",
        ArgKind.Text => "a quoted description",
        ArgKind.Power => "a power (e.g. 15hp or 11kW)",
        ArgKind.Voltage => "a voltage (e.g. 480V)",
        ArgKind.Phases => "phases (1ph, 3ph or dc)",
        ArgKind.Current => $"a {a.Name} in A (e.g. 22.5A)",
        ArgKind.Length => "a length (e.g. 90ft or 27m)",
        ArgKind.Temperature => $"a {a.Name} (e.g. 40C)",
        ArgKind.Percent => $"a {a.Name} percentage (e.g. 3%)",
        ArgKind.Number => $"a {a.Name} (a plain number)",
        ArgKind.Integer => $"a {a.Name} (a whole number)",
        ArgKind.Wire => "a wire size (e.g. 10 AWG, 4/0 AWG, 250 kcmil, 2x 250 kcmil)",
        ArgKind.Word => $"a {a.Name} ({string.Join(", ", a.Choices!.Take(8).Select(c => c.Canonical))})",
        ArgKind.Duration => "a time rating (5min, 15min, 30min or 60min)",
        ArgKind.ApparentPower => "an apparent power (e.g. 15kVA)",
        ArgKind.TradeSize => "a trade size in inches (e.g. 3/4in, 1-1/4in)",
        ArgKind.FaultCurrent => $"a {a.Name} in kA (e.g. 42kA)",
        ArgKind.Ratio => "an X/R ratio (e.g. x/r 8)",
        ArgKind.ReactivePower => "a reactive power (e.g. 10kvar)",
        ArgKind.VoltAmperes => "a rating in VA or kVA (e.g. 150VA)",
        _ => a.Name,
    };

    private void Error(string code, SourceRange range, string message)
    {
        if (diagnostics.Count - _lineStart < MaxProblemsPerLine)
        {
            diagnostics.Add(new Diagnostic(code, Severity.Error, range, message));
            return;
        }

        if (_notShown++ == 0) _notShownFrom = range;
        _notShownTo = range;
    }
}
