using System.Collections.Immutable;
using MotorLang.Parser.Diagnostics;
using MotorLang.Parser.Model;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;
using MotorLang.Parser.Text;

namespace MotorLang.Parser;

/// <summary>
/// Assigns each statement line to a block by its indentation and builds the model as it goes.
/// A line that cannot be read opens a "broken" block so that the lines under it are skipped
/// quietly instead of each reporting that it is misplaced.
/// </summary>
internal sealed class StructureBuilder(StatementParser statements, List<Diagnostic> diagnostics, DocumentParts? parts = null)
{
    private sealed class Block(BlockKind kind, int headerIndent, BlockNode? node, bool broken)
    {
        public BlockKind Kind { get; } = kind;
        public int HeaderIndent { get; } = headerIndent;
        public BlockNode? Node { get; } = node;
        public bool Broken { get; } = broken;
        public int? ChildIndent { get; set; }
    }

    private readonly List<Block> _stack = [];
    private readonly List<FeederNode> _feeders = [];
    private readonly Dictionary<string, CircuitNode> _byTag = new(StringComparer.OrdinalIgnoreCase);
    private ProjectNode? _project;

    public MotorList Build(LineList lines)
    {
        _stack.Add(new Block(BlockKind.Root, -1, null, false) { ChildIndent = 0 });
        foreach (var line in lines)
        {
            // Each part of a joined document starts at the top level, whatever the last one left open.
            if (parts is not null && line.Index > 0 && parts.IsStart(line.Index))
            {
                _stack.Clear();
                _stack.Add(new Block(BlockKind.Root, -1, null, false) { ChildIndent = 0 });
            }

            if (line.InConflict)
            {
                line.IsBroken = true;
                continue;
            }

            if (line.Tokens.Length == 0) continue;
            Place(line);
        }

        var model = new MotorList(_project, _feeders, _byTag);
        new ReferenceChecker(model, diagnostics, LineName).Check();
        return model;
    }

    private void Place(SyntaxLine line)
    {
        if (line.IndentHasTab)
        {
            PlaceTabbed(line);
            return;
        }

        var indent = line.IndentWidth;
        while (_stack.Count > 1 && indent <= _stack[^1].HeaderIndent) _stack.RemoveAt(_stack.Count - 1);
        var parent = _stack[^1];
        if (parent.Broken)
        {
            line.IsBroken = true;
            return;
        }

        // An unreadable line says nothing reliable about indentation, so it neither sets nor
        // breaks the block's indentation; lines under it are skipped.
        var first = line.Tokens[0];
        var spec = first.Kind == TokenKind.Word ? Keywords.Find(first.Text) : null;
        if (spec is null)
        {
            var allowed = Keywords.AllowedIn(parent.Kind).Select(k => k.Keyword);
            var message = first.Kind == TokenKind.String
                ? "a line must start with a keyword; a description goes after the tag"
                : $"unknown keyword '{first.Text}'{Suggestions.DidYouMean(first.Text, allowed)}";
            Error(SyntaxCodes.UnknownKeyword, first.Range, message);
            Open(BlockKind.Root, indent, null, broken: true, line);
            return;
        }

        if (parent.ChildIndent is null)
        {
            parent.ChildIndent = indent;
            if (parent.Node is not null) parent.Node.ChildIndent = indent;
        }
        else if (indent != parent.ChildIndent)
        {
            var message = parent.Kind == BlockKind.Root
                ? $"unexpected indentation: nothing above opens a block; 'project' and 'feeder' start at column 1"
                : $"indentation of {indent} spaces does not match the {parent.ChildIndent} of the lines above in this {parent.Kind.ToString().ToLowerInvariant()}";
            // The line is read as a child of this block and keeps its statement, so the model
            // still has it; the formatter leaves it as written, like every line with a diagnostic.
            Error(SyntaxCodes.BadIndentation, SourceRange.OnLine(line.Index, 0, Math.Max(indent, 1)), message);
        }

        Read(line, spec, parent, indent);
    }

