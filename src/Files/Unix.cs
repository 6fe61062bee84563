using System.Runtime.InteropServices;

namespace MotorLang.Files;

/// <summary>
/// The few libc calls .NET does not expose: file type, link count, owner and identity of an open
/// file (statx, whose layout is the same on every Linux architecture), open without blocking on a
/// FIFO, chown of an open file, write permission, and fsync of a folder.
/// </summary>
internal static class Unix
{
    private const string Libc = "libc";
    public const int AtFdCwd = -100;
    public const int AtEmptyPath = 0x1000;
    public const int AtSymlinkNoFollow = 0x100;
    private const uint StatxBasicStats = 0x7ff;

    // Flags with the same value on x86-64 and arm64 Linux (O_NOFOLLOW and O_DIRECTORY differ, so they are not used).
    public const int ReadOnly = 0;
    public const int NonBlocking = 0x800;
    public const int CloseOnExec = 0x80000;

    public const int WriteOk = 2;
    public const int ENOENT = 2, EACCES = 13, ELOOP = 40, EEXIST = 17;

    [DllImport(Libc, EntryPoint = "statx", SetLastError = true)]
    private static extern int StatxNative(int dirfd, string path, int flags, uint mask, out StatxBuffer buffer);

    [DllImport(Libc, EntryPoint = "open", SetLastError = true)]
    public static extern int Open(string path, int flags);

    [DllImport(Libc, EntryPoint = "close", SetLastError = true)]
    public static extern int Close(int fd);

    [DllImport(Libc, EntryPoint = "fsync", SetLastError = true)]
    public static extern int Fsync(int fd);

    [DllImport(Libc, EntryPoint = "fchown", SetLastError = true)]
    public static extern int Fchown(int fd, uint uid, uint gid);

    [DllImport(Libc, EntryPoint = "access", SetLastError = true)]
    public static extern int Access(string path, int mode);

    [DllImport(Libc, EntryPoint = "realpath", SetLastError = true)]
    private static extern IntPtr RealPathNative(string path, IntPtr resolved);

    [DllImport(Libc, EntryPoint = "free")]
    private static extern void Free(IntPtr pointer);

    /// <summary>Type, identity, links, owner and size of a path (following symlinks unless told not to); null and the errno if it cannot be read.</summary>
    public static FileStatus? Stat(string path, bool followLinks, out int errno)
    {
        var rc = StatxNative(AtFdCwd, path, followLinks ? 0 : AtSymlinkNoFollow, StatxBasicStats, out var b);
        errno = rc == 0 ? 0 : Marshal.GetLastPInvokeError();
        return rc == 0 ? FileStatus.From(b) : null;
    }

    /// <summary>The same for an open file descriptor, so the answer is about the very file that was opened.</summary>
    public static FileStatus? Stat(int fd, out int errno)
    {
        var rc = StatxNative(fd, "", AtEmptyPath, StatxBasicStats, out var b);
        errno = rc == 0 ? 0 : Marshal.GetLastPInvokeError();
        return rc == 0 ? FileStatus.From(b) : null;
    }

    /// <summary>The absolute path with every symlink resolved, or null (dangling link, loop, missing).</summary>
    public static string? RealPath(string path)
    {
        var p = RealPathNative(path, IntPtr.Zero);
        if (p == IntPtr.Zero) return null;
        try
        {
            return Marshal.PtrToStringUTF8(p);
        }
        finally
        {
            Free(p);
        }
    }

    public static string Describe(int errno) => Marshal.GetPInvokeErrorMessage(errno);

    [StructLayout(LayoutKind.Explicit, Size = 256)]
    internal struct StatxBuffer
    {
        [FieldOffset(16)] public uint Nlink;
        [FieldOffset(20)] public uint Uid;
        [FieldOffset(24)] public uint Gid;
        [FieldOffset(28)] public ushort Mode;
        [FieldOffset(32)] public ulong Ino;
        [FieldOffset(40)] public ulong Size;
        [FieldOffset(136)] public uint DevMajor;
        [FieldOffset(140)] public uint DevMinor;
    }
}

/// <summary>What the file-system rules need to know about one file.</summary>
public readonly record struct FileStatus(FileKind Kind, uint Mode, uint Links, uint Uid, uint Gid, long Size, (ulong Dev, ulong Ino) Identity)
{
    internal static FileStatus From(Unix.StatxBuffer b) => new(
        KindOf(b.Mode), (uint)(b.Mode & 0xFFF), b.Nlink, b.Uid, b.Gid, (long)b.Size,
        (((ulong)b.DevMajor << 32) | b.DevMinor, b.Ino));

    private static FileKind KindOf(ushort mode) => (mode & 0xF000) switch
    {
        0x8000 => FileKind.Regular,
        0x4000 => FileKind.Directory,
        0xA000 => FileKind.Symlink,
        0x1000 => FileKind.Fifo,
        0x2000 => FileKind.CharacterDevice,
        0x6000 => FileKind.BlockDevice,
        0xC000 => FileKind.Socket,
        _ => FileKind.Other,
    };
}

public enum FileKind { Regular, Directory, Symlink, Fifo, CharacterDevice, BlockDevice, Socket, Other }

public static class FileKinds
{
    /// <summary>How a message names a file that is not a regular file.</summary>
    public static string Describe(FileKind kind) => kind switch
    {
        FileKind.Regular => "a regular file",
        FileKind.Directory => "a folder",
        FileKind.Symlink => "a symbolic link",
        FileKind.Fifo => "a named pipe (FIFO)",
        FileKind.CharacterDevice => "a character device",
        FileKind.BlockDevice => "a block device",
        FileKind.Socket => "a socket",
        _ => "not a regular file",
    };
}
