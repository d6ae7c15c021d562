namespace Seepage.Api.Application;

/// <summary>Where analyses are kept. Implementations: SQLite (embedded default) and PostgreSQL (<c>Storage/</c>).</summary>
public interface IAnalysisStore
{
    /// <summary>Stores an analysis; nothing happens when its id is stored already (a repeated unit of work).</summary>
    Task SaveAsync(StoredAnalysis analysis, CancellationToken cancellation);

    /// <summary>The section or result JSON of one analysis, or null when the id is unknown.</summary>
    Task<string?> GetJsonAsync(string id, AnalysisPart part, CancellationToken cancellation);

    /// <summary>The field data of one analysis, or null when the id is unknown.</summary>
    Task<StoredField?> GetFieldAsync(string id, CancellationToken cancellation);

    /// <summary>A page of analyses, newest first.</summary>
    Task<ListPage<StoredListing>> ListAsync(ListQuery query, CancellationToken cancellation);

    /// <summary>Sets the title and the result document that carries it; false when the id is unknown.</summary>
    Task<bool> RenameAsync(string id, string title, string resultJson, CancellationToken cancellation);

    /// <summary>Deletes one analysis; false when the id is unknown.</summary>
    Task<bool> DeleteAsync(string id, CancellationToken cancellation);

    /// <summary>Deletes every analysis created before <paramref name="cutoff"/>; returns how many.</summary>
    Task<int> DeleteOlderThanAsync(DateTimeOffset cutoff, CancellationToken cancellation);
}
