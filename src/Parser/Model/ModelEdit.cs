namespace MotorLang.Parser.Model;

/// <summary>
/// What re-reading edited lines changed in the model since <see cref="Before"/>: some feeders were
/// replaced by copies (with their motors and loads), some of whose blocks hold re-read statements.
/// Everything else in the new model is the very same objects as in <see cref="Before"/>, so
/// analysis can keep their results. One re-read line gives one such edit; edits made one after
/// another without analysing in between are chained (<see cref="Then"/>) into one, so analysis
/// runs once for the latest version and sizes again the union of what each edit reached.
/// </summary>
public sealed class ModelEdit
{
    internal ModelEdit(MotorList before, int line, FeederNode oldFeeder, FeederNode newFeeder, BlockNode edited,
        IReadOnlyDictionary<CircuitNode, CircuitNode> copies)
        : this(before, [line], new Dictionary<FeederNode, FeederNode> { [oldFeeder] = newFeeder }, new HashSet<BlockNode> { edited }, copies)
    {
    }

    private ModelEdit(MotorList before, IReadOnlyList<int> lines, IReadOnlyDictionary<FeederNode, FeederNode> feeders,
        IReadOnlySet<BlockNode> edited, IReadOnlyDictionary<CircuitNode, CircuitNode> copies)
    {
        Before = before;
        Lines = lines;
        Feeders = feeders;
        Edited = edited;
        Copies = copies;
    }

    /// <summary>The model the edits were made to.</summary>
    public MotorList Before { get; }

    /// <summary>The re-read lines (zero-based, ascending, each once); no other line changed, and none moved.</summary>
    public IReadOnlyList<int> Lines { get; }

    /// <summary>Each replaced feeder of <see cref="Before"/> with its copy in the new model.</summary>
    public IReadOnlyDictionary<FeederNode, FeederNode> Feeders { get; }

    /// <summary>The blocks (in the new model) whose header or a statement was re-read.</summary>
    public IReadOnlySet<BlockNode> Edited { get; }

    /// <summary>Each node of the replaced feeders (the feeders included) with its copy in the new model.</summary>
    public IReadOnlyDictionary<CircuitNode, CircuitNode> Copies { get; }

    /// <summary>The feeder replaced when only one was (a one-line edit).</summary>
    public FeederNode OldFeeder => Feeders.Single().Key;

    /// <summary>Its copy in the new model.</summary>
    public FeederNode NewFeeder => Feeders.Single().Value;

    /// <summary>
    /// This edit followed by <paramref name="later"/>, made to the model this edit produced: one
    /// edit from <see cref="Before"/> to the model <paramref name="later"/> produced. A later edit
    /// of null (a comment or blank line re-read, which keeps the model) leaves this one as it is.
    /// </summary>
    public ModelEdit Then(ModelEdit? later)
    {
        if (later is null) return this;
        CircuitNode Final(CircuitNode node) => later.Copies.TryGetValue(node, out var copy) ? copy : node;

        var copies = new Dictionary<CircuitNode, CircuitNode>(Copies.Count + later.Copies.Count);
        var copied = new HashSet<CircuitNode>(Copies.Values);
        foreach (var (original, copy) in Copies) copies[original] = Final(copy);
        // Nodes the later edit copied that this one had not: they are nodes of Before as well.
        foreach (var (original, copy) in later.Copies)
        {
            if (!copied.Contains(original)) copies[original] = copy;
        }

        var feeders = new Dictionary<FeederNode, FeederNode>(Feeders.Count + later.Feeders.Count);
        var replaced = new HashSet<FeederNode>(Feeders.Values);
        foreach (var (original, copy) in Feeders) feeders[original] = (FeederNode)Final(copy);
        foreach (var (original, copy) in later.Feeders)
        {
            if (!replaced.Contains(original)) feeders[original] = copy;
        }

        var edited = new HashSet<BlockNode>(later.Edited);
        foreach (var block in Edited) edited.Add(block is CircuitNode c ? Final(c) : block);
        var lines = Lines.Union(later.Lines).Order().ToArray();
        return new ModelEdit(Before, lines, feeders, edited, copies);
    }
}
