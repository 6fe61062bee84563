namespace MotorLang.Analysis.Plant;

/// <summary>Stable codes of the plant's structure (docs/format.md, Diagnostics). Never renumber.</summary>
public static class PlantCodes
{
    /// <summary>On the first use of a tag that a later file of the plant uses again (that one gets P013).</summary>
    public const string TagUsedInAnotherFile = "P030";

    /// <summary>On the 'plant' statement: a file under the plant's folder that is not part of the plant, and why.</summary>
    public const string FileLeftOut = "P031";
}
