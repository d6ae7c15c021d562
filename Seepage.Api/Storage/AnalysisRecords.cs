using System.Text.Json;
using Seepage.Api.Contracts;
using Seepage.Core;

namespace Seepage.Api.Storage;

/// <summary>Stores one finished analysis (result document, field data, section as analysed) under a new id, so it has its
/// own GET and memo like a posted one.</summary>
public static class AnalysisRecords
{
    public static string Save(AnalysisStore store, AnalysisResult result, string sectionJson, CancellationToken cancellation)
    {
        string id = "a" + Guid.NewGuid().ToString("N")[..15];
        var created = DateTimeOffset.UtcNow;
        var dto = ResultMapper.ToDto(id, created, result);
        var field = ResultMapper.ToFieldDto(id, result);
        store.SaveAsync(new StoredAnalysis(id, created, dto.Title, sectionJson, JsonSerializer.Serialize(dto, AnalysisService.Json),
            JsonSerializer.Serialize(field, AnalysisService.Json)), cancellation).GetAwaiter().GetResult();
        return id;
    }
}