    /// <summary>
    /// A tab-indented line has no width that can be compared with the spaces around it, so its
    /// indentation neither closes nor sets a block: it is reported once (P006) and read into the
    /// innermost open block where its keyword belongs, as if it were indented like that block's
    /// other lines. The blocks around it stay as they were, so one tab costs one message, and the
    /// line is kept as written (it has a diagnostic, so the formatter leaves it).
    /// </summary>
    private void PlaceTabbed(SyntaxLine line)
    {
        Error(SyntaxCodes.TabIndentation, SourceRange.OnLine(line.Index, 0, line.IndentWidth),
            "tabs are not allowed in indentation; indent with spaces (two per level)");
        line.IsBroken = true;
        if (_stack[^1].Broken) return;

        var first = line.Tokens[0];
        var spec = first.Kind == TokenKind.Word ? Keywords.Find(first.Text) : null;
        var home = _stack.Count - 1;
        if (spec is not null)
        {
            while (home > 0 && !spec.AllowedIn.Contains(_stack[home].Kind) && !_stack[home].Broken) home--;
        }

        // No block open here takes the keyword (or it is unknown): read it where it stands, so it is
        // reported as misplaced or unknown, and hide the lines under it as any unreadable header does.
        if (spec is null || _stack[home].Broken || !spec.AllowedIn.Contains(_stack[home].Kind))
        {
            var parent = _stack[^1];
            if (spec is null)
            {
                var allowed = Keywords.AllowedIn(parent.Kind).Select(k => k.Keyword);
                Error(SyntaxCodes.UnknownKeyword, first.Range, first.Kind == TokenKind.String
                    ? "a line must start with a keyword; a description goes after the tag"
                    : $"unknown keyword '{first.Text}'{Suggestions.DidYouMean(first.Text, allowed)}");
            }
            else if (!_stack[home].Broken)
            {
                Error(SyntaxCodes.MisplacedStatement, first.Range, Misplaced(spec, parent.Kind));
            }

            return;
        }

        _stack.RemoveRange(home + 1, _stack.Count - home - 1);
        var block = _stack[home];
        var indent = block.ChildIndent ?? block.HeaderIndent + 2;
        Read(line, spec, block, indent);
    }

    /// <summary>Reads a placed line's statement into its block, opening a block for a header.</summary>
    private void Read(SyntaxLine line, KeywordSpec spec, Block parent, int indent)
    {
        var first = line.Tokens[0];
        if (!spec.AllowedIn.Contains(parent.Kind))
        {
            Error(SyntaxCodes.MisplacedStatement, first.Range, Misplaced(spec, parent.Kind));
            if (spec.IsHeader) Open(spec.Opens!.Value, indent, null, broken: true, line);
            else line.IsBroken = true;
            return;
        }

        var statement = statements.Parse(line, spec, out var ok);
        line.Statement = statement;
        line.Depth = _stack.Count - 1;
        line.IsBroken |= !ok;
        Extend(line.Index);

        if (spec.IsHeader)
        {
            var node = CreateNode(statement, parent);
            Open(spec.Opens!.Value, indent, node, broken: false, line);
            return;
        }

        if (parent.Node is { } owner)
        {
            owner.LastOwnLine = line.Index;
            if (owner.Add(statement) is { } earlier)
            {
                Error(SyntaxCodes.DuplicateSetting, first.Range,
                    $"'{spec.Keyword}' is already given on {LineName(earlier.Line.Index)}; remove one of them");
                line.IsBroken = true;
            }
        }
    }

    private void Open(BlockKind kind, int indent, BlockNode? node, bool broken, SyntaxLine line)
    {
        if (broken) line.IsBroken = true;
        _stack.Add(new Block(kind, indent, node, broken));
    }

    /// <summary>Every open block's extent grows to include this line.</summary>
    private void Extend(int lineIndex)
    {
        foreach (var b in _stack)
        {
            if (b.Node is not null) b.Node.LastLine = lineIndex;
        }
    }

    private BlockNode? CreateNode(Statement header, Block parent)
    {
        switch (header.Keyword)
        {
            case "project":
                if (_project is not null)
                {
                    Error(SyntaxCodes.DuplicateProject, header.KeywordToken.Range,
                        $"only one project block is allowed{(parts is null ? "" : " in a plant")}; the first is on {LineName(_project.Header.Line.Index)}");
                    return null;
                }

                return _project = new ProjectNode(header);
            case "feeder":
                var feeder = new FeederNode(header, _project);
                _feeders.Add(feeder);
                Register(feeder);
                return feeder;
            case "motor" or "compressor" when parent.Node is FeederNode f:
                var motor = new MotorNode(header, f);
                f.Add(motor);
                Register(motor);
                return motor;
            case "load" when parent.Node is FeederNode f:
                var load = new LoadNode(header, f);
                f.Add(load);
                Register(load);
                return load;
            default:
                return null;
        }
    }

    private void Register(CircuitNode node)
    {
        if (node.Tag is not { } tag) return;
        if (_byTag.TryGetValue(tag.Value, out var earlier))
        {
            Error(SyntaxCodes.DuplicateTag, tag.Range,
                $"tag '{tag.Value}' is already used on {LineName(earlier.Header.Line.Index)}; tags must be unique in a {(parts is null ? "file" : "plant")}");
            return;
        }

        _byTag[tag.Value] = node;
    }

    private string LineName(int index) => parts?.LineLabel(index) ?? $"line {index + 1}";

    private static string Misplaced(KeywordSpec spec, BlockKind parent)
    {
        var homes = string.Join(" or ", spec.AllowedIn.Select(b => b == BlockKind.Root ? "the top level" : $"a {b.ToString().ToLowerInvariant()} block"));
        return spec.IsHeader
            ? $"'{spec.Keyword}' cannot start here; it belongs in {homes}"
            : $"'{spec.Keyword}' does not belong in {(parent == BlockKind.Root ? "the top level" : $"a {parent.ToString().ToLowerInvariant()} block")}; it belongs in {homes}";
    }

    private void Error(string code, SourceRange range, string message) =>
        diagnostics.Add(new Diagnostic(code, Severity.Error, range, message));
}
