using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Text;

namespace MotorLang.Parser.Syntax;

/// <summary>The lossless tree of a document: a BOM flag, then every line as written.</summary>
public sealed class SyntaxTree
{
    private string? _text;
    private string? _preferredLineEnding;

    /// <summary>A tree; <paramref name="text"/> may be null when the tree was made by re-reading one line, and is then joined from the lines when first asked for.</summary>
    internal SyntaxTree(string? text, bool hasBom, LineList lines, ImmutableArray<Diagnostic> diagnostics)
    {
        _text = text;
        HasBom = hasBom;
        Lines = lines;
        Diagnostics = diagnostics;
    }

    /// <summary>
    /// The source text exactly as given (including any BOM). After a one-line edit it is joined
    /// from the lines on first use, so typing in a large document does not copy it on every key.
    /// </summary>
    public string Text => _text ??= Join();

    public bool HasBom { get; }

    public LineList Lines { get; }

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

    /// <summary>The text with one line's content replaced (its ending kept).</summary>
    public string WithLine(int line, string content)
    {
        var text = Text;
        var start = LineStarts.Find(text, line, HasBom ? 1 : 0);
        var end = start + Lines[line].Length;
        return string.Concat(text.AsSpan(0, start), content, text.AsSpan(end));
    }

    private string Join()
    {
        var length = HasBom ? 1 : 0;
        foreach (var line in Lines) length += line.Length + line.LineEnding.Length;
        return string.Create(length, this, static (span, tree) =>
        {
            var at = 0;
            if (tree.HasBom) span[at++] = '\uFEFF';
            foreach (var line in tree.Lines)
            {
                line.ContentSpan.CopyTo(span[at..]);
                at += line.Length;
                line.LineEnding.CopyTo(span[at..]);
                at += line.LineEnding.Length;
            }
        });
    }

    /// <summary>The line ending most used in the document, for inserting new lines (counted once per tree).</summary>
    public string PreferredLineEnding => _preferredLineEnding ??=
        Lines.Count(l => l.LineEnding == "\r\n") > Lines.Count(l => l.LineEnding == "\n") ? "\r\n" : "\n";

    /// <summary>
    /// A tree of this one's lines with some contents replaced and every line ending kept (a
    /// re-read line): the preferred line ending carries over instead of being counted again over
    /// every line, which a fix's insertion asks for on each keystroke.
    /// </summary>
    internal SyntaxTree WithSameEndings(string? text, LineList lines, ImmutableArray<Diagnostic> diagnostics) =>
        new(text, HasBom, lines, diagnostics) { _preferredLineEnding = _preferredLineEnding };
}
