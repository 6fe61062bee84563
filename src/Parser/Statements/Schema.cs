namespace MotorLang.Parser.Statements;

/// <summary>The kinds of block a statement can sit in; a header statement opens one.</summary>
public enum BlockKind { Root, Project, Feeder, Motor, Load }

/// <summary>What an argument position accepts.</summary>
public enum ArgKind { Tag, Text, Power, Voltage, Phases, Current, Length, Temperature, Percent, Number, Integer, Wire, Word, Duration, ApparentPower, TradeSize, FaultCurrent, Ratio, ReactivePower, VoltAmperes }

/// <summary>One accepted word for an enumerated argument: how the formatter writes it, what it means, and other spellings.</summary>
public sealed record WordChoice(string Canonical, object Value, string Doc, params string[] Aliases)
{
    public bool Matches(string text)
    {
        if (string.Equals(text, Canonical, StringComparison.OrdinalIgnoreCase)) return true;
        foreach (var a in Aliases)
        {
            if (string.Equals(text, a, StringComparison.OrdinalIgnoreCase)) return true;
        }

        return false;
    }
}

/// <summary>
/// One argument position. <paramref name="Check"/> returns a message when a numeric value is out of range.
/// </summary>
public sealed record ArgSpec(string Name, ArgKind Kind, bool Required, IReadOnlyList<WordChoice>? Choices = null,
    Func<decimal, string?>? Check = null);

/// <summary>A keyword, where it may appear, whether it opens a block, what it takes, and a line of documentation.</summary>
public sealed record KeywordSpec(string Keyword, BlockKind[] AllowedIn, BlockKind? Opens, ArgSpec[] Args, string Doc)
{
    public bool IsHeader => Opens is not null;
}
