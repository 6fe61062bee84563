using System.Text;
using MotorLang.Tests.Shared;
using CsCheck;
using MotorLang.Analysis;
using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Reports;
using MotorLang.Parser.Text;
using MotorLang.Server.Documents;
using MotorLang.Server.Features;
using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>
/// Changes applied one after another without waiting for analysis (the versions between are read
/// now and then, or not at all): whatever path the store takes — lines re-read and chained into
/// one model edit, or the text parsed again — the last version's text, findings (with fixes),
/// hover and schedule equal a fresh analysis of the final text.
/// </summary>
public class EditChainPropertyTests
{
    /// <summary>Invented for the test: 'like' across feeders and a feeder fed from another, so an edit reaches further than its own block.</summary>
    private const string Plant = """
        project "Chained edits test plant"
          ambient 40C

        feeder SW-1 "Main switchboard" 480V 3ph
          length 200ft
          wire 4/0 AWG
          protection inverse-time-breaker 400A

          motor C-1 "Compressor" 50hp
            length 400ft
            wire 4 AWG
            protection inverse-time-breaker 150A

        feeder MCC-2 "Process MCC" 480V 3ph
          from SW-1
          length 300ft
          wire 1/0 AWG
          load L-1 "Heater" 20A continuous

          motor P-1 "Feed pump" 15hp
            length 500ft
            wire 12 AWG
            protection inverse-time-breaker 70A

          motor P-2 "Standby pump" 15hp
            like P-1
            length 250ft

        feeder MCC-3 "Utility MCC" 480V 3ph
          wire 6 AWG

          motor F-1 "Fan" 7.5hp
            like P-2
            ground 14 AWG
        """;

    private static readonly string[] Documents =
    [
        Plant,
        Plant.Replace("\n", "\r\n"),
        .. Directory.GetFiles(Path.Combine(Fixture.Root, "examples"), "*.motors").Order().Select(File.ReadAllText),
    ];

    private static readonly Gen<string> Typed = Gen.OneOfConst("", "1", "0", "5", "x", " ", "A", "hp", "AWG", "ft", "😀", "\"", "#", "M-1", "wire");

    private static readonly Gen<string> Pasted = Gen.OneOfConst(
        "\n", "\r\n", "  motor N-1 \"New\" 5hp\n    wire 12 AWG\n", "    length 90ft\n", "# a note\n\n", "feeder X-1 480V 3ph\n", "ab\ncd");

    /// <summary>
    /// An edit: its kind (0 one line, 1 the same number of lines rewritten, 2 lines inserted,
    /// 3 lines deleted, 4 any range, 5 the whole text replaced), a line and a column (fractions), a length, the text, and what
    /// is read afterwards (0 nothing, 1 the tree, 2 the analysis).
    /// </summary>
    private static readonly Gen<(int Kind, double Line, double Column, int Length, string Typed, string Pasted, int Read)> Edit =
        Gen.Select(Gen.Int[0, 5].Select(Gen.Int[0, 19], (k, w) => w < 10 ? 0 : k == 5 && w < 18 ? 4 : k), Gen.Double[0, 1], Gen.Double[0, 1], Gen.Int[0, 3], Typed, Pasted,
            Gen.Int[0, 5].Select(r => r switch { 0 => 1, 1 => 2, _ => 0 }));

    [Fact]
    public void ChangesAppliedWithoutWaitingEqualAFreshAnalysis()
    {
        var (updated, total) = Run(Edit.Array[1, 30], iter: 300);
        Assert.True(updated > 0, $"none of {total} sessions ended in an update");
    }

    /// <summary>
    /// Value edits only (digits typed before a digit, and blocks of value lines rewritten), none
    /// of the versions between read: every session must end in one update from the analysis made
    /// at opening, never a full one, and equal a fresh analysis.
    /// </summary>
    [Fact]
    public void ValueEditsChainIntoOneUpdate()
    {
        var digits = Gen.OneOfConst("1", "0", "5", "9");
        var valueEdits = Gen.Select(Edit, digits).Select((e, d) => e with { Kind = -1 - e.Kind % 2, Typed = d, Read = 0 });
        var (updated, total) = Run(valueEdits.Array[1, 20], iter: 200, analyseFirst: true, documents: [Plant, Plant.Replace("\n", "\r\n")]);
        Assert.Equal(total, updated);
    }

