using System.Text.Json.Nodes;
using Microsoft.OpenApi;
using Seepage.Api.Errors;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Seepage.Api.OpenApi;

/// <summary>Describes every parameter: a <see cref="QueryChoice"/> attached to the endpoint gives the parameter its
/// enum, default and description (the same values the endpoint accepts); a <see cref="ParameterNote"/> gives a free
/// parameter (an id, a name) its description.</summary>
public sealed class ParameterFilter : IOperationFilter
{
    public void Apply(OpenApiOperation operation, OperationFilterContext context)
    {
        var metadata = context.ApiDescription.ActionDescriptor.EndpointMetadata;
        var choices = metadata.OfType<QueryChoice>().ToDictionary(c => c.Parameter);
        var notes = metadata.OfType<ParameterNote>().ToDictionary(n => n.Name);
        foreach (var parameter in (operation.Parameters ?? []).OfType<OpenApiParameter>())
        {
            string name = parameter.Name ?? "";
            if (choices.TryGetValue(name, out var choice))
            {
                parameter.Description = choice.Description;
                parameter.Schema = new OpenApiSchema
                {
                    Type = JsonSchemaType.String,
                    Enum = [.. choice.Allowed.Select(a => (JsonNode)JsonValue.Create(a))],
                    Default = JsonValue.Create(choice.Default),
                };
            }
            else if (notes.TryGetValue(name, out var note)) parameter.Description = note.Description;
        }
    }
}

/// <summary>The description of a parameter that takes free values, attached to an endpoint with
/// <c>.WithMetadata(new ParameterNote(...))</c>.</summary>
public sealed record ParameterNote(string Name, string Description)
{
    /// <summary>The id of a stored analysis.</summary>
    public static readonly ParameterNote AnalysisId = new("id",
        "Id of a stored analysis, as returned by POST /api/v1/analyses (the Location header and the result's id).");

    /// <summary>The id of a stored study.</summary>
    public static readonly ParameterNote StudyId = new("id",
        "Id of a study, as returned by POST /api/v1/studies (the Location header and the study's id).");

    /// <summary>The name of a shipped example.</summary>
    public static readonly ParameterNote ExampleName = new("name",
        "Name of an example section, as listed by GET /api/v1/examples.");

    /// <summary>The base section of a CSV study.</summary>
    public static readonly ParameterNote StudyBase = new("base",
        "For a CSV study: the base section, named by the id of a stored analysis (its section) or an example name. " +
        "Not used with a JSON body, which carries its base.");
}
