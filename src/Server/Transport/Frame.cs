namespace MotorLang.Server.Transport;

/// <summary>What <see cref="FrameReader"/> found next on the input.</summary>
internal abstract record Frame
{
    /// <summary>A whole message body, exactly as many bytes as its Content-Length said.</summary>
    public sealed record Body(ReadOnlyMemory<byte> Bytes) : Frame;

    /// <summary>
    /// Bytes that were not a well-formed message (bad or missing header, a body over the limit, an
    /// unsupported charset). The reader has already skipped to the next "Content-Length:" header.
    /// </summary>
    public sealed record Broken(string Reason) : Frame;

    /// <summary>The client closed its end of the input.</summary>
    public sealed record EndOfInput : Frame;
}
