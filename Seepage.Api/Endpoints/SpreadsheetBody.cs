using Seepage.Core.Imports;

namespace Seepage.Api.Endpoints;

/// <summary>Reads a spreadsheet from a request body: CSV text (<c>text/csv</c>), an .xlsx workbook, or the first file of a
/// multipart form (CSV or .xlsx by its name or type). Bounded to <see cref="SectionBody.MaxBytes"/>.</summary>
public static class SpreadsheetBody
{
    public const string Xlsx = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
    public const string Csv = "text/csv";

    /// <summary>The import (null when the body could not be taken), or why not: status and message.</summary>
    public sealed record Outcome(SheetImport? Import, int Status, string? Error);

    public static async Task<Outcome> ReadAsync(HttpRequest request, CancellationToken cancellation)
    {
        if (request.ContentLength > SectionBody.MaxBytes) return TooLarge();
        string type = (request.ContentType ?? "").Split(';')[0].Trim().ToLowerInvariant();
        Stream source = request.Body;
        if (request.HasFormContentType)
        {
            IFormCollection form;
            try { form = await request.ReadFormAsync(cancellation); }
            catch (Exception ex) when (ex is InvalidDataException or IOException)
            {
                // A malformed or truncated multipart body (missing boundary, cut-off part, a part over the form limits).
                return ex.Message.Contains("limit", StringComparison.OrdinalIgnoreCase) ? TooLarge()
                    : Bad(StatusCodes.Status400BadRequest, "The multipart form could not be read: " + ex.Message);
            }
            var file = form.Files.FirstOrDefault();
            if (file is null) return Bad(StatusCodes.Status400BadRequest, "The form holds no file; attach the spreadsheet (.csv or .xlsx) as a file field.");
            if (file.Length > SectionBody.MaxBytes) return TooLarge();
            type = file.FileName.EndsWith(".xlsx", StringComparison.OrdinalIgnoreCase) ? Xlsx
                : file.FileName.EndsWith(".csv", StringComparison.OrdinalIgnoreCase) ? Csv
                : (file.ContentType ?? "").Split(';')[0].Trim().ToLowerInvariant();
            source = file.OpenReadStream();
        }
        bool csv = type is Csv or "application/csv" or "text/plain";
        if (!csv && type != Xlsx)
            return Bad(StatusCodes.Status415UnsupportedMediaType,
                $"'{type}' is not a spreadsheet type this endpoint reads; send {Csv}, {Xlsx}, or a multipart form with a .csv or .xlsx file.");
        var bytes = await ReadBoundedAsync(source, cancellation);
        if (bytes is null) return TooLarge();
        if (bytes.Length == 0) return Bad(StatusCodes.Status400BadRequest, "The body is empty; send a spreadsheet.");
        if (csv) return new Outcome(SectionSpreadsheet.ReadCsv(System.Text.Encoding.UTF8.GetString(bytes)), 200, null);
        try
        {
            using var workbook = new MemoryStream(bytes);
            return new Outcome(SectionSpreadsheet.ReadXlsx(workbook), 200, null);
        }
        catch (InvalidDataException ex)
        {
            return Bad(StatusCodes.Status400BadRequest, ex.Message);
        }
    }

    private static async Task<byte[]?> ReadBoundedAsync(Stream source, CancellationToken cancellation)
    {
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = await source.ReadAsync(chunk, cancellation)) > 0)
        {
            buffer.Write(chunk, 0, read);
            if (buffer.Length > SectionBody.MaxBytes) return null;
        }
        return buffer.ToArray();
    }

    private static Outcome TooLarge() => Bad(StatusCodes.Status413PayloadTooLarge, $"Spreadsheets are limited to {SectionBody.MaxBytes / (1024 * 1024)} MiB.");

    private static Outcome Bad(int status, string message) => new(null, status, message);
}
