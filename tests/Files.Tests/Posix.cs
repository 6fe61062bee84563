using System.Runtime.InteropServices;

namespace MotorLang.Files.Tests;

/// <summary>libc calls the tests use to build special files: FIFOs, hard links, other owners.</summary>
internal static class Posix
{
    [DllImport("libc", EntryPoint = "mkfifo", SetLastError = true)]
    private static extern int MkfifoNative(string path, uint mode);

    [DllImport("libc", EntryPoint = "link", SetLastError = true)]
    private static extern int LinkNative(string existing, string created);

    [DllImport("libc", EntryPoint = "chown", SetLastError = true)]
    private static extern int ChownNative(string path, uint uid, uint gid);

    [DllImport("libc", EntryPoint = "geteuid")]
    public static extern uint Geteuid();

    public static void Mkfifo(string path) => Check(MkfifoNative(path, 0x1B6), "mkfifo");

    public static void Link(string existing, string created) => Check(LinkNative(existing, created), "link");

    public static void Chown(string path, uint uid, uint gid) => Check(ChownNative(path, uid, gid), "chown");

    public static FileStatus Stat(string path) => Unix.Stat(path, followLinks: false, out _) ?? throw new IOException($"cannot stat {path}");

    private static void Check(int rc, string what)
    {
        if (rc != 0) throw new IOException($"{what}: {Marshal.GetPInvokeErrorMessage(Marshal.GetLastPInvokeError())}");
    }
}
