namespace Seepage.Api.Application;

/// <summary>Hands the alternatives of a stored study to background work; each runs
/// <c>StudyService.RunAlternativeAsync(studyId, index)</c>, which is idempotent.</summary>
public interface IStudyScheduler
{
    Task ScheduleAsync(string studyId, int alternatives, CancellationToken cancellation);
}
