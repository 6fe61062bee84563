using System.Formats.Tar;

namespace MotorLang.Files;

/// <summary>
/// A private folder for a tree read from elsewhere (a git revision), removed when disposed. It is
/// created mode 0700 under the system's temporary folder with an unpredictable name, and a tar
/// archive is unpacked into it only inside it (an entry or a link leading out is refused by the
/// extractor, and reported as a <see cref="FileRefusedException"/>).
/// </summary>
public sealed class TempFolder : IDisposable
{
    private TempFolder(string path) => Path = path;

    public string Path { get; }

    public static TempFolder Create(string prefix) => new(Directory.CreateTempSubdirectory(prefix).FullName);

    /// <summary>Unpacks a tar archive into the folder.</summary>
    public void ExtractTar(Stream archive)
    {
        try
        {
            TarFile.ExtractToDirectory(archive, Path, overwriteFiles: false);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InvalidDataException or FormatException)
        {
            throw new FileRefusedException($"cannot unpack the revision: {e.Message}");
        }
    }

    public void Dispose()
    {
        try
        {
            // Symlinks are removed, never followed.
            Directory.Delete(Path, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Left in the temporary folder: nothing else depends on it.
        }
    }
}
