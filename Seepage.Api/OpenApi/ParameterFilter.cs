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
        // Group metadata comes before the endpoint's own: the last one for a name is the most specific.
        var choices = metadata.OfType<QueryChoice>().GroupBy(c => c.Parameter).ToDictionary(g => g.Key, g => g.Last());
        var notes = metadata.OfType<ParameterNote>().GroupBy(n => n.Name).ToDictionary(g => g.Key, g => g.Last());
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

    /// <summary>The id of a target search.</summary>
    public static readonly ParameterNote TargetSearchId = new("id",
        "Id of a target search, as returned by POST /api/v1/target-searches (the Location header and its id).");

    /// <summary>The id of an uncertainty study.</summary>
    public static readonly ParameterNote UncertaintyId = new("id",
        "Id of an uncertainty study, as returned by POST /api/v1/uncertainty-studies (the Location header and its id).");

    /// <summary>The page of a listing.</summary>
    public static readonly ParameterNote ListPage = new("page", "Page of the listing, from 1 (default 1), newest first.");

    /// <summary>The page size of a listing.</summary>
    public static readonly ParameterNote ListPageSize = new("pageSize", "Items per page, 1 … 100 (default 20).");

    /// <summary>The title filter of a listing.</summary>
    public static readonly ParameterNote ListTitle = new("title",
        "Lists only items whose title contains this text (case-insensitive); none by default.");

    /// <summary>The name of a shipped example.</summary>
    public static readonly ParameterNote ExampleName = new("name",
        "Name of an example section, as listed by GET /api/v1/examples.");

    /// <summary>The base section of a CSV study.</summary>
    public static readonly ParameterNote StudyBase = new("base",
        "For a CSV study: the base section, named by the id of a stored analysis (its section) or an example name. " +
        "Not used with a JSON body, which carries its base.");
}
