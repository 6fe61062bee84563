using MotorLang.Analysis;
using MotorLang.Analysis.Plant;
using MotorLang.Files;

namespace MotorLang.Cli;

/// <summary>
/// The two sides of `motorlang diff` when they are plants. A side is a path on disk, or a git
/// revision: REV:PATH (PATH as git reads it, from the repository's top unless it starts with ./ or
/// ../), or a bare REV, meaning the other side's plant folder at that revision. A revision's motor
/// lists are unpacked into a private temporary folder (src/Files TempFolder), with a `.git` entry
/// at its top, so that the plant is delimited there by exactly the rules of the work tree
/// (src/Files PlantFolders).
/// </summary>
internal sealed class PlantDiffInputs : IDisposable
{
    private readonly List<TempFolder> _temps = [];
    private readonly Dictionary<string, string> _revisions = new(StringComparer.Ordinal);
    private readonly string _repository;

    /// <param name="repository">A folder in the repository whose revisions are read (the current folder for `diff`).</param>
    public PlantDiffInputs(string repository = ".") => _repository = repository;

    public void Dispose()
    {
        foreach (var t in _temps) t.Dispose();
    }

    /// <summary>Where a side's path is on disk (a revision's, in its unpacked copy) and the top of its tree; null when the spec names neither a path nor REV:PATH.</summary>
    public (string Path, string? Top)? Local(string spec)
    {
        if (File.Exists(spec) || Directory.Exists(spec)) return (Path.GetFullPath(spec), TopOf(Path.GetFullPath(spec)));
        var colon = spec.IndexOf(':');
        if (colon <= 0) return null;
        var top = Unpack(spec[..colon]);
        var path = spec[(colon + 1)..];
        if (path.StartsWith("./", StringComparison.Ordinal) || path.StartsWith("../", StringComparison.Ordinal) || path is "." or "..")
            path = Path.Combine(Git.Text(".", "rev-parse", "--show-prefix"), path);
        var full = Path.GetFullPath(Path.Combine(top, path));
        if (!Inside(full, top)) throw new CliException($"'{spec}' leads out of the repository");
        return (full, top);
    }

    /// <summary>The plant folder of a local path: a file's plant (when it is one of its files), or the plant a folder is in or holds; null for neither.</summary>
    public static string? PlantRoot(string path)
    {
        var source = new DiskSource(PlantMarker.IsPlantFile);
        if (Directory.Exists(path))
            return PlantFolders.RootFor(Path.Combine(path, "*" + SourceFiles.Extension), SourceFiles.Extension, source);
        if (PlantFolders.RootFor(path, SourceFiles.Extension, source) is not { } root) return null;
        return PlantFolders.Load(root, SourceFiles.Extension, source).Members.Any(m => Path.GetFullPath(m.Path) == path) ? root : null;
    }

    /// <summary>The old side's plant folder: its own plant when it names one, else the folder at the new plant's place (a bare revision), which may hold no plant yet.</summary>
    public string OldRoot(string spec, string newRoot, string? newTop)
    {
        if (Local(spec) is { } local) return PlantRoot(local.Path) ?? (Directory.Exists(local.Path) ? local.Path : Path.GetDirectoryName(local.Path)!);
        if (newTop is null) throw new CliException($"cannot read '{spec}' as a revision: the new plant is not in a git repository");
        var relative = Path.GetRelativePath(newTop, newRoot);
        var top = Unpack(spec);
        var folder = Path.GetFullPath(Path.Combine(top, relative));
        return PlantRoot(folder) ?? folder;
    }

    /// <summary>A plant's analysis; a folder that does not exist (the plant is new) is a plant of no files.</summary>
    public static (PlantAnalysis Analysis, int Files) Analyze(string root)
    {
        if (!Directory.Exists(root)) return (PlantAnalyzer.Analyze([]), 0);
        var plant = PlantFolders.Load(root, SourceFiles.Extension, PlantMarker.IsPlantFile);
        return (PlantInputs.Analyze(plant), plant.Members.Count);
    }

    /// <summary>The motor lists of a revision unpacked into a temporary folder (once per revision); returns the folder, which stands for the repository's top.</summary>
    private string Unpack(string revision)
    {
        if (_revisions.TryGetValue(revision, out var known)) return known;
        var repository = Git.Text(_repository, "rev-parse", "--show-toplevel");
        var temp = TempFolder.Create("motorlang-revision-");
        _temps.Add(temp);
        // The top of the copy stops the upward search for a plant file, as the repository's does.
        Directory.CreateDirectory(Path.Combine(temp.Path, ".git"));
        var (code, archive, error) = Git.Run(repository, "archive", "--format=tar", revision, "--", ":(glob)**/*" + SourceFiles.Extension);
        if (code == -1) throw new CliException("git is not installed, so revisions cannot be read");
        if (code != 0 && !error.Contains("did not match", StringComparison.Ordinal))
            throw new CliException($"git cannot read revision '{revision}': {error}");
        if (code == 0)
        {
            try
            {
                temp.ExtractTar(new MemoryStream(archive));
            }
            catch (FileRefusedException e)
            {
                throw new CliException(e.Message);
            }
        }

        _revisions[revision] = temp.Path;
        return temp.Path;
    }

    private static string? TopOf(string path)
    {
        var folder = Directory.Exists(path) ? path : Path.GetDirectoryName(path)!;
        var (code, output, _) = Git.Run(folder, "rev-parse", "--show-toplevel");
        return code == 0 ? System.Text.Encoding.UTF8.GetString(output).Trim() : null;
    }

    private static bool Inside(string path, string root) =>
        path == root || path.StartsWith(root.EndsWith(Path.DirectorySeparatorChar) ? root : root + Path.DirectorySeparatorChar, StringComparison.Ordinal);
}
