using MotorLang.Server.Features;

namespace MotorLang.Server.Tests;

/// <summary>The idle trim runs once activity stops, and not while it goes on.</summary>
public class MemoryTrimmerTests
{
    [Fact]
    public async Task TrimsAfterAQuietSpellAndActivityPostponesIt()
    {
        // The quiet spell is long against the gaps between touches, so a slow test machine cannot
        // make a gap look like a quiet spell.
        var trimmed = new TaskCompletionSource<(string Message, DateTime At)>(TaskCreationOptions.RunContinuationsAsynchronously);
        using var trimmer = new MemoryTrimmer(TimeSpan.FromSeconds(1.5), slackBytes: 0, m => trimmed.TrySetResult((m, DateTime.UtcNow)));
        trimmer.Touch();
        for (var i = 0; i < 5; i++)
        {
            await Task.Delay(50);
            trimmer.Touch();
        }

        var lastTouch = DateTime.UtcNow;
        var (message, at) = await trimmed.Task.WaitAsync(TimeSpan.FromSeconds(30));
        Assert.True(at - lastTouch >= TimeSpan.FromSeconds(1.4), $"trimmed {(at - lastTouch).TotalMilliseconds:0} ms after the last touch");
        Assert.StartsWith("idle: resident memory", message);
    }

    [Fact]
    public async Task DoesNothingWhenTheCollectorHoldsLittleSpare()
    {
        var logged = new List<string>();
        using var trimmer = new MemoryTrimmer(TimeSpan.FromMilliseconds(50), slackBytes: long.MaxValue, logged.Add);
        trimmer.Touch();
        await Task.Delay(500);
        Assert.Empty(logged);
    }
}
