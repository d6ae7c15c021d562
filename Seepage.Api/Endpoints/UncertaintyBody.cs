using System.Text.Json.Nodes;
using Seepage.Api.Contracts;
using Seepage.Api.Storage;
using Seepage.Core.Sections;
using Seepage.Core.Uncertainty;

namespace Seepage.Api.Endpoints;

/// <summary>Reads and checks the body of POST /api/v1/uncertainty-studies; every problem is keyed by its JSON pointer.</summary>
public static class UncertaintyBody
{
    public sealed record Outcome(JsonObject? Base, SectionModel? Model, UncertaintyStudy? Study, IReadOnlyList<VariableDto> Variables,
        IReadOnlyList<CorrelationDto> Correlations, string Sampling, Dictionary<string, string[]> Errors);

    private static readonly string[] Members = ["base", "variables", "samples", "seed", "sampling", "correlations"];
    private static readonly string[] VariableMembers = ["member", "distribution", "median", "cov", "mean", "sd", "range", "keepAnisotropy"];

    public static async Task<Outcome> ReadAsync(HttpRequest request, CancellationToken cancellation)
    {
        var errors = new Dictionary<string, string[]>();
        var body = await DesignBody.ReadAsync(request, "{ \"base\", \"variables\", \"samples\", \"seed\" }", errors, cancellation);
        if (body is null) return new Outcome(null, null, null, [], [], "latinHypercube", errors);
        var root = body.Root;
        body.OnlyKnown(root, "", Members);
        var (section, model) = body.Base();
        var variables = new List<UncertainVariable>();
        var echo = new List<VariableDto>();
        if (root["variables"] is not JsonArray { Count: > 0 and <= 20 } list)
            errors["/variables"] = ["must be an array of 1 to 20 random variables { member, distribution, ... }."];
        else
            for (int i = 0; i < list.Count; i++)
                if (Variable(body, section, list[i], $"/variables/{i}") is { } v)
                {
                    if (variables.Any(o => o.Member == v.Variable.Member)) errors[$"/variables/{i}/member"] = ["is already varied by another variable."];
                    variables.Add(v.Variable);
                    echo.Add(UncertaintyMapper.Echo(v.Posted, v.Variable.Distribution));
                }
        int samples = (int)(body.Number(root, "samples", "", 10, UncertaintyService.MaxSamples,
            $"must be a whole number of samples from 10 to {UncertaintyService.MaxSamples}.") ?? UncertaintyStudy.DefaultSamples);
        long seed = (long)(body.Number(root, "seed", "", 0, 9e15, "must be a whole number from 0 to 9e15.") ?? UncertaintyStudy.DefaultSeed);
        foreach (string whole in new[] { "samples", "seed" })
            if (root[whole] is JsonValue w && w.TryGetValue(out double d) && d != Math.Floor(d)) errors["/" + whole] = ["must be a whole number."];
        string sampling = body.Text(root, "sampling", "") ?? "latinHypercube";
        if (sampling is not ("latinHypercube" or "random")) errors["/sampling"] = ["must be latinHypercube (default) or random."];
        var (correlations, pairs) = Correlations(body, variables);
        if (errors.Count > 0) return new Outcome(null, null, null, [], [], sampling, errors);
        var study = new UncertaintyStudy(variables, samples, seed, sampling == "random" ? SamplingMethod.Random : SamplingMethod.LatinHypercube, pairs);
        return new Outcome(section, model, study, echo, correlations, sampling, errors);
    }

