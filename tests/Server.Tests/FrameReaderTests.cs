using System.Text;
using MotorLang.Server.Transport;

namespace MotorLang.Server.Tests;

/// <summary>The framing layer reads the same frames however the input is split into reads.</summary>
public class FrameReaderTests
{
    private static byte[] Framed(string body) => Encoding.UTF8.GetBytes($"Content-Length: {Encoding.UTF8.GetByteCount(body)}\r\n\r\n{body}");

    // Valid frames between malformed ones; each malformed piece gives one Broken, then the next frame is read.
    private static readonly byte[] Input =
    [
        .. Framed("{\"a\":1}"),
        .. "garbage\r\n"u8.ToArray(),
        .. Framed("{\"b\":\"é\"}"),
        .. "Content-Length: 99999999999\r\n\r\n"u8.ToArray(),
        .. Framed("{\"c\":3}"),
        .. "Content-Length: x\r\n\r\n"u8.ToArray(),
        .. "\r\n"u8.ToArray(),
        .. Framed("{\"d\":4}"),
    ];

    private static readonly string[] Expected = ["{\"a\":1}", "broken", "{\"b\":\"é\"}", "broken", "{\"c\":3}", "broken", "{\"d\":4}", "end"];

    [Fact]
    public async Task EverySplitOfTheInputReadsTheSameFrames()
    {
        var random = new Random(20261202); // seeded: the same 300 splits every run
        for (var run = 0; run < 300; run++)
        {
            var maxChunk = run == 0 ? 1 : random.Next(1, 64);
            var reader = new FrameReader(new ChunkedStream(Input, random, maxChunk));
            var got = new List<string>();
            while (got.LastOrDefault() != "end")
            {
                got.Add(await reader.ReadAsync(CancellationToken.None) switch
                {
                    Frame.Body b => Encoding.UTF8.GetString(b.Bytes.Span),
                    Frame.Broken => "broken",
                    _ => "end",
                });
            }

            Assert.Equal(Expected, got);
        }
    }

    [Fact]
    public async Task AHugeDeclaredLengthIsRefusedWithoutWaitingForItsBytes()
    {
        // 1 GB declared, then a real frame, then the input stays open: the frame must be read at once.
        var input = new MemoryStream([.. "Content-Length: 1073741824\r\n\r\n"u8.ToArray(), .. Framed("{}")]);
        var reader = new FrameReader(input);
        Assert.IsType<Frame.Broken>(await reader.ReadAsync(CancellationToken.None));
        Assert.Equal("{}", Encoding.UTF8.GetString(Assert.IsType<Frame.Body>(await reader.ReadAsync(CancellationToken.None)).Bytes.Span));
    }

    /// <summary>Hands out its bytes in reads of random size, at most <paramref name="maxChunk"/>.</summary>
    private sealed class ChunkedStream(byte[] data, Random random, int maxChunk) : Stream
    {
        private int _position;

        public override int Read(byte[] buffer, int offset, int count)
        {
            var n = Math.Min(Math.Min(count, random.Next(1, maxChunk + 1)), data.Length - _position);
            Array.Copy(data, _position, buffer, offset, n);
            _position += n;
            return n;
        }

        public override bool CanRead => true;
        public override bool CanSeek => false;
        public override bool CanWrite => false;
        public override long Length => data.Length;
        public override long Position { get => _position; set => throw new NotSupportedException(); }
        public override void Flush() { }
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    }
}
