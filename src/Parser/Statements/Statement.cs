using System.Collections.Immutable;
using MotorLang.Parser.Model;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;

namespace MotorLang.Parser.Statements;

/// <summary>One argument as read: which position it filled, its value, where it is and how the formatter writes it.</summary>
public sealed record Argument(ArgSpec Spec, object Value, SourceRange Range, string Canonical)
{
    private object? _located;

    /// <summary>
    /// The value with its range, made once and kept: analysis reads every attribute of every motor
    /// on each run, and an argument never changes.
    /// </summary>
    public Located<T> Located<T>(T value) => _located as Located<T> ?? (Located<T>)(_located = new Located<T>(value, Range));

    // Equality is the argument's content; the kept Located is not part of it.
    public bool Equals(Argument? other) =>
        other is not null && Spec == other.Spec && Equals(Value, other.Value) && Range == other.Range && Canonical == other.Canonical;

    public override int GetHashCode() => HashCode.Combine(Spec, Value, Range, Canonical);
}

/// <summary>A keyword line with its arguments matched to the keyword's positions.</summary>
public sealed class Statement
{
    internal Statement(SyntaxLine line, KeywordSpec spec, ImmutableArray<Argument> args)
    {
        Line = line;
        Spec = spec;
        Args = args;
    }

    public SyntaxLine Line { get; }

    public KeywordSpec Spec { get; }

    public SyntaxToken KeywordToken => Line.Tokens[0];

    public string Keyword => Spec.Keyword;

    public ImmutableArray<Argument> Args { get; }

    /// <summary>The argument filling the named position. A loop, not LINQ: analysis calls this for every attribute of every motor.</summary>
    public Argument? Arg(string name)
    {
        foreach (var a in Args)
        {
            if (a.Spec.Name == name) return a;
        }

        return null;
    }

    /// <summary>The range from the keyword to the last token (comment excluded).</summary>
    public SourceRange Range => SourceRange.Cover(KeywordToken.Range, Line.Tokens[^1].Range);
}
