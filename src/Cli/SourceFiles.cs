using System.Text;

namespace MotorLang.Cli;

/// <summary>Finds, reads and writes motor-list files: strict UTF-8, a size limit, atomic replacement.</summary>
public static class SourceFiles
{
    public const string Extension = ".motors";

    /// <summary>50 MB is the largest list we promise to handle; beyond this a file is refused, not half-read.</summary>
    public const long MaxBytes = 64L * 1024 * 1024;

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Expands folders to the motor lists below them, in a stable order.</summary>
    public static IReadOnlyList<string> Expand(IEnumerable<string> paths)
    {
        var files = new List<string>();
        foreach (var path in paths)
        {
            if (Directory.Exists(path))
            {
                var found = Directory.EnumerateFiles(path, "*" + Extension, SearchOption.AllDirectories)
                    .Order(StringComparer.Ordinal).ToList();
                if (found.Count == 0) throw new CliException($"'{path}' is a folder with no {Extension} files in it");
                files.AddRange(found);
            }
            else if (File.Exists(path))
            {
                files.Add(path);
            }
            else
            {
                throw new CliException($"cannot read '{path}': no such file or folder");
            }
        }

        return files;
    }

    /// <summary>Reads a file as UTF-8 text, keeping a BOM as U+FEFF so the text prints back byte for byte.</summary>
    public static string Read(string path)
    {
        try
        {
            var info = new FileInfo(path);
            if (info.Length > MaxBytes)
                throw new CliException($"'{path}' is {info.Length / (1024 * 1024)} MB; motor lists over {MaxBytes / (1024 * 1024)} MB are not read");
            var bytes = File.ReadAllBytes(path);
            return StrictUtf8.GetString(bytes);
        }
        catch (DecoderFallbackException e)
        {
            throw new CliException($"'{path}' is not UTF-8 text (bad byte at offset {e.Index}); save it as UTF-8");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new CliException($"cannot read '{path}': {e.Message}");
        }
    }

    /// <summary>Writes through a temporary file in the same folder and renames it over the target, so a file is never half-written.</summary>
    public static void WriteAtomically(string path, string text)
    {
        var full = Path.GetFullPath(path);
        var temp = Path.Combine(Path.GetDirectoryName(full)!, $".{Path.GetFileName(full)}.{Environment.ProcessId}.tmp");
        try
        {
            File.WriteAllBytes(temp, StrictUtf8.GetBytes(text));
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            File.Delete(temp);
            throw new CliException($"cannot write '{path}': {e.Message}");
        }
    }
}
