namespace MotorLang.Files;

/// <summary>
/// Where <see cref="PlantFolders"/> takes the text of a motor list and whether it is a plant file.
/// The command line reads the disk (<see cref="DiskSource"/>); the language server puts its open
/// buffers in front of the disk, so that both delimit and read a plant by the same walk.
/// </summary>
public interface IListSource
{
    /// <summary>The text of the list at <paramref name="path"/>; throws <see cref="FileRefusedException"/> when it cannot be read.</summary>
    string Read(string path);

    /// <summary>Whether the list at <paramref name="path"/> is a plant file; false when it cannot be read.</summary>
    bool IsPlantFile(string path);
}

/// <summary>The disk, read by <see cref="SafeReader"/>'s rules, with the caller's test for a plant file on the text.</summary>
public sealed class DiskSource(Func<string, bool> isPlantFile) : IListSource
{
    public string Read(string path) => SafeReader.ReadText(path);

    public bool IsPlantFile(string path)
    {
        try
        {
            return isPlantFile(SafeReader.ReadText(path));
        }
        catch (FileRefusedException)
        {
            return false;
        }
    }
}
