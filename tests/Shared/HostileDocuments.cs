using System.Text;
using CsCheck;

namespace MotorLang.Tests.Shared;

/// <summary>
/// Motor lists mutated into what editors, merges and disks hand the tools: NUL characters,
/// invalid UTF-8 (as the replacement characters a decoder makes, and as raw bytes), CR-only and
/// mixed line endings, byte order marks, merge-conflict markers, tabs, very long lines, and
/// random edits of characters and lines. Generated from a fixed seed so that every run tries the
/// same documents; a failure names its document by number.
/// </summary>
public static class HostileDocuments
{
    private static readonly string[] Snippets =
    [
        "\0", "\uFFFD", "\uFFFD\uFFFD", "\uD800", "\uDC00", "\r", "\n", "\r\n", "\t", "\uFEFF", " ", "  ", "#", "\"", "\\", "é", "😀",
        "°", "0", "7", "x", "X", "-", "/", ".", "\u00A0", "<<<<<<< ours\n", "=======\n", ">>>>>>> theirs\n", "||||||| base\n",
        " HP", "awg", " 10awg", "motor ", "like P-101", "from SWBD-1", "  wire 10 AWG\n", "\n  motor Z-9 5 hp\n", "# note ", "\"x # y\"",
    ];

    private static readonly string[] Indents = ["", " ", "  ", "   ", "    ", "\t", " \t", "      ", "\t\t"];

    /// <summary>One edit: what to do and three numbers that say where and with what.</summary>
    private readonly record struct Mutation(int Op, int A, int B, int C);

    private static readonly Gen<Mutation> AnyMutation =
        Gen.Select(Gen.Int[0, 13], Gen.Int[0, int.MaxValue], Gen.Int[0, int.MaxValue], Gen.Int[0, int.MaxValue])
            .Select((op, a, b, c) => new Mutation(op, a, b, c));

    /// <summary>Documents as text (what an editor sends the server).</summary>
    public static Gen<string> Text(IReadOnlyList<string> bases) =>
        Gen.Select(Gen.Int[0, bases.Count - 1], Gen.Int[0, int.MaxValue], Gen.Int[0, 7], AnyMutation.Array[1, 6])
            .Select((b, start, whole, mutations) => mutations.Aggregate(whole == 0 ? bases[b] : Window(bases[b], start), Apply));

    /// <summary>
    /// A run of 2 to 30 lines from a list, cut at a block header where there is one: small
    /// documents cost less to check, so more of them fit in a run, each with denser damage.
    /// </summary>
    private static string Window(string text, int seed)
    {
        var lines = text.Split('\n');
        var start = seed % lines.Length;
        var headers = Enumerable.Range(0, lines.Length).Where(i => lines[i].StartsWith("feeder", StringComparison.Ordinal)).ToArray();
        if (headers.Length > 0 && seed % 3 != 0) start = headers[seed / 3 % headers.Length];
        var count = 2 + seed / 11 % 29;
        return string.Join('\n', lines.Skip(start).Take(count)) + "\n";
    }

    /// <summary>Documents as bytes (what the command line reads from disk): UTF-8 with raw faults mixed in now and then.</summary>
    public static Gen<byte[]> Bytes(IReadOnlyList<string> bases) =>
        Gen.Select(Text(bases), Gen.Int[0, 3], Gen.Int[0, int.MaxValue].Array[1, 3])
            .Select((text, faults, at) =>
            {
                var bytes = Encoding.UTF8.GetBytes(text).ToList(); // lone surrogates become EF BF BD here
                for (var i = 0; i < faults && i < at.Length; i++)
                    bytes.InsertRange(at[i] % (bytes.Count + 1), RawFaults[at[i] / 7 % RawFaults.Length]);
                return bytes.ToArray();
            });

