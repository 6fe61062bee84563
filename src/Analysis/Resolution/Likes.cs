using MotorLang.Parser.Model;

namespace MotorLang.Analysis.Resolution;

/// <summary>Attributes of a motor, looked up on the motor and then along its chain of 'like' references.</summary>
public static class Likes
{
    /// <summary>The motor, then the motor it is like, and so on; stops at a cycle or an unknown tag.</summary>
    public static IEnumerable<MotorNode> Chain(MotorNode motor, MotorList model)
    {
        if (motor.Like is null) return [motor];
        return Walk(motor, model);
    }

    private static IEnumerable<MotorNode> Walk(MotorNode motor, MotorList model)
    {
        var seen = new HashSet<MotorNode>();
        for (MotorNode? m = motor; m is not null && seen.Add(m); m = m.Like is { } l ? model.Find(l.Value) as MotorNode : null)
        {
            yield return m;
        }
    }

    /// <summary>The first value found along the chain, with the motor it was written on.</summary>
    public static (Located<T> Value, MotorNode Owner)? Get<T>(MotorNode motor, MotorList model, Func<MotorNode, Located<T>?> get)
    {
        if (motor.Like is null) return get(motor) is { } own ? (own, motor) : null;
        foreach (var m in Chain(motor, model))
        {
            if (get(m) is { } v) return (v, m);
        }

        return null;
    }

    public static bool Has(MotorNode motor, MotorList model, Func<MotorNode, bool> has) => motor.Like is null ? has(motor) : Chain(motor, model).Any(has);
}
