using System.Text;

namespace MotorLang.Server.Transport;

/// <summary>
/// Reads header-delimited messages ("Content-Length: N\r\n\r\n" then N bytes) and never gives up:
/// anything malformed becomes a <see cref="Frame.Broken"/> and reading resumes at the next
/// "Content-Length:" header. Memory is bounded: headers are limited in size, a body over
/// <see cref="MaxBodyBytes"/> is rejected from its header without being read into memory, and a
/// body's buffer grows with the bytes that actually arrive, never to the declared length up front.
/// </summary>
internal sealed class FrameReader(Stream input, int maxBodyBytes = FrameReader.DefaultMaxBodyBytes)
{
    /// <summary>
    /// The largest accepted body: a document at the parser's limit (64 M characters) as mostly
    /// ASCII UTF-8, with half as much again for multi-byte text and the JSON around it.
    /// </summary>
    public const int DefaultMaxBodyBytes = Parser.DocumentParser.MaxChars / 2 * 3;

    private const int MaxHeaderLine = 4096;
    private const int MaxHeaderLines = 32;
    private static readonly byte[] HeaderStart = "content-length:"u8.ToArray();

    private byte[] _buffer = new byte[64 * 1024];
    private int _start;
    private int _end;
    private bool _eof;

    public int MaxBodyBytes => maxBodyBytes;

    public async ValueTask<Frame> ReadAsync(CancellationToken ct)
    {
        long? length = null;
        string? charset = null;
        for (var lines = 0; ; lines++)
        {
            // End of input, between messages or inside a header: either way nothing is left to answer.
            if (await ReadLineAsync(ct) is not { } line) return new Frame.EndOfInput();
            var lineStart = line.Start;
            if (line.TooLong) return await BrokenAsync($"a header line is longer than {MaxHeaderLine} bytes", lineStart + 1, ct);
            var text = line.Text;
            if (text.Length == 0)
            {
                if (lines == 0)
                {
                    // A stray blank line between messages: harmless, skip it.
                    lines = -1;
                    continue;
                }

                break;
            }

            if (lines >= MaxHeaderLines) return await BrokenAsync($"more than {MaxHeaderLines} header lines", lineStart + 1, ct);
            var colon = text.IndexOf(':');
            // A header that garbage ran into ("xyzContent-Length: 5") must not pass as an unknown
            // header, or the message behind it would be lost: resynchronise on it instead.
            if (colon <= 0 || !IsToken(text.AsSpan(0, colon)) || text.IndexOf("content-length:", StringComparison.OrdinalIgnoreCase) > 0)
                return await BrokenAsync($"'{Shorten(text)}' is not a header line", lineStart + 1, ct);
            var name = text[..colon].Trim();
            var value = text[(colon + 1)..].Trim();
            if (name.Equals("Content-Length", StringComparison.OrdinalIgnoreCase))
            {
                if (value.Length == 0 || value.Length > 18 || !value.All(char.IsAsciiDigit) || (length is { } seen && seen != long.Parse(value)))
                    return await BrokenAsync($"'{Shorten(text)}' is not a valid Content-Length", lineStart + 1, ct);
                length = long.Parse(value);
            }
            else if (name.Equals("Content-Type", StringComparison.OrdinalIgnoreCase))
            {
                charset = Charset(value);
            }
        }

        if (length is null) return await BrokenAsync("a message has no Content-Length header", _start, ct);
        if (length > maxBodyBytes)
            return await BrokenAsync($"a message of {length} bytes is over the limit of {maxBodyBytes} bytes; it was skipped", _start, ct);
        var body = await ReadBodyAsync((int)length, ct);
        if (body is null) return new Frame.EndOfInput();
        if (charset is not null && !charset.Equals("utf-8", StringComparison.OrdinalIgnoreCase) && !charset.Equals("utf8", StringComparison.OrdinalIgnoreCase))
            return new Frame.Broken($"a message declared charset '{charset}'; only utf-8 is supported, so it was skipped");
        return new Frame.Body(body.Value);
    }

    /// <summary>
    /// Puts bytes back in front of the input, to be read again: a body that was not JSON may have
    /// swallowed the next message when its Content-Length was too large.
    /// </summary>
    public void Unread(ReadOnlySpan<byte> bytes)
    {
        var remaining = _end - _start;
        var next = new byte[Math.Max(_buffer.Length, bytes.Length + remaining)];
        bytes.CopyTo(next);
        _buffer.AsSpan(_start, remaining).CopyTo(next.AsSpan(bytes.Length));
        _buffer = next;
        _start = 0;
        _end = bytes.Length + remaining;
    }

