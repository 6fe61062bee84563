using MotorLang.Files;

namespace MotorLang.Cli;

/// <summary>The command line's view of the shared file rules (MotorLang.Files): a refused file ends the run with exit 2.</summary>
public static class SourceFiles
{
    public const string Extension = ".motors";

    /// <summary>
    /// Expands folders to the motor lists below them: each real file once, in ordinal order. Entries a
    /// folder search passes over (FIFOs, devices, dangling links, unreadable folders) are named on
    /// stderr and the run goes on; a path named on the command line is read as given, so a FIFO or a
    /// device named there is refused with exit 2.
    /// </summary>
    public static IReadOnlyList<string> Expand(IEnumerable<string> paths, TextWriter? stderr = null)
    {
        var files = new List<string>();
        foreach (var path in paths)
        {
            var status = FileSearch.Status(path);
            if (status is null && !File.Exists(path) && !Directory.Exists(path) && new FileInfo(path).LinkTarget is null)
                throw new CliException($"cannot read '{path}': no such file or folder");
            if (status is { Kind: FileKind.Directory })
            {
                var found = FileSearch.Find(path, Extension, stayInside: false);
                foreach (var s in found.Skipped) stderr?.WriteLine($"motorlang: skipped '{s.Path}': {s.Reason}");
                if (found.Files.Count == 0) throw new CliException($"'{path}' is a folder with no {Extension} files in it");
                files.AddRange(found.Files);
            }
            else
            {
                files.Add(path);
            }
        }

        return files;
    }

    /// <summary>Reads a motor list (regular files only, at most 64 MB, strict UTF-8, BOM kept as U+FEFF).</summary>
    public static string Read(string path)
    {
        try
        {
            return SafeReader.ReadText(path);
        }
        catch (FileRefusedException e)
        {
            throw new CliException(e.Message);
        }
    }

    /// <summary>Replaces a motor list's text atomically, keeping its owner, mode and links (see AtomicWriter).</summary>
    public static void WriteAtomically(string path, string text)
    {
        try
        {
            AtomicWriter.WriteText(path, text);
        }
        catch (FileRefusedException e)
        {
            throw new CliException(e.Message);
        }
    }

    /// <summary>Writes an output file (a schedule, a workbook) atomically; a refusal is a message and exit 2.</summary>
    public static void WriteOutput(string path, byte[] bytes)
    {
        try
        {
            AtomicWriter.WriteOutput(path, bytes);
        }
        catch (FileRefusedException e)
        {
            throw new CliException(e.Message);
        }
    }
}
