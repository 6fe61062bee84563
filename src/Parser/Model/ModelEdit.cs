namespace MotorLang.Parser.Model;

/// <summary>
/// What re-reading one edited line changed in the model: one feeder was replaced by a copy (with
/// its motors and loads), one of whose blocks holds the re-read statement. Everything else in the
/// new model is the very same objects as in <see cref="Before"/>, so analysis can keep their results.
/// </summary>
public sealed class ModelEdit(MotorList before, int line, FeederNode oldFeeder, FeederNode newFeeder, BlockNode edited,
    IReadOnlyDictionary<CircuitNode, CircuitNode> copies)
{
    /// <summary>The model the edit was made to.</summary>
    public MotorList Before { get; } = before;

    /// <summary>The re-read line (zero-based); no other line changed, and none moved.</summary>
    public int Line { get; } = line;

    public FeederNode OldFeeder { get; } = oldFeeder;

    public FeederNode NewFeeder { get; } = newFeeder;

    /// <summary>The block (in the new model) whose header or statement was re-read.</summary>
    public BlockNode Edited { get; } = edited;

    /// <summary>Each node of the old feeder (the feeder included) with its copy in the new model.</summary>
    public IReadOnlyDictionary<CircuitNode, CircuitNode> Copies { get; } = copies;
}
