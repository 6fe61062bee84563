using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;

namespace MotorLang.Parser.Syntax;

/// <summary>The lossless tree of a document: a BOM flag, then every line as written.</summary>
public sealed class SyntaxTree
{
    internal SyntaxTree(string text, bool hasBom, ImmutableArray<SyntaxLine> lines, ImmutableArray<Diagnostic> diagnostics)
    {
        Text = text;
        HasBom = hasBom;
        Lines = lines;
        Diagnostics = diagnostics;
    }

    /// <summary>The source text exactly as given (including any BOM).</summary>
    public string Text { get; }

    public bool HasBom { get; }

    public ImmutableArray<SyntaxLine> Lines { get; }

    /// <summary>Syntax and structure diagnostics, in line order.</summary>
    public ImmutableArray<Diagnostic> Diagnostics { get; }

    /// <summary>Prints the tree back from its pieces; always equal to <see cref="Text"/>.</summary>
    public string Print()
    {
        var sb = new System.Text.StringBuilder(Text.Length);
        if (HasBom) sb.Append('\uFEFF');
        foreach (var line in Lines) sb.Append(line.Print());
        return sb.ToString();
    }

    /// <summary>The line ending most used in the document, for inserting new lines.</summary>
    public string PreferredLineEnding =>
        Lines.Count(l => l.LineEnding == "\r\n") > Lines.Count(l => l.LineEnding == "\n") ? "\r\n" : "\n";
}
