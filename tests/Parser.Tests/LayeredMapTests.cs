using CsCheck;
using MotorLang.Parser.Collections;

namespace MotorLang.Parser.Tests;

/// <summary>A layered map behaves as a plain dictionary through any sequence of versions, and older versions never change.</summary>
public class LayeredMapTests
{
    [Fact]
    public void VersionsMatchADictionaryAndStayAsTheyWere() =>
        Gen.Select(Gen.Int[0, 400], Gen.Int[0, 60], Gen.Int[0, 30]).Array[1, 40].Sample(steps =>
        {
            var model = new Dictionary<int, int>();
            var map = LayeredMap<int, int>.Empty();
            var history = new List<(LayeredMap<int, int> Map, Dictionary<int, int> Expected)>();
            foreach (var (seed, sets, removes) in steps)
            {
                var builder = map.ToBuilder();
                var random = new Random(seed);
                for (var i = 0; i < sets; i++)
                {
                    var key = random.Next(600);
                    builder[key] = model[key] = random.Next();
                }

                for (var i = 0; i < removes; i++)
                {
                    var key = random.Next(600);
                    Assert.Equal(model.Remove(key, out var expected), builder.Remove(key, out var removed));
                    if (model.ContainsKey(key) is false) Assert.Equal(expected, removed);
                }

                Assert.Equal(model.Count, builder.Count);
                map = builder.ToMap();
                history.Add((map, new Dictionary<int, int>(model)));
            }

            foreach (var (version, expected) in history)
            {
                Assert.Equal(expected.Count, version.Count);
                Assert.Equal(expected.OrderBy(kv => kv.Key), version.OrderBy(kv => kv.Key));
                foreach (var key in Enumerable.Range(0, 600))
                    Assert.Equal(expected.TryGetValue(key, out var v) ? v : (int?)null, version.TryGetValue(key, out var w) ? w : null);
            }
        }, iter: 200);

    [Fact]
    public void OverUsesTheDictionaryAsItsBase()
    {
        var entries = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase) { ["P-1"] = 1 };
        var map = LayeredMap<string, int>.Over(entries);
        Assert.Equal(1, map["p-1"]);
        var next = map.ToBuilder();
        next["P-2"] = 2;
        Assert.True(next.ToMap().ContainsKey("p-2"));
        Assert.False(map.ContainsKey("P-2"));
    }
}
