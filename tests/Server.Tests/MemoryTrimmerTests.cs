using MotorLang.Server.Features;

namespace MotorLang.Server.Tests;

/// <summary>The idle trim runs once activity stops, and not while it goes on.</summary>
public class MemoryTrimmerTests
{
    [Fact]
    public async Task TrimsAfterAQuietSpellAndActivityPostponesIt()
    {
        var trimmed = new TaskCompletionSource<string>(TaskCreationOptions.RunContinuationsAsynchronously);
        using var trimmer = new MemoryTrimmer(TimeSpan.FromMilliseconds(300), slackBytes: 0, m => trimmed.TrySetResult(m));
        var started = DateTime.UtcNow;
        trimmer.Touch();
        // Keep touching for a while: the trim must wait for the last touch.
        for (var i = 0; i < 5; i++)
        {
            await Task.Delay(100);
            trimmer.Touch();
        }

        var lastTouch = DateTime.UtcNow;
        var message = await trimmed.Task.WaitAsync(TimeSpan.FromSeconds(30));
        Assert.True(DateTime.UtcNow - lastTouch >= TimeSpan.FromMilliseconds(250), "trimmed before the quiet spell was over");
        Assert.StartsWith("idle: returned", message);
        Assert.True(DateTime.UtcNow - started > TimeSpan.FromMilliseconds(500));
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
