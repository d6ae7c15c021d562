using Microsoft.Extensions.Options;
using Seepage.Core.Sections;

namespace Seepage.Api.Admission;

/// <summary>
/// Admission of heavy analyses in this process: at most <see cref="ServiceLimits.EffectiveHeavyConcurrency"/> run at once,
/// <see cref="ServiceLimits.HeavyQueueLength"/> more wait in line, one beyond that is turned away (the caller answers 429
/// with Retry-After). Light analyses (under <see cref="ServiceLimits.HeavyWorkUnknowns"/>) never wait, so a small section
/// still answers at once while large ones run.
/// </summary>
public sealed class AnalysisGate(IOptions<ServiceLimits> options)
{
    private readonly ServiceLimits limits = options.Value;
    private readonly SemaphoreSlim slots = new(options.Value.EffectiveHeavyConcurrency);
    private int admitted; // running + waiting

    /// <summary>Heavy analyses running or waiting now.</summary>
    public int Admitted => Volatile.Read(ref admitted);

    /// <summary>A ticket to dispose when the analysis ends; null when the line is full. Waits (cancellably) for a slot.</summary>
    public async Task<IDisposable?> EnterAsync(SectionModel section, CancellationToken cancellation)
    {
        if (WorkEstimate.Of(section).TotalUnknowns < limits.HeavyWorkUnknowns) return Ticket.None;
        if (Interlocked.Increment(ref admitted) > limits.EffectiveHeavyConcurrency + limits.HeavyQueueLength)
        {
            Interlocked.Decrement(ref admitted);
            return null;
        }
        try
        {
            await slots.WaitAsync(cancellation);
        }
        catch
        {
            Interlocked.Decrement(ref admitted);
            throw;
        }
        return new Ticket(this);
    }

    private sealed class Ticket(AnalysisGate? gate) : IDisposable
    {
        public static readonly Ticket None = new(null);
        private int disposed;

        public void Dispose()
        {
            if (gate is null || Interlocked.Exchange(ref disposed, 1) == 1) return;
            gate.slots.Release();
            Interlocked.Decrement(ref gate.admitted);
        }
    }
}
