using MotorLang.Parser;
using MotorLang.Parser.Statements;
using MotorLang.Parser.Syntax;

namespace MotorLang.Analysis.Editing;

public enum TokenClass { Keyword, Tag, Number, String, Comment, EnumMember }

/// <summary>A classified span on one line, for semantic highlighting.</summary>
public readonly record struct ClassifiedSpan(int Line, int Column, int Length, TokenClass Class);

/// <summary>Classifies every token for semantic highlighting: keywords, tags, numbers with units, strings, comments, enumerated words.</summary>
public static class Classifier
{
    public static IReadOnlyList<ClassifiedSpan> Classify(ParseResult parse)
    {
        var spans = new List<ClassifiedSpan>();
        foreach (var line in parse.Tree.Lines)
        {
            if (line.InConflict) continue;
            var statement = line.Statement;
            for (var i = 0; i < line.Tokens.Length; i++)
            {
                var t = line.Tokens[i];
                var cls = t.Kind == TokenKind.String ? TokenClass.String
                    : i == 0 && statement is not null ? TokenClass.Keyword
                    : ClassOf(statement, t);
                if (cls is { } c) spans.Add(new ClassifiedSpan(line.Index, t.Column, t.Length, c));
            }

            if (line.Comment is { } comment) spans.Add(new ClassifiedSpan(line.Index, comment.Column, comment.Length, TokenClass.Comment));
        }

        return spans;
    }

    private static TokenClass? ClassOf(Statement? statement, SyntaxToken token)
    {
        if (statement is null) return null;
        foreach (var arg in statement.Args)
        {
            if (!arg.Range.Contains(token.Range.Start) || !arg.Range.Contains(token.Range.End)) continue;
            return arg.Spec.Kind switch
            {
                ArgKind.Tag => TokenClass.Tag,
                ArgKind.Text => TokenClass.String,
                ArgKind.Word => TokenClass.EnumMember,
                _ => TokenClass.Number,
            };
        }

        return null;
    }
}
