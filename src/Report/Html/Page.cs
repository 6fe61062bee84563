using System.Text;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Html;

/// <summary>Writes HTML elements with escaped text; every sheet of the report is built with it.</summary>
public sealed class Page
{
    private readonly StringBuilder _sb = new();

    public Page Raw(string html)
    {
        _sb.Append(html);
        return this;
    }

    public Page Text(string text) => Raw(Svg.E(text));

    /// <summary>An element with escaped text content and optional attributes (already escaped by the caller where built from data).</summary>
    public Page El(string tag, string text, string? attributes = null) =>
        Raw($"<{tag}{(attributes is null ? "" : " " + attributes)}>").Text(text).Raw($"</{tag}>");

    public Page Open(string tag, string? attributes = null) => Raw($"<{tag}{(attributes is null ? "" : " " + attributes)}>");

    public Page Close(string tag) => Raw($"</{tag}>");

    /// <summary>The heading every sheet opens with: its title over the title block.</summary>
    public Page SheetStart(string id, string title, SheetTitle block, string? cssClass = null)
    {
        Open("section", $"class=\"sheet{(cssClass is null ? "" : " " + cssClass)}\" id=\"{Svg.E(id)}\"");
        block.Write(this, title);
        return this;
    }

    public Page SheetEnd() => Close("section");

    public override string ToString() => _sb.ToString();

    public static string A(string name, string value) => $"{name}=\"{Svg.E(value)}\"";
}
