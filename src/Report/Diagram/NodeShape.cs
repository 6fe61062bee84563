namespace MotorLang.Report.Diagram;

/// <summary>
/// The size of a node's box: a symbol column on the left and the label's lines beside it. Text width
/// is estimated generously (0.62 em a character for the sans-serif face the drawing asks for, wider
/// than its real average) so a label never runs out of its box; the browser test measures the real boxes.
/// </summary>
public static class NodeShape
{
    public const double FontSize = 11;
    public const double LineHeight = 14;
    public const double SymbolWidth = 64;
    public const double Padding = 6;
    private const double CharWidth = 0.62 * FontSize;

    public static (double Width, double Height) Size(DiagramNode n)
    {
        var lines = TextLines(n);
        var text = lines.Max(l => l.Length) * CharWidth;
        var height = Math.Max(SymbolHeight(n.Kind), lines.Count * LineHeight + 2 * Padding);
        return (SymbolWidth + text + 2 * Padding, height);
    }

    public static double SymbolHeight(NodeKind kind) => kind == NodeKind.Source ? 44 : 40;

    /// <summary>The label's lines: the node's own, then one naming its findings.</summary>
    public static IReadOnlyList<string> TextLines(DiagramNode n)
    {
        var lines = n.Lines.ToList();
        if (n.Errors.Count > 0) lines.Add("✗ " + string.Join(" ", n.Errors));
        else if (n.Warnings.Count > 0) lines.Add("⚠ " + string.Join(" ", n.Warnings));
        return lines;
    }
}
