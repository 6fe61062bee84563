using System.Text;
using Microsoft.Win32.SafeHandles;

namespace MotorLang.Files;

/// <summary>
/// Reads a motor list: only a regular file (checked on the opened file, after symlinks are resolved),
/// opened without blocking so a FIFO cannot hang the reader, read with the size limit enforced on the
/// bytes actually read (a device reports length 0), decoded as strict UTF-8 with a BOM kept as U+FEFF.
/// </summary>
public static class SafeReader
{
    /// <summary>The largest list we read; beyond it a file is refused, not half-read.</summary>
    public const long MaxBytes = 64L * 1024 * 1024;

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    public static string ReadText(string path) => ReadText(path, MaxBytes);

    internal static string ReadText(string path, long maxBytes)
    {
        var bytes = ReadBytes(path, maxBytes);
        try
        {
            return StrictUtf8.GetString(bytes);
        }
        catch (DecoderFallbackException e)
        {
            throw new FileRefusedException($"'{path}' is not UTF-8 text (bad byte at offset {e.Index}); save it as UTF-8");
        }
    }

    /// <summary>
    /// Reads a stream that is not a file (standard input) under the same rules: at most the size
    /// limit, strict UTF-8, BOM kept. <paramref name="name"/> is what messages call it.
    /// </summary>
    public static string ReadText(Stream stream, string name)
    {
        var bytes = new MemoryStream();
        var buffer = new byte[81920];
        int n;
        try
        {
            while ((n = stream.Read(buffer, 0, buffer.Length)) > 0)
            {
                if (bytes.Length + n > MaxBytes) throw TooLarge(name, MaxBytes);
                bytes.Write(buffer, 0, n);
            }
        }
        catch (IOException e)
        {
            throw new FileRefusedException($"cannot read '{name}': {e.Message}");
        }

        try
        {
            return StrictUtf8.GetString(bytes.GetBuffer(), 0, (int)bytes.Length);
        }
        catch (DecoderFallbackException e)
        {
            throw new FileRefusedException($"'{name}' is not UTF-8 text (bad byte at offset {e.Index}); save it as UTF-8");
        }
    }

    internal static byte[] ReadBytes(string path, long maxBytes)
    {
        using var handle = OpenRegular(path);
        return ReadBounded(path, handle, maxBytes);
    }

    /// <summary>Opens a path for reading only if it is a regular file; anything else is refused without reading a byte.</summary>
    private static SafeFileHandle OpenRegular(string path)
    {
        if (OperatingSystem.IsWindows()) return OpenRegularWindows(path);
        var fd = Unix.Open(path, Unix.ReadOnly | Unix.NonBlocking | Unix.CloseOnExec);
        if (fd < 0)
        {
            var errno = System.Runtime.InteropServices.Marshal.GetLastPInvokeError();
            throw new FileRefusedException(errno == Unix.ENOENT
                ? $"cannot read '{path}': no such file or folder"
                : $"cannot read '{path}': {Unix.Describe(errno)}");
        }

        var handle = new SafeFileHandle(fd, ownsHandle: true);
        var status = Unix.Stat(fd, out var statErrno);
        if (status is not { Kind: FileKind.Regular } s)
        {
            handle.Dispose();
            throw new FileRefusedException(status is null
                ? $"cannot read '{path}': {Unix.Describe(statErrno)}"
                : $"'{path}' is {FileKinds.Describe(status.Value.Kind)}, not a regular file; only regular files are read");
        }

        return handle;
    }

    private static SafeFileHandle OpenRegularWindows(string path)
    {
        try
        {
            var attributes = File.GetAttributes(path);
            if ((attributes & (FileAttributes.Directory | FileAttributes.Device)) != 0)
                throw new FileRefusedException($"'{path}' is not a regular file; only regular files are read");
            return File.OpenHandle(path, FileMode.Open, FileAccess.Read, FileShare.Read);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new FileRefusedException($"cannot read '{path}': {e.Message}");
        }
    }

    /// <summary>Reads to the end but never more than the limit plus one byte, whatever length the file reports.</summary>
    private static byte[] ReadBounded(string path, SafeFileHandle handle, long maxBytes)
    {
        long reported;
        try
        {
            reported = RandomAccess.GetLength(handle);
        }
        catch (IOException)
        {
            reported = 0;
        }

        var buffer = new byte[(int)Math.Min(Math.Max(reported + 1, 4096), maxBytes + 1)];
        var total = 0;
        try
        {
            while (true)
            {
                if (total == buffer.Length)
                {
                    if (total > maxBytes) throw TooLarge(path, maxBytes);
                    Array.Resize(ref buffer, (int)Math.Min((long)buffer.Length * 2, maxBytes + 1));
                }

                var n = RandomAccess.Read(handle, buffer.AsSpan(total), total);
                if (n == 0) break;
                total += n;
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new FileRefusedException($"cannot read '{path}': {e.Message}");
        }

        if (total > maxBytes) throw TooLarge(path, maxBytes);
        Array.Resize(ref buffer, total);
        return buffer;
    }

    private static FileRefusedException TooLarge(string path, long maxBytes) =>
        new($"'{path}' is over {FormatSize(maxBytes)}; motor lists over {FormatSize(maxBytes)} are not read");

    private static string FormatSize(long bytes) => bytes % (1024 * 1024) == 0 ? $"{bytes / (1024 * 1024)} MB" : $"{bytes} bytes";
}
