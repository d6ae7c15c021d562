using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using Seepage.Core.Studies;
using Seepage.Core.TargetSearch;

namespace Seepage.Api.Endpoints;

/// <summary>Reads and checks the body of POST /api/v1/target-searches; every problem is keyed by its JSON pointer.</summary>
public static class TargetSearchBody
{
    public sealed record Outcome(JsonObject? Base, TargetSearch? Search, Dictionary<string, string[]> Errors);

    private static readonly string[] Members = ["base", "member", "range", "require", "tolerance", "scanPoints"];

    public static async Task<Outcome> ReadAsync(HttpRequest request, CancellationToken cancellation)
    {
        var errors = new Dictionary<string, string[]>();
        var body = await DesignBody.ReadAsync(request, "{ \"base\", \"member\", \"range\", \"require\" }", errors, cancellation);
        if (body is null) return new Outcome(null, null, errors);
        var root = body.Root;
        body.OnlyKnown(root, "", Members);
        var (section, model) = body.Base();
        string? member = body.Text(root, "member", "");
        body.BaseNumber(section, member, "/member");
        var range = body.Pair(root, "range", "", "least-cost end, other end");
        if (root["range"] is null) errors["/range"] = ["is required: [least-cost end, other end] of the member, e.g. [-3, -15]."];
        else if (range is not null && range[0] == range[1]) errors["/range"] = ["must have two different ends."];

        var require = Requirements(body, model);
        double span = range is null ? 0 : Math.Abs(range[1] - range[0]);
        double? tolerance = body.Number(root, "tolerance", "", 0, double.MaxValue);
        if (tolerance is not null && range is not null && !(tolerance > 0 && tolerance < span))
            errors["/tolerance"] = ["must be positive and smaller than the range."];
        int scan = (int)(body.Number(root, "scanPoints", "", 3, 41, "must be a whole number from 3 to 41.") ?? TargetSearch.DefaultScanPoints);
        if (root["scanPoints"] is JsonValue sv && sv.TryGetValue(out double sd) && sd != Math.Floor(sd)) errors["/scanPoints"] = ["must be a whole number from 3 to 41."];

        if (errors.Count > 0 || section is null || member is null || range is null || require is null) return new Outcome(null, null, errors);
        // Both ends must give valid sections, so every point between them is a section the service can analyse.
        for (int end = 0; end < 2; end++)
        {
            var copy = section.DeepClone();
            JsonPointer.Set(copy, member, JsonValue.Create(range[end]));
            var doc = SectionParser.Parse(copy.ToJsonString(), out var parse);
            var problems = doc is null ? parse : SectionValidator.Validate(doc).Problems;
            if (problems.Count > 0)
                errors[$"/range/{end}"] = problems.Select(p => FormattableString.Invariant($"with {member} = {range[end]:G}: {p.Pointer} {p.Message}")).ToArray();
        }
        if (errors.Count > 0) return new Outcome(null, null, errors);
        var search = new TargetSearch(member, range[0], range[1], require, tolerance ?? TargetSearch.DefaultTolerance(range[0], range[1]), scan,
            RequirementsDefaulted: root["require"] is null);
        return new Outcome(section, search, errors);
    }

    // The requirements given, or the section's own required factors against piping and heave.
    private static TargetRequirements? Requirements(DesignBody body, SectionModel? model)
    {
        if (body.Root["require"] is null)
            return model is null ? null : new TargetRequirements(ExitFactor: model.ExitCheck.RequiredFactor,
                HeaveFactor: model.Cutoffs.Count > 0 ? model.HeaveRequiredFactor : null);
        if (body.Root["require"] is not JsonObject r)
        {
            body.Errors["/require"] = ["must be an object with any of exitFactor, heaveFactor, maxFlow, maxUpliftForce."];
            return null;
        }
        body.OnlyKnown(r, "/require", [.. TargetRequirements.Names]);
        var require = new TargetRequirements(
            body.Number(r, "exitFactor", "/require", 1e-9, 1e6, "must be a positive factor against piping."),
            body.Number(r, "heaveFactor", "/require", 1e-9, 1e6, "must be a positive factor against heave."),
            body.Number(r, "maxFlow", "/require", 1e-30, 1e6, "must be a positive flow, m³/s per m."),
            body.Number(r, "maxUpliftForce", "/require", 1e-30, 1e12, "must be a positive force, kN/m."));
        if (require.Active.Count == 0 && !body.Errors.Keys.Any(k => k.StartsWith("/require", StringComparison.Ordinal)))
            body.Errors["/require"] = ["names no requirement; give any of exitFactor, heaveFactor, maxFlow, maxUpliftForce."];
        return require;
    }
}
