using System.Collections.Concurrent;

namespace Seepage.Api.Storage;

/// <summary>The cancellation sources of the target searches and uncertainty studies running in this process, by id, so
/// POST …/{id}/cancel can stop one. A run removes itself when it ends.</summary>
public sealed class RunningJobs
{
    /// <summary>A target search or uncertainty study still "running" that no process has written to for this long was
    /// cut off (the server stopped); one analysis is limited to <see cref="AnalysisService.SolveBudget"/>, well below it.
    /// (Studies are durable jobs and need no such rule; these two resources are not yet.)</summary>
    public static readonly TimeSpan SilenceLimit = TimeSpan.FromMinutes(10);

    private readonly ConcurrentDictionary<string, CancellationTokenSource> _running = new();

    /// <summary>Registers a run; its token is cancelled by <see cref="Cancel"/> or when <paramref name="outer"/> is.</summary>
    public CancellationTokenSource Start(string id, CancellationToken outer)
    {
        var source = CancellationTokenSource.CreateLinkedTokenSource(outer);
        _running[id] = source;
        return source;
    }

    public void End(string id)
    {
        if (_running.TryRemove(id, out var source)) source.Dispose();
    }

    /// <summary>Cancels a run of this process; false when none by that id is running here.</summary>
    public bool Cancel(string id)
    {
        if (!_running.TryGetValue(id, out var source)) return false;
        try { source.Cancel(); } catch (ObjectDisposedException) { return false; }
        return true;
    }
}
