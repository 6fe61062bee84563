using System.Text;

namespace MotorLang.Report.Diagram;

/// <summary>
/// Writes the laid-out one-line diagram as a standalone SVG: a symbol column and a label per node,
/// the connections as MSAGL routed them, error and warning findings marked on the node.
/// </summary>
public static class OneLineSvg
{
    public static string Write(DiagramLayout layout, string title)
    {
        var sb = new StringBuilder();
        sb.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"oneline\" viewBox=\"0 0 {Svg.N(layout.Width)} {Svg.N(layout.Height)}\"")
          .Append($" width=\"{Svg.N(layout.Width)}\" height=\"{Svg.N(layout.Height)}\" role=\"img\" aria-label=\"{Svg.E(title)}\">");
        sb.Append($"<title>{Svg.E(title)}</title>");
        sb.Append("<style>")
          .Append(".oneline text{font-family:'DejaVu Sans','Liberation Sans',Arial,sans-serif;font-size:").Append(Svg.N(NodeShape.FontSize)).Append("px;fill:#1d2430}")
          .Append(".oneline .tag{font-weight:bold}.oneline .sym{font-size:8px}.oneline .m{font-size:12px;font-weight:bold;text-anchor:middle}")
          .Append(".oneline .w,.oneline .s,.oneline .edge{stroke:#1d2430;stroke-width:1.3;fill:none}.oneline .solid{fill:#1d2430}")
          .Append(".oneline .bus{stroke:#1d2430;stroke-width:4}.oneline .box{fill:none;stroke:#c3c9d1;stroke-width:.6}")
          .Append(".oneline .err .box{stroke:#8c1d4f;stroke-width:1.6}.oneline .err .flag{fill:#8c1d4f}.oneline .err .finding{fill:#8c1d4f;font-weight:bold}")
          .Append(".oneline .warn .box{stroke:#7a5a00;stroke-dasharray:3 2}.oneline .warn .flag{fill:#7a5a00}.oneline .warn .finding{fill:#7a5a00}")
          .Append("</style>");
        sb.Append("<g class=\"edges\">");
        foreach (var e in layout.Edges)
            sb.Append($"<path class=\"edge\" data-from=\"{Svg.E(e.Edge.From)}\" data-to=\"{Svg.E(e.Edge.To)}\" d=\"{e.Path}\"/>");
        sb.Append("</g><g class=\"nodes\">");
        foreach (var n in layout.Nodes) Node(sb, n);
        sb.Append("</g></svg>");
        return sb.ToString();
    }

    private static void Node(StringBuilder sb, PlacedNode p)
    {
        var n = p.Node;
        var state = n.Errors.Count > 0 ? " err" : n.Warnings.Count > 0 ? " warn" : "";
        sb.Append($"<g class=\"node {n.Kind.ToString().ToLowerInvariant()}{state}\" data-id=\"{Svg.E(n.Id)}\" data-line=\"{n.Line}\">");
        sb.Append($"<title>{Svg.E(string.Join(" — ", NodeShape.TextLines(n)))}</title>");
        sb.Append($"<rect class=\"box\" x=\"{Svg.N(p.X)}\" y=\"{Svg.N(p.Y)}\" width=\"{Svg.N(p.Width)}\" height=\"{Svg.N(p.Height)}\" rx=\"3\"/>");
        var cy = p.Y + p.Height / 2;
        var x = p.X;
        switch (n.Kind)
        {
            case NodeKind.Source:
                Symbols.Line(sb, Symbols.Source(sb, x + 6, cy), p.X + NodeShape.SymbolWidth, cy);
                break;
            case NodeKind.Feeder:
                x = Symbols.Device(sb, n.Device, Symbols.Line(sb, x, x + 8, cy), cy);
                Symbols.Line(sb, x, x + 16, cy);
                Symbols.Bus(sb, x + 16, p.Y + 5, p.Y + p.Height - 5);
                break;
            case NodeKind.Motor:
                x = Symbols.Device(sb, n.Device, Symbols.Line(sb, x, x + 6, cy), cy);
                Symbols.Motor(sb, Symbols.Line(sb, x, x + 8, cy), cy);
                break;
            default:
                x = Symbols.Device(sb, n.Device, Symbols.Line(sb, x, x + 6, cy), cy);
                Symbols.Load(sb, Symbols.Line(sb, x, x + 10, cy), cy);
                break;
        }

        if (state != "")
            sb.Append($"<path class=\"flag\" d=\"M{Svg.N(p.X + p.Width - 12)},{Svg.N(p.Y)} L{Svg.N(p.X + p.Width)},{Svg.N(p.Y)} L{Svg.N(p.X + p.Width)},{Svg.N(p.Y + 12)} Z\"/>");

        var lines = NodeShape.TextLines(n);
        var tx = p.X + NodeShape.SymbolWidth + NodeShape.Padding;
        var ty = cy - lines.Count * NodeShape.LineHeight / 2 + NodeShape.LineHeight - 3;
        sb.Append("<g class=\"label\">");
        for (var i = 0; i < lines.Count; i++)
        {
            var cls = i == 0 ? " class=\"tag\"" : i == lines.Count - 1 && state != "" ? " class=\"finding\"" : "";
            sb.Append($"<text{cls} x=\"{Svg.N(tx)}\" y=\"{Svg.N(ty + i * NodeShape.LineHeight)}\">{Svg.E(lines[i])}</text>");
        }

        sb.Append("</g></g>");
    }
}
