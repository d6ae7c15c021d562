using Seepage.Api.Application;

namespace Seepage.Api.Storage;

/// <summary>Runs a study's alternatives on this process's cores in the background (no job engine): work in flight when the
/// process stops is not resumed.</summary>
public sealed class InProcessStudyScheduler(IServiceProvider services, IHostApplicationLifetime lifetime, ILogger<InProcessStudyScheduler> logger)
    : IStudyScheduler
{
    public Task ScheduleAsync(string studyId, int alternatives, CancellationToken cancellation)
    {
        var study = services.GetRequiredService<StudyService>();
        var stopping = lifetime.ApplicationStopping;
        _ = Task.Run(async () =>
        {
            try
            {
                await Parallel.ForEachAsync(Enumerable.Range(0, alternatives),
                    new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount, CancellationToken = stopping },
                    async (i, token) => await study.RunAlternativeAsync(studyId, i, null, token));
            }
            catch (OperationCanceledException) { logger.LogInformation("Study {Id} stopped with the server", studyId); }
        }, CancellationToken.None);
        return Task.CompletedTask;
    }
}
