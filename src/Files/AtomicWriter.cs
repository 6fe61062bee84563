using System.Security.Cryptography;
using System.Text;
using Microsoft.Win32.SafeHandles;

namespace MotorLang.Files;

/// <summary>
/// Replaces a motor list's content so it is never half-written and keeps what the user set up:
/// <list type="bullet">
/// <item>A symlink is written through: its final target gets the new text and the link stays a link.</item>
/// <item>A file with more than one hard link, a read-only file (no owner write bit, or not writable
///   by us) and anything but a regular file are refused: replacing them would split the links or
///   override a protection the user chose.</item>
/// <item>The new text goes to a temporary file created exclusively (O_CREAT|O_EXCL, which also refuses a
///   planted symlink) under an unpredictable name in the target's folder, readable only by us until it
///   has the target's owner, group and mode; it is fsynced, then renamed over the target, and the
///   folder is fsynced. If the owner cannot be kept, nothing is written.</item>
/// <item>On any failure (a full disk included) the temporary file is removed and the target is untouched.</item>
/// </list>
/// </summary>
public static class AtomicWriter
{
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Names for the temporary file; tests replace it to plant files at the names it will try.</summary>
    internal static Func<string, string> TempName = target =>
        $".{Path.GetFileName(target)}.{Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(16))}.tmp";

    /// <summary>Runs after the new text is written to the temporary file; tests use it to fail there as a full disk would.</summary>
    internal static Action<string>? AfterTempWritten;

    internal const int Attempts = 8;

    public static void WriteText(string path, string text) => Write(path, Utf8.GetBytes(text));

    public static void Write(string path, ReadOnlySpan<byte> bytes) => Write(path, bytes, create: false);

    /// <summary>
    /// Writes an output file (a schedule, a workbook, a report) by the same rules, except that a file
    /// that does not exist yet is created (mode 0644: the owner writes, everyone reads, as a new file
    /// under the usual umask 022 would be).
    /// </summary>
    public static void WriteOutput(string path, ReadOnlySpan<byte> bytes) => Write(path, bytes, create: true);

    private static void Write(string path, ReadOnlySpan<byte> bytes, bool create)
    {
        var target = ResolveTarget(path);
        var status = create && !File.Exists(target) && !Directory.Exists(target) && new FileInfo(target).LinkTarget is null
            ? null
            : CheckWritable(path, target);
        var isNew = status is null && !File.Exists(target);
        var folder = Path.GetDirectoryName(target)!;
        var (temp, stream) = CreateTemp(path, folder, target);
        try
        {
            using (stream)
            {
                stream.Write(bytes);
                AfterTempWritten?.Invoke(temp);
                if (status is { } s) KeepOwnerAndMode(path, stream.SafeFileHandle, s);
                else if (isNew && !OperatingSystem.IsWindows())
                    File.SetUnixFileMode(stream.SafeFileHandle, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead | UnixFileMode.OtherRead);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temp, target, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or FileRefusedException)
        {
            TryDelete(temp);
            if (e is FileRefusedException) throw;
            throw new FileRefusedException($"cannot write '{path}': {e.Message}; the file is unchanged");
        }

        SyncFolder(folder);
    }

    /// <summary>The file that will really be replaced: the final target of a symlink chain, else the path itself.</summary>
    private static string ResolveTarget(string path)
    {
        var full = Path.GetFullPath(path);
        FileSystemInfo? link;
        try
        {
            link = new FileInfo(full).LinkTarget is null ? null : new FileInfo(full).ResolveLinkTarget(returnFinalTarget: true);
        }
        catch (IOException e)
        {
            throw new FileRefusedException($"cannot write '{path}': {e.Message}");
        }

        if (link is null) return full;
        if (!link.Exists) throw new FileRefusedException($"cannot write '{path}': it is a symlink to '{link.FullName}', which does not exist");
        return link.FullName;
    }

    /// <summary>Refuses what must not be replaced; returns the target's owner and mode to keep (null on Windows).</summary>
    private static FileStatus? CheckWritable(string path, string target)
    {
        if (OperatingSystem.IsWindows())
        {
            if (File.Exists(target) && (File.GetAttributes(target) & FileAttributes.ReadOnly) != 0)
                throw new FileRefusedException($"'{path}' is read-only; not written (clear its read-only attribute to allow it)");
            return null;
        }

        var status = Unix.Stat(target, followLinks: false, out var errno);
        if (status is null) throw new FileRefusedException($"cannot write '{path}': {Unix.Describe(errno)}");
        var s = status.Value;
        if (s.Kind != FileKind.Regular)
            throw new FileRefusedException($"'{path}' is {FileKinds.Describe(s.Kind)}, not a regular file; not written");
        if (s.Links > 1)
            throw new FileRefusedException($"'{path}' has {s.Links} hard links; replacing it would leave the other names with the old text, so it is not written (use --stdout, or break the link yourself)");
        if ((s.Mode & 0x80) == 0 || Unix.Access(target, Unix.WriteOk) != 0)
            throw new FileRefusedException($"'{path}' is read-only (mode {Convert.ToString(s.Mode, 8).PadLeft(4, '0')}); not written (make it writable to allow it)");
        return s;
    }

    /// <summary>Creates the temporary file exclusively; a name that exists (planted or not) is never opened, another is tried.</summary>
    private static (string Path, FileStream Stream) CreateTemp(string path, string folder, string target)
    {
        var options = new FileStreamOptions { Mode = FileMode.CreateNew, Access = FileAccess.Write, Share = FileShare.None };
        if (!OperatingSystem.IsWindows()) options.UnixCreateMode = UnixFileMode.UserRead | UnixFileMode.UserWrite;
        IOException? last = null;
        for (var attempt = 0; attempt < Attempts; attempt++)
        {
            var temp = Path.Combine(folder, TempName(target));
            try
            {
                return (temp, new FileStream(temp, options));
            }
            catch (IOException e) when (Exists(temp))
            {
                last = e;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw new FileRefusedException($"cannot write '{path}': cannot create a temporary file in '{folder}': {e.Message}; the file is unchanged");
            }
        }

        throw new FileRefusedException($"cannot write '{path}': {Attempts} temporary names in '{folder}' were already taken ({last?.Message}); the file is unchanged");
    }

    private static bool Exists(string path) => File.Exists(path) || Directory.Exists(path) || new FileInfo(path).LinkTarget is not null;

    private static void KeepOwnerAndMode(string path, SafeFileHandle handle, FileStatus target)
    {
        if (OperatingSystem.IsWindows()) return;
        var fd = (int)handle.DangerousGetHandle();
        var mine = Unix.Stat(fd, out _);
        if (mine is { } m && (m.Uid != target.Uid || m.Gid != target.Gid) && Unix.Fchown(fd, target.Uid, target.Gid) != 0)
        {
            var errno = System.Runtime.InteropServices.Marshal.GetLastPInvokeError();
            throw new FileRefusedException($"'{path}' belongs to user {target.Uid}, group {target.Gid}, and a replacement cannot keep that ({Unix.Describe(errno)}); not written");
        }

        // After chown, since chown clears set-user-ID and set-group-ID bits.
        File.SetUnixFileMode(handle, (UnixFileMode)target.Mode);
    }

    private static void SyncFolder(string folder)
    {
        if (OperatingSystem.IsWindows()) return;
        var fd = Unix.Open(folder, Unix.ReadOnly | Unix.CloseOnExec);
        if (fd < 0) return;
        Unix.Fsync(fd);
        Unix.Close(fd);
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Nothing more can be done; the target is untouched either way.
        }
    }
}
