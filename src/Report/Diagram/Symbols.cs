using System.Text;
using MotorLang.Domain;

namespace MotorLang.Report.Diagram;

/// <summary>
/// Device symbols after the general forms of IEEE 315 / IEC 60617, drawn horizontally (power flows
/// left to right): an ac source as a circle with a sine, a circuit breaker as a switching blade with a
/// cross at its fixed contact, a fuse as a rectangle the line runs through, a motor as a circle with M,
/// a bus as a heavy bar, a load as an arrowhead. Each writes into <paramref name="sb"/> with its left end
/// at <paramref name="x"/> on the centre line <paramref name="cy"/> and returns where the line leaves it.
/// </summary>
public static class Symbols
{
    public static double Line(StringBuilder sb, double x1, double x2, double cy)
    {
        sb.Append($"<line class=\"w\" x1=\"{Svg.N(x1)}\" y1=\"{Svg.N(cy)}\" x2=\"{Svg.N(x2)}\" y2=\"{Svg.N(cy)}\"/>");
        return x2;
    }

    public static double Source(StringBuilder sb, double x, double cy)
    {
        const double r = 15;
        var cx = x + 4 + r;
        sb.Append($"<circle class=\"s\" cx=\"{Svg.N(cx)}\" cy=\"{Svg.N(cy)}\" r=\"{Svg.N(r)}\"/>");
        // One period of a sine across the circle.
        sb.Append($"<path class=\"s\" d=\"M{Svg.N(cx - 9)},{Svg.N(cy)} C{Svg.N(cx - 6)},{Svg.N(cy - 9)} {Svg.N(cx - 3)},{Svg.N(cy - 9)} {Svg.N(cx)},{Svg.N(cy)}"
            + $" S{Svg.N(cx + 6)},{Svg.N(cy + 9)} {Svg.N(cx + 9)},{Svg.N(cy)}\"/>");
        return cx + r;
    }

    public static double Device(StringBuilder sb, ProtectiveDevice? device, double x, double cy) => device switch
    {
        ProtectiveDevice.InverseTimeBreaker => Breaker(sb, x, cy, instantaneous: false),
        ProtectiveDevice.InstantaneousTripBreaker => Breaker(sb, x, cy, instantaneous: true),
        ProtectiveDevice.DualElementFuse or ProtectiveDevice.NonTimeDelayFuse => Fuse(sb, x, cy),
        _ => Line(sb, x, x + 22, cy),
    };

    private static double Breaker(StringBuilder sb, double x, double cy, bool instantaneous)
    {
        Line(sb, x, x + 3, cy);
        // The blade, open, rising from the moving contact to beyond the fixed one.
        sb.Append($"<line class=\"s\" x1=\"{Svg.N(x + 3)}\" y1=\"{Svg.N(cy)}\" x2=\"{Svg.N(x + 18)}\" y2=\"{Svg.N(cy - 8)}\"/>");
        var fx = x + 18;
        sb.Append($"<path class=\"s\" d=\"M{Svg.N(fx - 3)},{Svg.N(cy - 3)} L{Svg.N(fx + 3)},{Svg.N(cy + 3)} M{Svg.N(fx - 3)},{Svg.N(cy + 3)} L{Svg.N(fx + 3)},{Svg.N(cy - 3)}\"/>");
        if (instantaneous) sb.Append($"<text class=\"sym\" x=\"{Svg.N(x + 6)}\" y=\"{Svg.N(cy + 12)}\">I»</text>");
        return Line(sb, fx, x + 24, cy);
    }

    private static double Fuse(StringBuilder sb, double x, double cy)
    {
        sb.Append($"<rect class=\"s\" x=\"{Svg.N(x + 3)}\" y=\"{Svg.N(cy - 4)}\" width=\"16\" height=\"8\"/>");
        return Line(sb, x, x + 22, cy);
    }

    public static double Motor(StringBuilder sb, double x, double cy)
    {
        const double r = 12;
        var cx = x + r;
        sb.Append($"<circle class=\"s\" cx=\"{Svg.N(cx)}\" cy=\"{Svg.N(cy)}\" r=\"{Svg.N(r)}\"/>");
        sb.Append($"<text class=\"sym m\" x=\"{Svg.N(cx)}\" y=\"{Svg.N(cy + 4)}\">M</text>");
        return cx + r;
    }

    public static double Bus(StringBuilder sb, double x, double top, double bottom)
    {
        sb.Append($"<line class=\"bus\" x1=\"{Svg.N(x)}\" y1=\"{Svg.N(top)}\" x2=\"{Svg.N(x)}\" y2=\"{Svg.N(bottom)}\"/>");
        return x;
    }

    public static double Load(StringBuilder sb, double x, double cy)
    {
        sb.Append($"<path class=\"s solid\" d=\"M{Svg.N(x)},{Svg.N(cy - 6)} L{Svg.N(x + 12)},{Svg.N(cy)} L{Svg.N(x)},{Svg.N(cy + 6)} Z\"/>");
        return x + 12;
    }
}
