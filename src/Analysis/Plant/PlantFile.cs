namespace MotorLang.Analysis.Plant;

/// <summary>
/// One motor list of a plant: its name (the path relative to the plant's folder, with '/') and its
/// text. Analysis never reads files; the caller (src/Files through the CLI or the server) does.
/// </summary>
public sealed record PlantFile(string Name, string Text);

/// <summary>A file under the plant's folder that is not part of the plant, and why (a symlink leaving the folder, unreadable).</summary>
public sealed record PlantLeftOut(string Name, string Reason);

/// <summary>A text edit in one file of a plant.</summary>
public sealed record PlantEdit(string File, MotorLang.Parser.Text.TextEdit Edit);

/// <summary>
/// A finding of a plant analysis in the file it concerns. Its range, its related locations and its
/// fix's edits are in that file's own lines and columns; <see cref="RelatedFiles"/> and
/// <see cref="FixFiles"/> name the file of each related location and each edit (a value inherited
/// through 'like' can sit in another file).
/// </summary>
public sealed record PlantFinding(string File, Findings.Finding Finding, System.Collections.Immutable.ImmutableArray<string> RelatedFiles,
    System.Collections.Immutable.ImmutableArray<string> FixFiles);
