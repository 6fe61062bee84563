namespace MotorLang.Server.Features;

/// <summary>
/// Gives memory the collector no longer uses back to the system once the server has been idle.
/// Opening a large list allocates several times what it keeps, and the collector holds on to the
/// freed space (on a machine with a large cache, well over a hundred megabytes) until its next
/// collections, which an idle server never triggers. After a quiet spell, when much has been
/// allocated since the last trim (the collector's own figures are only as fresh as its last
/// collection, so they miss the garbage of a large open) or the collector holds much more than the
/// heap needs, one compacting collection returns the spare memory. Never on the typing path: any
/// activity postpones it.
/// </summary>
public sealed class MemoryTrimmer(TimeSpan quiet, long slackBytes, Action<string> log) : IDisposable
{
    private readonly object _gate = new();
    private Timer? _pending;
    private long _allocatedAtLastTrim = GC.GetTotalAllocatedBytes();

    /// <summary>Something happened (a change, a publication): start the quiet period again.</summary>
    public void Touch()
    {
        lock (_gate)
        {
            _pending ??= new Timer(_ => Trim(), null, Timeout.Infinite, Timeout.Infinite);
            _pending.Change(quiet, Timeout.InfiniteTimeSpan);
        }
    }

    /// <summary>Bytes the collector holds from the system beyond what the heap uses.</summary>
    public static long Slack()
    {
        var info = GC.GetGCMemoryInfo();
        return info.TotalCommittedBytes - info.HeapSizeBytes;
    }

    private void Trim()
    {
        try
        {
            var allocated = GC.GetTotalAllocatedBytes() - _allocatedAtLastTrim;
            if (allocated < slackBytes && Slack() < slackBytes) return;
            var before = Environment.WorkingSet;
            GC.Collect(GC.MaxGeneration, GCCollectionMode.Aggressive, blocking: true, compacting: true);
            _allocatedAtLastTrim = GC.GetTotalAllocatedBytes();
            log($"idle: resident memory {before >> 20} MB -> {Environment.WorkingSet >> 20} MB after returning unused memory to the system");
        }
        catch (Exception e)
        {
            log($"memory trim failed: {e.Message}");
        }
    }

    public void Dispose()
    {
        lock (_gate) _pending?.Dispose();
    }
}
