using System.Text.Json.Nodes;
using Microsoft.OpenApi;
using Seepage.Core.Sections;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Seepage.Api.OpenApi;

/// <summary>Lists the accepted names of the section document's enumerated members as OpenAPI enums (case, spaces and
/// hyphens are not significant when a section is read; the enum gives the canonical spelling).</summary>
public sealed class SectionEnumerationFilter : ISchemaFilter
{
    public void Apply(IOpenApiSchema schema, SchemaFilterContext context)
    {
        if (context.Type == typeof(SectionDocument))
        {
            Enum(schema, "conductivityUnit", SectionEnumerations.ConductivityUnits);
            Enum(schema, "lengthUnit", SectionEnumerations.LengthUnits);
            Enum(schema, "unitWeightUnit", SectionEnumerations.UnitWeightUnits);
        }
        else if (context.Type == typeof(SoilDocument)) Enum(schema, "creepClass", SectionEnumerations.CreepClasses);
    }

    private static void Enum(IOpenApiSchema schema, string member, IEnumerable<string> names)
    {
        if (schema.Properties?.TryGetValue(member, out var property) == true && property is OpenApiSchema concrete)
            concrete.Enum = names.Select(n => (JsonNode)JsonValue.Create(n)!).ToList();
    }
}
