namespace MotorLang.Parser.Model;

/// <summary>The typed model of one document: the project block and the feeders with their motors and loads.</summary>
public sealed class MotorList
{
    private readonly Dictionary<string, CircuitNode> _byTag;

    internal MotorList(ProjectNode? project, IReadOnlyList<FeederNode> feeders, Dictionary<string, CircuitNode> byTag)
    {
        Project = project;
        Feeders = feeders;
        _byTag = byTag;
        foreach (var f in feeders) f.Model = this;
    }

    public ProjectNode? Project { get; }

    public IReadOnlyList<FeederNode> Feeders { get; }

    public IEnumerable<MotorNode> Motors => Feeders.SelectMany(f => f.Motors);

    public IEnumerable<LoadNode> Loads => Feeders.SelectMany(f => f.Loads);

    /// <summary>Finds a feeder, motor or load by tag; tags compare without regard to case.</summary>
    public CircuitNode? Find(string tag) => _byTag.GetValueOrDefault(tag);
}
