namespace Seepage.Api.Application;

/// <summary>Where studies are kept: the definition as posted, a header (the study document without rows), the status and
/// one row per finished alternative, stored at most once per (study id, alternative index).</summary>
public interface IStudyStore
{
    /// <summary>Stores a new study with status <c>running</c>.</summary>
    Task CreateAsync(StoredStudy study, CancellationToken cancellation);

    /// <summary>Stores the row of one alternative unless that alternative already has one; true when this call stored it.</summary>
    Task<bool> AddRowAsync(string studyId, int index, string rowJson, CancellationToken cancellation);

    /// <summary>Whether alternative <paramref name="index"/> of the study has its row stored.</summary>
    Task<bool> HasRowAsync(string studyId, int index, CancellationToken cancellation);

    /// <summary>Status, rows stored and total of one study, or null when the id is unknown.</summary>
    Task<StudyProgress?> ProgressAsync(string id, CancellationToken cancellation);

    /// <summary>Sets the status (<c>running</c>, <c>done</c>, <c>failed</c>, <c>cancelled</c>).</summary>
    Task SetStatusAsync(string id, string status, CancellationToken cancellation);

    /// <summary>One study with its rows so far (in index order), or null when the id is unknown.</summary>
    Task<StudyRecord?> GetAsync(string id, CancellationToken cancellation);

    /// <summary>The definition (JSON <c>{ base, alternatives }</c>) of one study, or null when the id is unknown.</summary>
    Task<string?> GetDefinitionAsync(string id, CancellationToken cancellation);

    /// <summary>Id and number of alternatives of every study whose status is <c>running</c>.</summary>
    Task<IReadOnlyList<(string Id, int Total)>> RunningAsync(CancellationToken cancellation);

    /// <summary>A page of studies, newest first.</summary>
    Task<ListPage<StudyListing>> ListAsync(ListQuery query, CancellationToken cancellation);

    /// <summary>Sets the title; false when the id is unknown.</summary>
    Task<bool> RenameAsync(string id, string title, CancellationToken cancellation);

    /// <summary>Deletes one study and its rows (not the analyses of its alternatives); false when the id is unknown.</summary>
    Task<bool> DeleteAsync(string id, CancellationToken cancellation);

    /// <summary>Deletes every study created before <paramref name="cutoff"/>; returns how many.</summary>
    Task<int> DeleteOlderThanAsync(DateTimeOffset cutoff, CancellationToken cancellation);
}
