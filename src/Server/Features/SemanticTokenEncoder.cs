using MotorLang.Analysis.Editing;

namespace MotorLang.Server.Features;

/// <summary>Encodes classified spans in the protocol's relative five-integer form.</summary>
public static class SemanticTokenEncoder
{
    public static readonly string[] Legend = ["keyword", "variable", "number", "string", "comment", "enumMember"];

    public static int[] Encode(IReadOnlyList<ClassifiedSpan> spans)
    {
        var data = new int[spans.Count * 5];
        int line = 0, column = 0;
        for (var i = 0; i < spans.Count; i++)
        {
            var s = spans[i];
            var deltaLine = s.Line - line;
            data[i * 5] = deltaLine;
            data[i * 5 + 1] = deltaLine == 0 ? s.Column - column : s.Column;
            data[i * 5 + 2] = s.Length;
            data[i * 5 + 3] = s.Class switch
            {
                TokenClass.Keyword => 0, TokenClass.Tag => 1, TokenClass.Number => 2, TokenClass.String => 3, TokenClass.Comment => 4, _ => 5,
            };
            line = s.Line;
            column = s.Column;
        }

        return data;
    }
}
