using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Api.Errors;
using Seepage.Core.Sections;
using Seepage.Core.Studies;

namespace Seepage.Api.Endpoints;

/// <summary>Reading helpers shared by the target-search and uncertainty-study bodies: the JSON object, its base section
/// (validated; problems keyed under /base), members that must be numbers, and refusal of members not understood.</summary>
public sealed class DesignBody(JsonObject root, Dictionary<string, string[]> errors)
{
    public JsonObject Root { get; } = root;
    public Dictionary<string, string[]> Errors { get; } = errors;

    /// <summary>Reads the body as a JSON object; null with <paramref name="errors"/> filled when it is not one or too large.</summary>
    public static async Task<DesignBody?> ReadAsync(HttpRequest request, string shape, Dictionary<string, string[]> errors,
        CancellationToken cancellation)
    {
        var read = await RequestBody.ReadAsync(request, "Design requests", [RequestBody.Json], cancellation);
        // A body refused as a whole (413, 415) is answered by the exception handler with its own status.
        if (read.Refusal is { } refusal) throw new RequestRefusedException(refusal);
        string text = read.Text;
        try
        {
            if (JsonNode.Parse(text, documentOptions: new JsonDocumentOptions { MaxDepth = 32 }) is JsonObject root) return new DesignBody(root, errors);
            errors[""] = [$"must be a JSON object {shape}."];
        }
        catch (JsonException ex) { errors[""] = ["Malformed JSON: " + ex.Message]; }
        return null;
    }

    /// <summary>The base section, validated; null when missing or invalid (problems under /base/...).</summary>
    public (JsonObject? Json, SectionModel? Model) Base()
    {
        if (Root["base"] is not JsonObject b) { Errors["/base"] = ["must be the base section document (a JSON object)."]; return (null, null); }
        var json = StudyBody.CheckBase(b.ToJsonString(), "/base", Errors);
        if (json is null) return (null, null);
        var model = SectionValidator.Validate(SectionParser.Parse(json.ToJsonString(), out _)!).Model;
        return (json, model);
    }

    /// <summary>Refuses members of <paramref name="node"/> (at <paramref name="at"/>) not in <paramref name="known"/>.</summary>
    public void OnlyKnown(JsonObject node, string at, params string[] known)
    {
        foreach (var (name, _) in node)
            if (!known.Contains(name))
                Errors[$"{at}/{name}"] = [$"is not a member here; the members are {string.Join(", ", known)}."];
    }

    /// <summary>An optional number at the pointer; refused when present and not a finite number or outside [min, max].</summary>
    public double? Number(JsonObject node, string name, string at, double min = double.NegativeInfinity, double max = double.PositiveInfinity,
        string? why = null)
    {
        if (!node.TryGetPropertyValue(name, out var value) || value is null) return null;
        if (value is JsonValue v && v.TryGetValue(out double d) && double.IsFinite(d) && d >= min && d <= max) return d;
        Errors[$"{at}/{name}"] = [why ?? $"must be a finite number{(double.IsFinite(min) || double.IsFinite(max) ? FormattableString.Invariant($" from {min:G} to {max:G}") : "")}."];
        return null;
    }

    /// <summary>An optional string.</summary>
    public string? Text(JsonObject node, string name, string at)
    {
        if (!node.TryGetPropertyValue(name, out var value) || value is null) return null;
        if (value is JsonValue v && v.TryGetValue(out string? s)) return s;
        Errors[$"{at}/{name}"] = ["must be a string."];
        return null;
    }

    /// <summary>A member of the base that the pointer names and that is a number; records the problem under <paramref name="at"/>.</summary>
    public double? BaseNumber(JsonObject? baseSection, string? pointer, string at)
    {
        if (pointer is null) { Errors[at] = ["is required: a JSON pointer (RFC 6901) into the section, e.g. /cutoffs/1/tip/1."]; return null; }
        if (JsonPointer.Tokens(pointer) is not { Count: > 0 }) { Errors[at] = [$"'{pointer}' is not a JSON pointer into the section (RFC 6901), e.g. /cutoffs/1/tip/1."]; return null; }
        if (baseSection is null) return null;
        if (JsonPointer.Get(baseSection, pointer) is JsonValue v && v.TryGetValue(out double d)) return d;
        Errors[at] = [$"'{pointer}' does not name a number in the base section."];
        return null;
    }

    /// <summary>A two-number array, or null with the problem recorded.</summary>
    public double[]? Pair(JsonObject node, string name, string at, string meaning)
    {
        if (!node.TryGetPropertyValue(name, out var value) || value is null) return null;
        if (value is JsonArray { Count: 2 } a && a.All(x => x is JsonValue j && j.TryGetValue(out double d) && double.IsFinite(d)))
            return a.Select(x => x!.GetValue<double>()).ToArray();
        Errors[$"{at}/{name}"] = [$"must be two finite numbers [{meaning}]."];
        return null;
    }
}
