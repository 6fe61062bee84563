using CsCheck;
using MotorLang.Server.Documents;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>Positions to offsets on long documents, where whole blocks of lines are skipped at once.</summary>
public class TextChangesTests
{
    private static readonly Gen<string> Line = Gen.OneOfConst("", "  motor M-1 15hp", "    wire 10 AWG  # °", "泵 😀", "x", new string('y', 9000));

    [Fact]
    public void OffsetsMatchALineByLineCount() =>
        Gen.Select(Line.Array[0, 400], Gen.OneOfConst("\n", "\r\n"), Gen.Int[0, 500], Gen.Int[0, 40])
            .Sample((lines, ending, line, character) =>
            {
                var text = string.Join(ending, lines);
                Assert.Equal(Naive(text, new Position(line, character)), TextChanges.Offset(text, new Position(line, character)));
            }, iter: 300);

    /// <summary>The LSP rule spelled out slowly: walk to the line, then clamp the character to that line's end.</summary>
    private static int Naive(string text, Position p)
    {
        var offset = 0;
        for (var line = 0; line < p.Line; line++)
        {
            var nl = text.IndexOf('\n', offset);
            if (nl < 0) return text.Length;
            offset = nl + 1;
        }

        var end = text.IndexOf('\n', offset);
        if (end < 0) end = text.Length;
        else if (end > offset && text[end - 1] == '\r') end--;
        return Math.Min(offset + p.Character, end);
    }
}
