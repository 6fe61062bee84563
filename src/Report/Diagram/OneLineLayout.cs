using Microsoft.Msagl.Core.Geometry;
using Microsoft.Msagl.Core.Geometry.Curves;
using Microsoft.Msagl.Core.Layout;
using Microsoft.Msagl.Core.Routing;
using Microsoft.Msagl.Layout.Layered;
using MsaglNode = Microsoft.Msagl.Core.Layout.Node;
using MsaglEdge = Microsoft.Msagl.Core.Layout.Edge;

namespace MotorLang.Report.Diagram;

/// <summary>A node placed on the drawing: its box, top-left corner first, in SVG units (y grows downwards).</summary>
public sealed record PlacedNode(DiagramNode Node, double X, double Y, double Width, double Height);

/// <summary>An edge as SVG path data.</summary>
public sealed record PlacedEdge(DiagramEdge Edge, string Path);

public sealed record DiagramLayout(IReadOnlyList<PlacedNode> Nodes, IReadOnlyList<PlacedEdge> Edges, double Width, double Height);

/// <summary>
/// Lays the one-line diagram out with MSAGL's layered (Sugiyama) layout, supply on the left and
/// power flowing to the right: each layer of the distribution is a column, so a feeder's motors stack
/// under one another and labels of any length never collide (each label lies inside its node's box,
/// and the layout keeps boxes apart).
/// </summary>
public static class OneLineLayout
{
    public const double Margin = 20;

    public static DiagramLayout Of(OneLineGraph graph)
    {
        var g = new GeometryGraph();
        var byId = new Dictionary<string, MsaglNode>(StringComparer.OrdinalIgnoreCase);
        foreach (var n in graph.Nodes)
        {
            var (w, h) = NodeShape.Size(n);
            var node = new MsaglNode(CurveFactory.CreateRectangle(w, h, new Point()), n);
            g.Nodes.Add(node);
            byId[n.Id] = node;
        }

        foreach (var e in graph.Edges)
        {
            if (!byId.TryGetValue(e.From, out var from) || !byId.TryGetValue(e.To, out var to)) continue;
            g.Edges.Add(new MsaglEdge(from, to) { UserData = e });
        }

        var settings = new SugiyamaLayoutSettings
        {
            // Rotated a quarter turn: layers become columns, left to right.
            Transformation = PlaneTransformation.Rotation(Math.PI / 2),
            NodeSeparation = 14,
            LayerSeparation = 70,
            EdgeRoutingSettings = { EdgeRoutingMode = EdgeRoutingMode.Spline },
        };
        new LayeredLayout(g, settings).Run();

        // MSAGL's y grows upwards; SVG's downwards. Shift so the drawing starts at the margin.
        var box = g.BoundingBox;
        double X(double x) => x - box.Left + Margin;
        double Y(double y) => box.Top - y + Margin;
        var nodes = g.Nodes.Select(n => new PlacedNode((DiagramNode)n.UserData, X(n.BoundingBox.Left), Y(n.BoundingBox.Top), n.BoundingBox.Width, n.BoundingBox.Height)).ToList();
        // Nodes of one column share their centre; a connector runs level from the column's left edge to its node.
        var columnLeft = g.Nodes.GroupBy(n => Math.Round(n.Center.X)).ToDictionary(c => c.Key, c => c.Min(n => n.BoundingBox.Left));
        var edges = g.Edges.Select(e => new PlacedEdge((DiagramEdge)e.UserData, Connector(e, columnLeft[Math.Round(e.Target.Center.X)], X, Y))).Where(e => e.Path.Length > 0).ToList();
        return new DiagramLayout(nodes, edges, box.Width + 2 * Margin, box.Height + 2 * Margin);
    }

    /// <summary>
    /// From the middle of the supplying node's right side to the middle of the supplied node's left side,
    /// leaving and arriving level, as a one-line's conductors do. In a tree every edge joins neighbouring
    /// columns, so the curve crosses no other node; otherwise MSAGL's own route is drawn.
    /// </summary>
    private static string Connector(MsaglEdge e, double columnLeft, Func<double, double> x, Func<double, double> y)
    {
        var from = e.Source.BoundingBox;
        var to = e.Target.BoundingBox;
        if (columnLeft - from.Right < 20) return e.Curve is null ? "" : PathOf(e.Curve, x, y);
        double x1 = x(from.Right), y1 = y(from.Center.Y), xc = x(columnLeft), x2 = x(to.Left), y2 = y(to.Center.Y), mid = (x1 + xc) / 2;
        return $"M{Svg.N(x1)},{Svg.N(y1)} C{Svg.N(mid)},{Svg.N(y1)} {Svg.N(mid)},{Svg.N(y2)} {Svg.N(xc)},{Svg.N(y2)} L{Svg.N(x2)},{Svg.N(y2)}";
    }

    private static string PathOf(ICurve curve, Func<double, double> x, Func<double, double> y)
    {
        var sb = new System.Text.StringBuilder();
        string P(Point p) => $"{Svg.N(x(p.X))},{Svg.N(y(p.Y))}";
        sb.Append('M').Append(P(curve.Start));
        IEnumerable<ICurve> segments = curve is Curve c ? c.Segments : [curve];
        foreach (var s in segments)
        {
            switch (s)
            {
                case CubicBezierSegment b:
                    sb.Append(" C").Append(P(b.B(1))).Append(' ').Append(P(b.B(2))).Append(' ').Append(P(b.B(3)));
                    break;
                default:
                    // Lines and anything else: follow the segment through a few points.
                    for (var i = 1; i <= 8; i++) sb.Append(" L").Append(P(s[s.ParStart + (s.ParEnd - s.ParStart) * i / 8]));
                    break;
            }
        }

        return sb.ToString();
    }
}
