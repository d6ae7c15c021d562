using Seepage.Core;

namespace Seepage.Api.Storage;

/// <summary>Stores one finished analysis (result document, field data, section as analysed) under a new id, so it has its
/// own GET and memo like a posted one.</summary>
public static class AnalysisRecords
{
    public static string Save(AnalysisService analyses, AnalysisResult result, string sectionJson, CancellationToken cancellation) =>
        analyses.StoreAsync(result, sectionJson, null, cancellation).GetAwaiter().GetResult().Id;
}
