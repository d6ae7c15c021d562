using System.Text.Json.Nodes;
using Seepage.Core.Sections;

namespace Seepage.Benchmarks;

/// <summary>The shared design example (two layers, two cutoffs, heads on the ground line) as posted JSON and as a
/// validated model, optionally with another mesh size or element order.</summary>
internal static class DesignSection
{
    public static string Path => System.IO.Path.Combine(AppContext.BaseDirectory, "design-example.section.json");

    /// <summary>The section JSON with <c>mesh.size</c> (m) and <c>mesh.order</c> replaced where given.</summary>
    public static string Json(double? size = null, int? order = null, bool? convergenceCheck = null)
    {
        var node = JsonNode.Parse(File.ReadAllText(Path))!.AsObject();
        var mesh = node["mesh"]!.AsObject();
        if (size is { } s) mesh["size"] = s;
        if (order is { } o) mesh["order"] = o;
        if (convergenceCheck is { } c) mesh["convergenceCheck"] = c;
        return node.ToJsonString();
    }

    public static SectionModel Model(string json)
    {
        var doc = SectionParser.Parse(json, out var problems)
            ?? throw new InvalidOperationException($"section not readable: {string.Join("; ", problems)}");
        var outcome = SectionValidator.Validate(doc);
        return outcome.Model ?? throw new InvalidOperationException("section not valid");
    }
}
