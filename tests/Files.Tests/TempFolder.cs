namespace MotorLang.Files.Tests;

/// <summary>A fresh folder per test, removed afterwards (symlinks are removed, never followed).</summary>
public abstract class TempFolder : IDisposable
{
    protected string Dir { get; } = Directory.CreateTempSubdirectory("motorlang-files-").FullName;

    protected string PathOf(string name) => Path.Combine(Dir, name);

    protected string Write(string name, string text)
    {
        var path = PathOf(name);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
        return path;
    }

    public virtual void Dispose()
    {
        foreach (var f in Directory.GetFiles(Dir, "*", SearchOption.TopDirectoryOnly)) File.SetAttributes(f, FileAttributes.Normal);
        Directory.Delete(Dir, recursive: true);
        GC.SuppressFinalize(this);
    }
}
