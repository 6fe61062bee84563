namespace MotorLang.Files.Tests;

/// <summary>How a plant is delimited on disk: the plant file's folder and below, nothing outside it.</summary>
public sealed class PlantFolderTests : TempFolder
{
    // The test of a plant file, as the callers pass it (the real one parses the project block).
    private static bool IsPlant(string text) => text.Contains("  plant\n", StringComparison.Ordinal);

    private const string PlantText = "project \"P\"\n  plant\n";

    [Fact]
    public void AFileBelongsToThePlantOfTheNearestFolderAboveIt()
    {
        Write("plant/z-swbd.motors", PlantText);
        Write("plant/a.motors", "feeder A 480V 3ph\n");
        var deep = Write("plant/mcc/b.motors", "feeder B 480V 3ph\n");
        var plant = PlantFolders.ForFile(deep, ".motors", IsPlant);
        Assert.NotNull(plant);
        // The plant file first, then the others in ordinal order of name.
        Assert.Equal(["z-swbd.motors", "a.motors", "mcc/b.motors"], plant.Members.Select(m => m.Name));
    }

    [Fact]
    public void AFileInNoPlantIsAlone()
    {
        var lone = Write("loose/a.motors", "feeder A 480V 3ph\n");
        Assert.Null(PlantFolders.ForFile(lone, ".motors", IsPlant));
    }

    [Fact]
    public void TheSearchUpwardStopsAtARepositorysTop()
    {
        Write("top/p.motors", PlantText);
        var below = Write("top/repo/inner/a.motors", "feeder A 480V 3ph\n");
        Assert.NotNull(PlantFolders.ForFile(below, ".motors", IsPlant));
        Directory.CreateDirectory(PathOf("top/repo/.git"));
        Assert.Null(PlantFolders.ForFile(below, ".motors", IsPlant));
    }

    [Fact]
    public void ANestedPlantKeepsItsOwnFiles()
    {
        Write("site/p.motors", PlantText);
        Write("site/a.motors", "feeder A 480V 3ph\n");
        Write("site/annex/q.motors", PlantText);
        Write("site/annex/b.motors", "feeder B 480V 3ph\n");
        var outer = PlantFolders.Load(PathOf("site"), ".motors", IsPlant);
        Assert.Equal(["p.motors", "a.motors"], outer.Members.Select(m => m.Name));
        var inner = PlantFolders.ForFile(PathOf("site/annex/b.motors"), ".motors", IsPlant)!;
        Assert.Equal(["q.motors", "b.motors"], inner.Members.Select(m => m.Name));
    }

    [Fact]
    public void ASymlinkLeavingThePlantsFolderIsLeftOutWithItsReason()
    {
        Write("plant/p.motors", PlantText);
        var outside = Write("elsewhere/secret.motors", "feeder S 480V 3ph\n");
        File.CreateSymbolicLink(PathOf("plant/link.motors"), outside);
        Directory.CreateSymbolicLink(PathOf("plant/linked-folder"), PathOf("elsewhere"));
        var plant = PlantFolders.Load(PathOf("plant"), ".motors", IsPlant);
        Assert.Equal(["p.motors"], plant.Members.Select(m => m.Name));
        Assert.Equal([PathOf("plant/link.motors"), PathOf("plant/linked-folder")], plant.LeftOut.Select(s => s.Path).Order(StringComparer.Ordinal));
        Assert.All(plant.LeftOut, s => Assert.Equal(PlantFolders.LeavesFolder, s.Reason));
    }

    [Fact]
    public void AFileThatCannotBeReadIsLeftOutNotFatal()
    {
        Write("plant/p.motors", PlantText);
        File.WriteAllBytes(PathOf("plant/bad.motors"), [0x66, 0xFF, 0xFE, 0x0A]);
        var plant = PlantFolders.Load(PathOf("plant"), ".motors", IsPlant);
        Assert.Equal(["p.motors"], plant.Members.Select(m => m.Name));
        Assert.Contains(plant.LeftOut, s => s.Path == PathOf("plant/bad.motors"));
    }

    [Fact]
    public void AMissingFileOfAPlantIsSimplyNotAMember()
    {
        Write("plant/p.motors", PlantText);
        var gone = Write("plant/gone.motors", "feeder G 480V 3ph\n");
        File.Delete(gone);
        Assert.Equal(["p.motors"], PlantFolders.Load(PathOf("plant"), ".motors", IsPlant).Members.Select(m => m.Name));
    }
}