    /// <summary>
    /// A long burst of keystrokes, none read: the versions waiting unread stay bounded (a change
    /// reads the one before it at the bound), and the last version still ends in one update equal
    /// to a fresh analysis.
    /// </summary>
    [Fact]
    public void ALongBurstOfUnreadChangesStaysBounded()
    {
        var text = Plant;
        var store = new DocumentStore();
        const string uri = "file:///burst.motors";
        _ = store.Open(uri, 1, text).Analysis;
        var line = Array.FindIndex(text.Split('\n'), l => l == "    length 500ft");
        var column = "    length ".Length;
        var maxPending = 0;
        for (var i = 0; i < 3 * DocumentSnapshot.MaxPending; i++)
        {
            // A digit typed before the length, then taken out again.
            var change = i % 2 == 0
                ? new TextDocumentContentChangeEvent(new Protocol.Range(new(line, column), new(line, column)), (i % 9 + 1).ToString())
                : new TextDocumentContentChangeEvent(new Protocol.Range(new(line, column), new(line, column + 1)), "");
            text = TextChanges.Apply(text, [change]);
            maxPending = Math.Max(maxPending, store.Change(uri, i + 2, [change])!.Pending);
        }

        Assert.InRange(maxPending, DocumentSnapshot.MaxPending, DocumentSnapshot.MaxPending + 1);
        var last = store.Get(uri)!;
        Assert.Equal(AnalysisText.Describe(Analyzer.Analyze(text)), AnalysisText.Describe(last.Analysis));
        Assert.True(last.Updated);
    }

    private static (int Updated, int Total) Run(Gen<(int Kind, double Line, double Column, int Length, string Typed, string Pasted, int Read)[]> edits,
        int iter, bool analyseFirst = false, string[]? documents = null)
    {
        documents ??= Documents;
        var updated = 0;
        var total = 0;
        Gen.Select(Gen.Int[0, documents.Length - 1], edits).Sample(session =>
        {
            var text = documents[session.Item1];
            var store = new DocumentStore();
            const string uri = "file:///chain.motors";
            store.Open(uri, 1, text);
            if (analyseFirst || session.Item2.Length % 2 == 0) _ = store.Get(uri)!.Analysis;
            var version = 1;
            foreach (var edit in session.Item2)
            {
                var change = ChangeFor(text, edit);
                text = TextChanges.Apply(text, [change]);
                var snapshot = store.Change(uri, ++version, [change])!;
                if (edit.Read == 1) _ = snapshot.Parse;
                if (edit.Read == 2) _ = snapshot.Analysis;
            }

            var last = store.Get(uri)!;
            Assert.Equal(text, last.Text);
            var fresh = Analyzer.Analyze(text);
            var analysis = last.Analysis;
            Interlocked.Increment(ref total);
            if (last.Updated) Interlocked.Increment(ref updated);
            Assert.Equal(text, analysis.Parse.Tree.Print());
            Assert.Equal(AnalysisText.Describe(fresh), AnalysisText.Describe(analysis));
            Assert.Equal(Hovers(fresh, text), Hovers(analysis, text));
        }, iter: iter);
        return (updated, total);
    }

    /// <summary>The buffer that takes the changes the tree cannot reads positions exactly as the plain text edit does.</summary>
    [Fact]
    public void TheLineBufferAppliesChangesAsTheTextDoes()
    {
        Gen.Select(Gen.Int[0, Documents.Length - 1], Edit.Array[1, 20], Gen.Int[-1, 2], Gen.Int[0, 200]).Sample(session =>
        {
            var text = Documents[session.Item1];
            var buffer = TextBuffer.From(text);
            foreach (var edit in session.Item2)
            {
                var change = ChangeFor(text, edit);
                // Now and then a position past the end of the text or of its line, or before its start, as a client may send.
                if (edit.Read == 1 && change.Range is { } r)
                    change = change with { Range = r with { End = new Position(r.End.Line + session.Item3, r.End.Character + session.Item4) } };
                text = TextChanges.Apply(text, [change]);
                buffer.Apply(change);
                Assert.Equal(text, buffer.ToString());
            }
        }, iter: 400);
    }

