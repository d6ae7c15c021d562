using System.Text.Json.Nodes;
using Seepage.Core.Studies;

namespace Seepage.Api.Storage;

/// <summary>A study as posted, in the stored JSON form <c>{ base, alternatives: [ { name, changes } ] }</c>.</summary>
public sealed record StudyDefinition(JsonObject Base, IReadOnlyList<StudyAlternative> Alternatives)
{
    public string ToJson() => new JsonObject
    {
        ["base"] = Base.DeepClone(),
        ["alternatives"] = new JsonArray(Alternatives.Select(a => (JsonNode)new JsonObject
        {
            ["name"] = a.Name,
            ["changes"] = new JsonObject(a.Changes.Select(c => KeyValuePair.Create(c.Key, c.Value?.DeepClone()))),
        }).ToArray()),
    }.ToJsonString();

    public static StudyDefinition Parse(string json)
    {
        var root = JsonNode.Parse(json)!.AsObject();
        var alternatives = root["alternatives"]!.AsArray().Select(a => new StudyAlternative(a!["name"]!.GetValue<string>(),
            a["changes"]!.AsObject().Select(c => KeyValuePair.Create(c.Key, c.Value?.DeepClone())).ToList())).ToList();
        return new StudyDefinition(root["base"]!.AsObject(), alternatives);
    }

    /// <summary>The varied members (JSON pointers), in order of first use.</summary>
    public IReadOnlyList<string> Parameters => Alternatives.SelectMany(a => a.Changes.Select(c => c.Key)).Distinct().ToList();
}
