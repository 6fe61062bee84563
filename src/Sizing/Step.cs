using System.Collections.Immutable;
using System.Globalization;

namespace MotorLang.Sizing;

/// <summary>
/// One step of a calculation, as a reviewer would check it against the code book: what was
/// found, its value with unit, the rule it comes from, and one line of explanation.
/// </summary>
public sealed record Step(string Label, string Value, string Rule, string Note)
{
    /// <summary>The note up to its first parenthesis or semicolon: what a one-line summary of the step keeps.</summary>
    public string Short => Note.IndexOfAny(['(', ';']) is > 0 and var cut ? Note[..cut].TrimEnd() : Note;

    public static Step Amps(string label, decimal amps, string rule, string note) => new(label, Format.Amps(amps), rule, note);
}

/// <summary>
/// A computed value with the steps that led to it, or the reason it could not be computed. Steps
/// may be deferred: a value computed for every motor but explained only on hover builds its
/// explanation when first asked, which keeps a large list's memory down.
/// </summary>
public sealed class Result<T> : IExplained where T : struct
{
    // Steps as written, or the function that writes them on first read (then dropped). No Lazy
    // object: analysis makes tens of thousands of results, and most are never explained.
    private ImmutableArray<Step> _steps;
    private Func<ImmutableArray<Step>>? _write;

    public Result(T? value, ImmutableArray<Step> steps, string? unavailable = null)
    {
        Value = value;
        Unavailable = unavailable;
        _steps = steps;
    }

    private Result(T value, Func<ImmutableArray<Step>> steps)
    {
        Value = value;
        _write = steps;
    }

    public T? Value { get; }

    /// <summary>The steps; deferred ones are written on first read (two readers at once may both write them, with the same result).</summary>
    public ImmutableArray<Step> Steps
    {
        get
        {
            if (Volatile.Read(ref _write) is { } write)
            {
                ImmutableInterlocked.InterlockedInitialize(ref _steps, write());
                Volatile.Write(ref _write, null);
            }

            return _steps;
        }
    }

    public string? Unavailable { get; }

    public bool HasValue => Value is not null;

    public static Result<T> Of(T value, params Step[] steps) => new(value, [.. steps]);

    /// <summary>A value whose steps are written only when someone reads them.</summary>
    public static Result<T> Deferred(T value, Func<ImmutableArray<Step>> steps) => new(value, steps);

    public static Result<T> Missing(string why, params Step[] steps) => new(null, [.. steps], why);
}

/// <summary>
/// A result seen without its value type: whether it has a value, and its steps. Lets the rules a
/// circuit applied be read from every result it carries, whatever the result's type.
/// </summary>
public interface IExplained
{
    bool HasValue { get; }

    ImmutableArray<Step> Steps { get; }
}

/// <summary>How values are written in steps. Amperes keep two decimals at most; nothing is rounded in the arithmetic itself.</summary>
public static class Format
{
    public static string Number(decimal v) => v.ToString("0.##", CultureInfo.InvariantCulture);

    public static string Amps(decimal a) => Number(a) + " A";

    public static string Percent(decimal p) => Number(p) + " %";
}