    /// <summary>A change of the given kind at a position picked from the current text.</summary>
    private static TextDocumentContentChangeEvent ChangeFor(string text, (int Kind, double Line, double Column, int Length, string Typed, string Pasted, int Read) edit)
    {
        var lines = text.Split('\n');
        var line = Math.Min(lines.Length - 1, (int)(edit.Line * lines.Length));
        string Content(int i) => lines[i].TrimEnd('\r');
        var column = Math.Min(Content(line).Length, (int)(edit.Column * Content(line).Length));
        while (column > 0 && column < Content(line).Length && char.IsLowSurrogate(Content(line)[column])) column--;
        if (edit.Kind < 0)
        {
            // A value edit (kinds -1 and -2): on the statements of feeders and motors below the project block.
            var values = Enumerable.Range(0, lines.Length)
                .Where(i => i > Array.FindIndex(lines, l => l.Trim().Length == 0) && Content(i).StartsWith("  ") && Content(i).Any(char.IsAsciiDigit)
                            && Content(i).TrimStart().Split(' ')[0] is not ("feeder" or "motor" or "load" or "compressor" or "from" or "like"))
                .ToArray();
            line = values[Math.Min(values.Length - 1, (int)(edit.Line * values.Length))];
            if (edit.Kind == -2)
                return ChangeFor(text, edit with { Kind = 1, Line = (line + 0.5) / lines.Length });
            var digit = Content(line).IndexOf(Content(line).First(char.IsAsciiDigit));
            return new TextDocumentContentChangeEvent(new Protocol.Range(new(line, digit), new(line, digit)), edit.Typed);
        }

        switch (edit.Kind)
        {
            case 0:
            {
                var end = Math.Min(Content(line).Length, column + edit.Length);
                while (end < Content(line).Length && char.IsLowSurrogate(Content(line)[end])) end++;
                return new TextDocumentContentChangeEvent(new Protocol.Range(new(line, column), new(line, end)), edit.Typed);
            }
            case 1:
            {
                // Every digit of the lines rewritten (a block edited, or a paste over as many lines).
                var last = Math.Min(lines.Length - 1, line + edit.Length);
                var sb = new StringBuilder();
                for (var i = line; i <= last; i++)
                {
                    // Headers keep their tags (a changed tag is a new block, read in full).
                    var header = Content(i).TrimStart().Split(' ')[0] is "feeder" or "motor" or "load" or "compressor" or "from" or "like";
                    sb.Append(header ? Content(i) : new string(Content(i).Select(c => char.IsAsciiDigit(c) ? (char)('0' + (c - '0' + 3) % 10) : c).ToArray()));
                    if (i < last) sb.Append(lines[i].EndsWith('\r') ? "\r\n" : "\n");
                }

                return new TextDocumentContentChangeEvent(new Protocol.Range(new(line, 0), new(last, Content(last).Length)), sb.ToString());
            }
            case 2:
                return new TextDocumentContentChangeEvent(new Protocol.Range(new(line, 0), new(line, 0)), edit.Pasted);
            case 5:
                // The whole text replaced (a client without incremental sync, or a reload), here by the text with one line typed into.
                return new TextDocumentContentChangeEvent(null, TextChanges.Apply(text, [ChangeFor(text, edit with { Kind = 0 })]));
            case 3:
            {
                var last = Math.Min(lines.Length - 1, line + edit.Length + 1);
                return new TextDocumentContentChangeEvent(new Protocol.Range(new(line, 0), new(last, 0)), "");
            }
            default:
            {
                var last = Math.Min(lines.Length - 1, line + edit.Length);
                var end = Math.Min(Content(last).Length, (int)(edit.Column * Content(last).Length));
                while (end > 0 && end < Content(last).Length && char.IsLowSurrogate(Content(last)[end])) end--;
                if (last == line) end = Math.Max(end, column);
                return new TextDocumentContentChangeEvent(new Protocol.Range(new(line, column), new(last, end)), edit.Typed + edit.Pasted);
            }
        }
    }

    /// <summary>The hover on every line's first word and on every value, as the server renders it.</summary>
    private static string Hovers(AnalysisResult analysis, string text)
    {
        var sb = new StringBuilder();
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            foreach (var column in new[] { lines[i].Length - lines[i].TrimStart().Length, lines[i].TrimEnd('\r').Length - 1 })
            {
                if (column < 0) continue;
                if (Breakdown.At(analysis, new TextPosition(i, column)) is { } view) sb.Append($"{i}:{column} {view.Range}\n{HoverRenderer.Markdown(view)}\n");
            }
        }

        return sb.ToString();
    }
}
