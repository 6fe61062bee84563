using MotorLang.Analysis;

namespace MotorLang.Report.Diagram;

/// <summary>The one-line diagram of a list, from model to SVG text.</summary>
public static class OneLineDiagram
{
    public static string Svg(AnalysisResult analysis, string title) => OneLineSvg.Write(OneLineLayout.Of(OneLineGraph.Of(analysis)), title);
}
