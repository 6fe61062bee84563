namespace MotorLang.Parser.Text;

/// <summary>Where a line starts in a text, found without walking the text a line at a time.</summary>
public static class LineStarts
{
    private const int Block = 8192;

    /// <summary>
    /// The offset just after the <paramref name="line"/>-th '\n' (so line 0 starts at 0), or -1
    /// when the text has fewer line breaks. Whole blocks are skipped by counting their line breaks,
    /// which is vectorised, so a line near the end of a large document is found quickly.
    /// </summary>
    public static int Find(ReadOnlySpan<char> text, int line, int from = 0)
    {
        var offset = from;
        var remaining = line;
        while (remaining > 0)
        {
            if (text.Length - offset > Block && text.Slice(offset, Block).Count('\n') is var count && count < remaining)
            {
                remaining -= count;
                offset += Block;
                continue;
            }

            var nl = text[offset..].IndexOf('\n');
            if (nl < 0) return -1;
            offset += nl + 1;
            remaining--;
        }

        return offset;
    }
}
