using Hangfire;
using Seepage.Api.Storage;

namespace Seepage.Api.Jobs;

/// <summary>The body of one durable job: one alternative of one study. Idempotent (<see cref="StudyService.RunAlternativeAsync"/>
/// stores nothing twice), so the job engine may run it again after a process died mid-way.</summary>
public sealed class StudyJob(StudyService studies)
{
    [AutomaticRetry(Attempts = 3)]
    public Task RunAsync(string studyId, int index, CancellationToken cancellation) =>
        studies.RunAlternativeAsync(studyId, index, null, cancellation);
}
