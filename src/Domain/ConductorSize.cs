namespace MotorLang.Domain;

/// <summary>
/// A conductor size from the AWG/kcmil series used by the ampacity and conduit tables.
/// Ordered from smallest to largest so "next larger size" is index + 1.
/// </summary>
public readonly record struct ConductorSize : IComparable<ConductorSize>
{
    // The series as printed down the size column of NEC Table 310.16 and Chapter 9 Table 8.
    private static readonly string[] Names =
    [
        "18", "16", "14", "12", "10", "8", "6", "4", "3", "2", "1",
        "1/0", "2/0", "3/0", "4/0",
        "250", "300", "350", "400", "500", "600", "700", "750", "800", "900",
        "1000", "1250", "1500", "1750", "2000",
    ];

    private const int FirstKcmilIndex = 15;

    private ConductorSize(int index) => Index = index;

    /// <summary>Position in the series; 0 is 18 AWG.</summary>
    public int Index { get; }

    public static IReadOnlyList<ConductorSize> All { get; } =
        Enumerable.Range(0, Names.Length).Select(i => new ConductorSize(i)).ToArray();

    public bool IsKcmil => Index >= FirstKcmilIndex;

    /// <summary>The number as printed in the tables: "10", "4/0", "250".</summary>
    public string Number => Names[Index];

    public string Unit => IsKcmil ? "kcmil" : "AWG";

    public static ConductorSize Smallest => All[0];
    public static ConductorSize Largest => All[^1];

    public ConductorSize? NextLarger => Index + 1 < Names.Length ? new ConductorSize(Index + 1) : null;

    public static bool TryFromAwg(string number, out ConductorSize size) => TryFind(number, kcmil: false, out size);

    public static bool TryFromKcmil(string number, out ConductorSize size) => TryFind(number, kcmil: true, out size);

    /// <summary>Looks a size up by its table name ("10", "4/0", "250"); throws for a name not in the series.</summary>
    public static ConductorSize Parse(string number)
    {
        var i = Array.IndexOf(Names, number);
        if (i < 0) throw new ArgumentException($"'{number}' is not a conductor size in the AWG/kcmil series", nameof(number));
        return new ConductorSize(i);
    }

    private static bool TryFind(string number, bool kcmil, out ConductorSize size)
    {
        var i = Array.IndexOf(Names, number);
        if (i >= 0 && (i >= FirstKcmilIndex) == kcmil)
        {
            size = new ConductorSize(i);
            return true;
        }

        size = default;
        return false;
    }

    public int CompareTo(ConductorSize other) => Index.CompareTo(other.Index);

    public static bool operator <(ConductorSize a, ConductorSize b) => a.Index < b.Index;
    public static bool operator >(ConductorSize a, ConductorSize b) => a.Index > b.Index;
    public static bool operator <=(ConductorSize a, ConductorSize b) => a.Index <= b.Index;
    public static bool operator >=(ConductorSize a, ConductorSize b) => a.Index >= b.Index;

    public override string ToString() => $"{Number} {Unit}";
}

/// <summary>A run of one or more conductors in parallel per phase (310.10(G)).</summary>
public readonly record struct WireSpec(int Sets, ConductorSize Size)
{
    public static WireSpec Single(ConductorSize size) => new(1, size);

    public override string ToString() => Sets == 1 ? Size.ToString() : $"{Sets}x {Size}";
}