    /// <summary>Index of the next "Content-Length:" (any case) in <paramref name="bytes"/>, or -1.</summary>
    public static int IndexOfHeader(ReadOnlySpan<byte> bytes)
    {
        for (var i = 0; i + HeaderStart.Length <= bytes.Length; i++)
        {
            if (Ascii.EqualsIgnoreCase(bytes.Slice(i, HeaderStart.Length), HeaderStart)) return i;
        }

        return -1;
    }

    /// <summary>
    /// Skips to the next "Content-Length:" at or after <paramref name="from"/> (a position still in
    /// the buffer), then reports the problem. After a bad line, <paramref name="from"/> is one byte
    /// past its start, which finds a header that garbage on the same line ran into; after a bad
    /// header block, it is where the block ended, so a header right behind it is not missed.
    /// </summary>
    private async ValueTask<Frame> BrokenAsync(string reason, int from, CancellationToken ct)
    {
        _start = Math.Min(from, _end);
        while (true)
        {
            var found = IndexOfHeader(_buffer.AsSpan(_start, _end - _start));
            if (found >= 0)
            {
                _start += found;
                return new Frame.Broken(reason);
            }

            // Keep only a tail that could be the beginning of a header split across reads.
            _start = Math.Max(_start, _end - (HeaderStart.Length - 1));
            if (!await FillAsync(ct)) return new Frame.Broken(reason);
        }
    }

    /// <summary>The next line without its line end, and where it started in the buffer (valid until the next read).</summary>
    private async ValueTask<(string Text, bool TooLong, int Start)?> ReadLineAsync(CancellationToken ct)
    {
        var scanned = 0;
        while (true)
        {
            var newline = _buffer.AsSpan(_start + scanned, _end - _start - scanned).IndexOf((byte)'\n');
            if (newline >= 0)
            {
                var length = scanned + newline;
                if (length > MaxHeaderLine) return (string.Empty, true, _start);
                var bytes = _buffer.AsSpan(_start, length);
                if (bytes.Length > 0 && bytes[^1] == (byte)'\r') bytes = bytes[..^1];
                var text = Encoding.Latin1.GetString(bytes);
                var start = _start;
                _start += length + 1;
                return (text, false, start);
            }

            scanned = _end - _start;
            if (scanned > MaxHeaderLine) return (string.Empty, true, _start);
            if (!await FillAsync(ct)) return null;
        }
    }

    private async ValueTask<ReadOnlyMemory<byte>?> ReadBodyAsync(int length, CancellationToken ct)
    {
        // The body gets its own array (never reused: parsed JSON may point into it), grown as
        // bytes arrive so that a large declared length costs nothing until it is really sent.
        var body = new byte[Math.Min(length, 1 << 20)];
        var have = 0;
        while (have < length)
        {
            if (_start == _end && !await FillAsync(ct)) return null;
            var take = Math.Min(length - have, _end - _start);
            if (have + take > body.Length) Array.Resize(ref body, (int)Math.Min(length, Math.Max((long)body.Length * 2, have + take)));
            _buffer.AsSpan(_start, take).CopyTo(body.AsSpan(have));
            have += take;
            _start += take;
        }

        return body.AsMemory(0, length);
    }

    /// <summary>Reads more input into the buffer; false at end of input.</summary>
    private async ValueTask<bool> FillAsync(CancellationToken ct)
    {
        if (_eof) return false;
        if (_start > 0)
        {
            _buffer.AsSpan(_start, _end - _start).CopyTo(_buffer);
            _end -= _start;
            _start = 0;
        }

        if (_end == _buffer.Length) Array.Resize(ref _buffer, _buffer.Length * 2);
        var read = await input.ReadAsync(_buffer.AsMemory(_end), ct);
        if (read == 0)
        {
            _eof = true;
            return false;
        }

        _end += read;
        return true;
    }

    private static bool IsToken(ReadOnlySpan<char> name)
    {
        foreach (var c in name)
        {
            if (!char.IsAsciiLetterOrDigit(c) && c != '-' && c != '_') return false;
        }

        return true;
    }

    private static string? Charset(string contentType)
    {
        foreach (var part in contentType.Split(';'))
        {
            var p = part.Trim();
            if (p.StartsWith("charset=", StringComparison.OrdinalIgnoreCase)) return p["charset=".Length..].Trim('"', ' ');
        }

        return null;
    }

    private static string Shorten(string text) => text.Length <= 40 ? text : text[..40] + "…";
}
