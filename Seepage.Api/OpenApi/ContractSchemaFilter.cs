using Microsoft.OpenApi;
using Seepage.Core.Sections;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Seepage.Api.OpenApi;

/// <summary>Gives every schema its <c>required</c> list. The response contracts (records in
/// <c>Seepage.Api.Contracts</c>) always write every member, null included, so all their members are required and
/// nullability tells which may be null. A section document may leave out every member with a default; the members
/// the validator insists on (<see cref="SectionRequired"/>) are required.</summary>
public sealed class ContractSchemaFilter : ISchemaFilter
{
    /// <summary>The members of the section document types without which <see cref="SectionValidator"/> refuses the
    /// section (each such absence is a 400 naming the member).</summary>
    public static readonly IReadOnlyDictionary<Type, string[]> SectionRequired = new Dictionary<Type, string[]>
    {
        [typeof(SectionDocument)] = ["soils", "zones", "heads"],
        [typeof(SoilDocument)] = ["id", "kx"],
        [typeof(ZoneDocument)] = ["soil", "outline"],
        [typeof(StructureDocument)] = ["base"],
        [typeof(CutoffDocument)] = ["top", "tip"],
        [typeof(HeadDocument)] = ["along", "total"],
        [typeof(DrainDocument)] = ["along"],
        [typeof(GaugeDocument)] = ["along"],
    };

    public void Apply(IOpenApiSchema schema, SchemaFilterContext context)
    {
        if (schema is not OpenApiSchema concrete || concrete.Properties is not { Count: > 0 } properties) return;
        string[] required = context.Type.Namespace == typeof(Contracts.AnalysisResultDto).Namespace
            ? [.. properties.Keys]
            : SectionRequired.GetValueOrDefault(context.Type) ?? [];
        if (required.Length == 0) return;
        concrete.Required = new SortedSet<string>(required.Where(properties.ContainsKey), StringComparer.Ordinal);
        if (context.Type.Namespace != typeof(SectionDocument).Namespace) return;
        // A member the validator insists on may not be null either.
        foreach (string name in concrete.Required)
            if (properties[name] is OpenApiSchema member && member.Type is { } t) member.Type = t & ~JsonSchemaType.Null;
    }
}
