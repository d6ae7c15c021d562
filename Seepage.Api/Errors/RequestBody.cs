using Microsoft.AspNetCore.Http.HttpResults;

namespace Seepage.Api.Errors;

/// <summary>The one body reader of the service: checks the Content-Type against what the endpoint reads (415
/// otherwise), bounds the size (413 beyond <see cref="MaxBytes"/>, also for chunked bodies) and returns the
/// bytes. A missing Content-Type is read as the endpoint's first type.</summary>
public static class RequestBody
{
    /// <summary>Largest accepted body, bytes (4 MiB).</summary>
    public const int MaxBytes = 4 * 1024 * 1024;

    public const string Json = "application/json";
    public const string Csv = "text/csv";
    public const string Xlsx = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";
    public const string Multipart = "multipart/form-data";

    /// <summary>The body, its media type (one of the accepted ones), or the problem that refused it.</summary>
    public sealed record Outcome(byte[] Bytes, string MediaType, ProblemHttpResult? Refusal)
    {
        public string Text => System.Text.Encoding.UTF8.GetString(Bytes);
    }

    /// <summary>The media type without parameters, lower case, with its aliases folded: <c>application/*+json</c>
    /// is JSON; <c>application/csv</c> and <c>text/plain</c> are CSV. Empty when none is given.</summary>
    public static string MediaType(string? contentType)
    {
        string type = (contentType ?? "").Split(';')[0].Trim().ToLowerInvariant();
        if (type.StartsWith("application/", StringComparison.Ordinal) && type.EndsWith("+json", StringComparison.Ordinal))
            return Json;
        return type is "application/csv" or "text/plain" ? Csv : type;
    }

    /// <summary>Reads the body when its type is one of <paramref name="accepted"/>; <paramref name="what"/> names
    /// the documents in the 413 message ("Section documents").</summary>
    public static async Task<Outcome> ReadAsync(HttpRequest request, string what, IReadOnlyList<string> accepted,
        CancellationToken cancellation)
    {
        string type = MediaType(request.ContentType);
        if (type.Length == 0) type = accepted[0];
        if (!accepted.Contains(type)) return new([], type, ApiProblems.UnsupportedType(type, accepted));
        if (request.ContentLength > MaxBytes) return new([], type, ApiProblems.TooLarge(what));
        var bytes = await ReadBoundedAsync(request.Body, cancellation);
        return bytes is null ? new([], type, ApiProblems.TooLarge(what)) : new(bytes, type, null);
    }

    /// <summary>The stream's bytes, or null once more than <see cref="MaxBytes"/> have arrived.</summary>
    public static async Task<byte[]?> ReadBoundedAsync(Stream source, CancellationToken cancellation)
    {
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = await source.ReadAsync(chunk, cancellation)) > 0)
        {
            buffer.Write(chunk, 0, read);
            if (buffer.Length > MaxBytes) return null;
        }
        return buffer.ToArray();
    }
}
