using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Errors;
using Seepage.Core.Imports;

namespace Seepage.Api.Endpoints;

/// <summary>Reads a spreadsheet from a request body: CSV text (<c>text/csv</c>), an .xlsx workbook, or the first file of a
/// multipart form (CSV or .xlsx by its name or type). Type and size are checked by <see cref="RequestBody"/>.</summary>
public static class SpreadsheetBody
{
    /// <summary>The types the import reads.</summary>
    public static readonly string[] Accepted = [RequestBody.Csv, RequestBody.Xlsx, RequestBody.Multipart];

    /// <summary>The import, or the problem that refused the body (400, 413, 415).</summary>
    public sealed record Outcome(SheetImport? Import, ProblemHttpResult? Refusal);

    public static async Task<Outcome> ReadAsync(HttpRequest request, SpreadsheetLimits limits, CancellationToken cancellation)
    {
        const string what = "Spreadsheets";
        if (!request.HasFormContentType)
        {
            var body = await RequestBody.ReadAsync(request, what, Accepted, cancellation);
            if (body.Refusal is { } refusal) return new(null, refusal);
            return await ReadAsync(body.Bytes, body.MediaType, limits, cancellation);
        }
        if (request.ContentLength > RequestBody.MaxBytes) return new(null, ApiProblems.TooLarge(what));
        IFormCollection form;
        try { form = await request.ReadFormAsync(cancellation); }
        catch (Exception ex) when (ex is InvalidDataException or IOException)
        {
            // A malformed or truncated multipart body (missing boundary, cut-off part, a part over the form limits).
            return new(null, ex.Message.Contains("limit", StringComparison.OrdinalIgnoreCase) ? ApiProblems.TooLarge(what)
                : ApiProblems.Unreadable("The multipart form could not be read: " + Core.SafeText.Of(ex.Message, 200)));
        }
        var file = form.Files.FirstOrDefault();
        if (file is null)
            return new(null, ApiProblems.Unreadable(
                "The form holds no file; attach the spreadsheet (.csv or .xlsx) as a file field."));
        if (file.Length > RequestBody.MaxBytes) return new(null, ApiProblems.TooLarge(what));
        string type = file.FileName.EndsWith(".xlsx", StringComparison.OrdinalIgnoreCase) ? RequestBody.Xlsx
            : file.FileName.EndsWith(".csv", StringComparison.OrdinalIgnoreCase) ? RequestBody.Csv
            : RequestBody.MediaType(file.ContentType);
        if (type is not (RequestBody.Csv or RequestBody.Xlsx))
            return new(null, ApiProblems.UnsupportedType(type,
                [".csv or .xlsx file in the form", RequestBody.Csv, RequestBody.Xlsx]));
        await using var source = file.OpenReadStream();
        var bytes = await RequestBody.ReadBoundedAsync(source, cancellation);
        return bytes is null ? new(null, ApiProblems.TooLarge(what)) : await ReadAsync(bytes, type, limits, cancellation);
    }

    private static async Task<Outcome> ReadAsync(byte[] bytes, string type, SpreadsheetLimits limits,
        CancellationToken cancellation)
    {
        if (bytes.Length == 0) return new(null, ApiProblems.Unreadable("The body is empty; send a spreadsheet."));
        if (type == RequestBody.Csv)
            return new(SectionSpreadsheet.ReadCsv(System.Text.Encoding.UTF8.GetString(bytes), limits), null);
        try
        {
            // Unpacking and parsing are CPU work: off the request thread, and stopped when the client leaves.
            var import = await Task.Run(() => SectionSpreadsheet.ReadXlsx(new MemoryStream(bytes), limits, cancellation),
                cancellation);
            return new(import, null);
        }
        catch (InvalidDataException ex)
        {
            return new(null, ApiProblems.Unreadable(ex.Message));
        }
    }
}
