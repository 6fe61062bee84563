using MotorLang.Domain;
using MotorLang.Sizing;
using MotorLang.Sizing.Rules;

namespace MotorLang.Report.Diagram;

/// <summary>How the diagram and the report word a circuit's conductors and protection, short enough for a label.</summary>
public static class Labels
{
    private const int LongestDescription = 32;

    public static string Shorten(string text) => text.Length <= LongestDescription ? text : text[..(LongestDescription - 1)].TrimEnd() + "…";

    public static string Phases(Phases p) => p switch
    {
        Domain.Phases.Three => "3ph",
        Domain.Phases.Single => "1ph",
        _ => "dc",
    };

    public static string Conductors(WireSpec? written, WireSpec? minimum, ConductorSize? ground) =>
        (written is { } w ? w.ToString() : minimum is { } m ? $"wire not written (min {m})" : "wire not written")
        + (ground is { } g ? $" + {g} G" : "");

    public static string Protection(decimal? rating, ProtectiveDevice? device, decimal? maximum, decimal? fireMinimum)
    {
        var written = rating is { } r && device is { } d ? $"{Format.Amps(r)} {DeviceShort(d)}" : "protection not written";
        if (fireMinimum is { } fm) return $"{written} (min {Format.Amps(fm)})";
        return maximum is { } max ? $"{written} (max {Format.Amps(max)})" : written;
    }

    public static string DeviceShort(ProtectiveDevice d) => d switch
    {
        ProtectiveDevice.InverseTimeBreaker => "inverse-time CB",
        ProtectiveDevice.InstantaneousTripBreaker => "instantaneous CB",
        ProtectiveDevice.DualElementFuse => "dual-element fuse",
        _ => "non-time-delay fuse",
    };
}
