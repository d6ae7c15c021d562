using Microsoft.AspNetCore.Http.Metadata;
using Microsoft.OpenApi;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Seepage.Api.OpenApi;

/// <summary>Gives every request and response content type of an operation a schema. Request bodies that are not
/// JSON get what they carry: text as a string, a workbook as a binary string, a multipart form as an object with
/// one binary <c>file</c>. A response that is not JSON (HTML or PDF memo, CSV table, workbook, Matrix Market file)
/// is a file to save: a binary string, which client generators turn into a stream. The API explorer keeps one
/// declaration per status code (a second <c>Produces</c> for 200 replaces the first) and gives a declaration
/// without a CLR type no content at all; this filter merges all of them: JSON types get their schema, text types
/// (CSV, HTML, Matrix Market) a string, binary types (PDF, .xlsx) a binary string.</summary>
public sealed class ContentTypeFilter : IOperationFilter
{
    public void Apply(OpenApiOperation operation, OperationFilterContext context)
    {
        if (operation.RequestBody?.Content is { } request)
            foreach (var (type, media) in request)
                if (!type.Contains("json", StringComparison.Ordinal) && media is OpenApiMediaType concrete)
                    concrete.Schema = type == "multipart/form-data"
                        ? new OpenApiSchema
                        {
                            Type = JsonSchemaType.Object, Required = new HashSet<string> { "file" },
                            Properties = new Dictionary<string, IOpenApiSchema> { ["file"] = Binary() },
                        }
                        : type.StartsWith("text/", StringComparison.Ordinal)
                            ? new OpenApiSchema { Type = JsonSchemaType.String } : Binary();
        operation.Responses ??= new OpenApiResponses();
        var declared = context.ApiDescription.ActionDescriptor.EndpointMetadata.OfType<IProducesResponseTypeMetadata>();
        foreach (var d in declared)
        {
            // 204 No Content has no body to describe (RFC 9110, 15.3.5).
            if (d.StatusCode == StatusCodes.Status204NoContent)
            {
                if (operation.Responses.TryGetValue("204", out var empty) && empty is OpenApiResponse none) none.Content = null;
                continue;
            }
            string code = d.StatusCode.ToString(System.Globalization.CultureInfo.InvariantCulture);
            if (!operation.Responses.TryGetValue(code, out var found) || found is not OpenApiResponse response)
            {
                response = new OpenApiResponse { Description = d.Description ?? ReasonPhrase(d.StatusCode) };
                operation.Responses[code] = response;
            }
            response.Content ??= new Dictionary<string, IOpenApiMediaType>();
            foreach (string type in d.ContentTypes.DefaultIfEmpty(d.Type is null ? "" : "application/json"))
            {
                if (type.Length == 0) continue;
                bool json = type.Contains("json", StringComparison.Ordinal);
                if (json && response.Content.ContainsKey(type)) continue;
                response.Content[type] = new OpenApiMediaType { Schema = Schema(d.Type, type, context) };
            }
        }
    }

    private static IOpenApiSchema Schema(Type? type, string mediaType, OperationFilterContext context) =>
        type is not null && type != typeof(void) && mediaType.Contains("json", StringComparison.Ordinal)
            ? context.SchemaGenerator.GenerateSchema(type, context.SchemaRepository)
            : Binary();

    private static OpenApiSchema Binary() => new() { Type = JsonSchemaType.String, Format = "binary" };

    private static string ReasonPhrase(int status) =>
        Microsoft.AspNetCore.WebUtilities.ReasonPhrases.GetReasonPhrase(status) is { Length: > 0 } phrase
            ? phrase : "Answer";
}
