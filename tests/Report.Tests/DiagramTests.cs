using System.Xml.Linq;
using MotorLang.Analysis;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Tests;

/// <summary>The one-line diagram as XML and as laid-out boxes (no browser; BrowserTests measures the drawn text).</summary>
public class DiagramTests
{
    private static readonly XNamespace SvgNs = "http://www.w3.org/2000/svg";

    [Theory]
    [InlineData("dairy-bottling.motors")]
    [InlineData("booster-station.motors")]
    [InlineData("cabinet-shop.motors")]
    public void Every_model_node_appears_once_in_well_formed_svg(string example)
    {
        var analysis = Analyzer.Analyze(Plants.Example(example));
        var svg = XDocument.Parse(OneLineDiagram.Svg(analysis, example));
        var ids = svg.Descendants(SvgNs + "g").Where(g => ((string?)g.Attribute("class"))?.StartsWith("node ", StringComparison.Ordinal) == true)
            .Select(g => (string)g.Attribute("data-id")!).ToList();
        var model = analysis.Parse.Model;
        // Every tag the list writes, plus the supply: each exactly once.
        var expected = model.Feeders.Select(f => f.Tag!.Value).Concat(model.Motors.Select(m => m.Tag!.Value)).Concat(model.Loads.Select(l => l.Tag!.Value))
            .Append(OneLineGraph.SupplyId).Order().ToList();
        Assert.Equal(expected, ids.Order().ToList());
        // Each element other than the supply is fed by exactly one connection.
        var targets = svg.Descendants(SvgNs + "path").Where(p => (string?)p.Attribute("class") == "edge").Select(p => (string)p.Attribute("data-to")!).ToList();
        Assert.Equal(expected.Where(e => e != OneLineGraph.SupplyId).ToList(), targets.Order().ToList());
    }

    [Fact]
    public void A_feeder_from_another_is_drawn_from_it()
    {
        var analysis = Analyzer.Analyze(Plants.Example("booster-station.motors"));
        var graph = OneLineGraph.Of(analysis);
        // booster-station: MCC-1 is written 'from SWBD-1'; FP-1 has no 'from', so the supply feeds it.
        Assert.Contains(new DiagramEdge("SWBD-1", "MCC-1"), graph.Edges);
        Assert.Contains(new DiagramEdge(OneLineGraph.SupplyId, "FP-1"), graph.Edges);
        Assert.Contains(new DiagramEdge("FP-1", "FP-101"), graph.Edges);
    }

    [Fact]
    public void Labels_carry_conductor_protection_and_rating_and_errors_are_marked()
    {
        var analysis = Analyzer.Analyze(Plants.Example("dairy-bottling.motors"));
        var p101 = OneLineGraph.Of(analysis).Nodes.Single(n => n.Id == "P-101");
        // As written in examples/dairy-bottling.motors: 15hp, wire 10 AWG, ground 10 AWG, dual-element-fuse 35A.
        Assert.Equal("P-101  15hp", p101.Lines[0]);
        Assert.Contains("10 AWG + 10 AWG G", p101.Lines);
        Assert.Contains(p101.Lines, l => l.StartsWith("35 A dual-element fuse", StringComparison.Ordinal));

        var broken = Analyzer.Analyze(Plants.Example("dairy-bottling.motors").Replace("    wire 10 AWG\n", "    wire 14 AWG\n"));
        var node = OneLineGraph.Of(broken).Nodes.Single(n => n.Id == "P-101");
        Assert.NotEmpty(node.Errors);
        Assert.StartsWith("✗ ", NodeShape.TextLines(node)[^1]);
        Assert.Contains("class=\"node motor err\" data-id=\"P-101\"", OneLineDiagram.Svg(broken, "t"));
    }

    [Fact]
    public void Ten_feeders_of_thirty_motors_lay_out_without_overlapping_boxes()
    {
        var analysis = Analyzer.Analyze(Plants.Large());
        var layout = OneLineLayout.Of(OneLineGraph.Of(analysis));
        Assert.Equal(1 + 1 + 10 + 300, layout.Nodes.Count);
        // Sorted by left edge, each box is compared only with those that can still overlap it.
        var boxes = layout.Nodes.OrderBy(n => n.X).ToList();
        for (var i = 0; i < boxes.Count; i++)
        {
            for (var j = i + 1; j < boxes.Count && boxes[j].X < boxes[i].X + boxes[i].Width; j++)
            {
                var a = boxes[i];
                var b = boxes[j];
                var apart = a.Y + a.Height <= b.Y || b.Y + b.Height <= a.Y;
                Assert.True(apart, $"{a.Node.Id} and {b.Node.Id} overlap");
            }
        }
    }
}