    private static (UncertainVariable Variable, VariableDto Posted)? Variable(DesignBody body, JsonObject? section, JsonNode? node, string at)
    {
        if (node is not JsonObject v) { body.Errors[at] = ["must be an object { member, distribution, ... }."]; return null; }
        body.OnlyKnown(v, at, VariableMembers);
        string? member = body.Text(v, "member", at);
        body.BaseNumber(section, member, at + "/member");
        string? kind = body.Text(v, "distribution", at);
        double? median = body.Number(v, "median", at, 1e-300), cov = body.Number(v, "cov", at, 1e-6, 10);
        double? mean = body.Number(v, "mean", at), sd = body.Number(v, "sd", at, 1e-300);
        var range = body.Pair(v, "range", at, "low, high");
        bool? keep = v["keepAnisotropy"] is JsonValue kv && kv.TryGetValue(out bool b) ? b : null;
        if (v["keepAnisotropy"] is not null && keep is null) body.Errors[at + "/keepAnisotropy"] = ["must be true or false."];
        if (range is not null && !(range[0] < range[1])) { body.Errors[at + "/range"] = ["must be [low, high] with low < high."]; return null; }
        bool conductivity = member is not null && MemberKinds.Of(member) == MemberKind.Conductivity && !member.EndsWith("beddingAngle", StringComparison.Ordinal);
        Distribution? d = kind switch
        {
            "lognormal" when range is not null && range[0] > 0 && median is null && cov is null => Distribution.LognormalOfRange(range[0], range[1]),
            "lognormal" when median is not null && cov is not null && range is null => Distribution.LognormalOfMedian(median.Value, cov.Value),
            "normal" when !conductivity && range is not null && mean is null && sd is null => Distribution.NormalOfRange(range[0], range[1]),
            "normal" when !conductivity && mean is not null && sd is not null && range is null => Distribution.NormalOf(mean.Value, sd.Value),
            "uniform" when range is not null && (!conductivity || range[0] > 0) && median is null && mean is null => Distribution.UniformOf(range[0], range[1]),
            _ => null,
        };
        if (d is null && !body.Errors.Keys.Any(k => k.StartsWith(at, StringComparison.Ordinal)))
            body.Errors[at + "/distribution"] = [kind switch
            {
                "lognormal" => "a lognormal variable takes median and cov, or range [5 %, 95 %] with both values positive.",
                "normal" when conductivity => "a conductivity cannot be normal (it would take negative values); use lognormal.",
                "normal" => "a normal variable takes mean and sd, or range [5 %, 95 %].",
                "uniform" => "a uniform variable takes range [low, high] only (positive for a conductivity).",
                _ => "must be lognormal, normal or uniform.",
            }];
        if (d is null || member is null) return null;
        return (new UncertainVariable(member, d, keep ?? true), new VariableDto(member, kind!, median, cov, mean, sd, range, keep));
    }

    private static (List<CorrelationDto>, List<VariableCorrelation>) Correlations(DesignBody body, List<UncertainVariable> variables)
    {
        var echo = new List<CorrelationDto>();
        var pairs = new List<VariableCorrelation>();
        if (body.Root["correlations"] is null) return (echo, pairs);
        if (body.Root["correlations"] is not JsonArray list) { body.Errors["/correlations"] = ["must be an array of { between: [member, member], rank }."]; return (echo, pairs); }
        for (int i = 0; i < list.Count; i++)
        {
            string at = $"/correlations/{i}";
            if (list[i] is not JsonObject c) { body.Errors[at] = ["must be { between: [member, member], rank }."]; continue; }
            body.OnlyKnown(c, at, "between", "rank");
            double? rank = body.Number(c, "rank", at, -0.99, 0.99, "must be a rank correlation from -0.99 to 0.99.");
            var between = c["between"] is JsonArray { Count: 2 } b ? b.Select(x => (x as JsonValue)?.TryGetValue(out string? s) == true ? s : null).ToArray() : null;
            int first = between is null ? -1 : variables.FindIndex(v => v.Member == between[0]);
            int second = between is null ? -1 : variables.FindIndex(v => v.Member == between[1]);
            if (first < 0 || second < 0 || first == second) { body.Errors[at + "/between"] = ["must name two different members of the variables."]; continue; }
            if (rank is null) { if (c["rank"] is null) body.Errors[at + "/rank"] = ["is required."]; continue; }
            pairs.Add(new VariableCorrelation(first, second, rank.Value));
            echo.Add(new CorrelationDto([between![0]!, between[1]!], rank.Value));
        }
        if (pairs.Count > 0 && !ImanConover.IsPositiveDefinite(variables.Count, pairs))
            body.Errors["/correlations"] = ["The rank correlations given do not form a positive definite matrix."];
        return (echo, pairs);
    }
}