    private static readonly byte[][] RawFaults =
    [
        [0xFF], [0xFE], [0xC0, 0x80], [0xED, 0xA0, 0x80], [0x80], [0xE2, 0x82], [0x00], [0xEF, 0xBB, 0xBF], [0xF4, 0x90, 0x80, 0x80],
        [0x0D], [0x09],
    ];

    private static string Apply(string text, Mutation m)
    {
        var lines = text.Split('\n').ToList();
        var line = m.A % lines.Count;
        var other = m.B % lines.Count;
        switch (m.Op)
        {
            case 0:
            case 1:
                return text.Insert(m.A % (text.Length + 1), Snippets[m.B % Snippets.Length]);
            case 2:
                if (text.Length == 0) return text;
                var at = m.A % text.Length;
                return text.Remove(at, Math.Min(1 + m.B % 5, text.Length - at));
            case 3:
                lines.RemoveAt(line);
                break;
            case 4:
                lines.Insert(line, lines[other]);
                break;
            case 5:
                (lines[line], lines[other]) = (lines[other], lines[line]);
                break;
            case 6:
                lines[line] = Indents[m.B % Indents.Length] + lines[line].TrimStart(' ', '\t');
                break;
            case 7:
                // Line endings: CR only, CRLF throughout, or a mix line by line.
                return (m.B % 3) switch
                {
                    0 => text.Replace("\r\n", "\n").Replace('\n', '\r'),
                    1 => text.Replace("\r\n", "\n").Replace("\n", "\r\n"),
                    _ => string.Concat(lines.Select((l, i) => l + (i == lines.Count - 1 ? "" : (m.C >> (i % 30) & 1) == 1 ? "\r\n" : "\n"))),
                };
            case 8:
                return m.B % 2 == 0 ? "\uFEFF" + text : text.Insert(m.A % (text.Length + 1), "\uFEFF");
            case 9:
                // A merge conflict around some lines, with or without its closing marker.
                var end = Math.Max(line, other);
                lines.Insert(end + 1, ">>>>>>> theirs");
                if (m.C % 4 == 0) lines.RemoveAt(end + 1);
                lines.Insert(Math.Min(line, other), "<<<<<<< ours");
                lines.Insert(Math.Min(line, other) + 1 + (end - Math.Min(line, other)) / 2, "=======");
                break;
            case 10:
                // A very long line: a statement with thousands of values, a long comment, or a long description.
                // Thousands of values cost the parser a diagnostic each, so those lines stay near 2,000 characters.
                var n = 2_000 + m.B % 30_000;
                lines.Insert(line, (m.C % 10) switch
                {
                    0 => "  motor L-" + m.B % 1000 + " 5hp" + string.Concat(Enumerable.Repeat(" 1A", 600 + m.B % 200)),
                    < 4 => "  # " + new string('x', n),
                    < 7 => "  load Q-" + m.B % 1000 + " \"" + new string('d', n) + "\" 5A",
                    _ => "  motor " + new string('M', n) + " 5hp",
                });
                break;
            case 11:
                lines[line] = m.B % 2 == 0 ? lines[line].ToUpperInvariant() : lines[line].ToLowerInvariant();
                break;
            case 12:
                lines[line] = m.B % 2 == 0 ? lines[line].Replace(" ", "  ") : lines[line].Replace(" ", "\t");
                break;
            default:
                // A character replaced by what a decoder makes of a bad byte, or by a lone surrogate.
                if (text.Length == 0) return text;
                var p = m.A % text.Length;
                return string.Concat(text.AsSpan(0, p), m.B % 3 == 0 ? "\uD83D" : "\uFFFD", text.AsSpan(p + 1));
        }

        return string.Join('\n', lines);
    }

    /// <summary>Draws <paramref name="count"/> values from a fixed seed: the same documents on every run.</summary>
    public static IEnumerable<T> Draw<T>(Gen<T> gen, ulong seed, int count)
    {
        var pcg = new PCG(1, seed);
        for (var i = 0; i < count; i++) yield return gen.Generate(pcg, null, out _);
    }
}
