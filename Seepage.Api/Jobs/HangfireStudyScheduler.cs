using Hangfire;
using Seepage.Api.Application;

namespace Seepage.Api.Jobs;

/// <summary>Each alternative of a background study becomes its own Hangfire job, so any replica's workers pick them up.</summary>
public sealed class HangfireStudyScheduler(IBackgroundJobClient jobs) : IStudyScheduler
{
    public Task ScheduleAsync(string studyId, int alternatives, CancellationToken cancellation)
    {
        for (int i = 0; i < alternatives; i++)
        {
            int index = i;
            jobs.Enqueue<StudyJob>(j => j.RunAsync(studyId, index, CancellationToken.None));
        }
        return Task.CompletedTask;
    }
}
