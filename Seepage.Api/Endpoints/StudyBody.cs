using System.Text.Json;
using System.Text.Json.Nodes;
using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Application;
using Seepage.Api.Errors;
using Seepage.Api.Storage;
using Seepage.Core.Imports;
using Seepage.Core.Sections;
using Seepage.Core.Studies;

namespace Seepage.Api.Endpoints;

/// <summary>Reads a study definition: JSON <c>{ base, alternatives }</c>, or CSV alternatives with the base named by
/// <c>?base=</c> (an analysis id or an example name). Problems are keyed by JSON pointer (JSON) or cell (CSV).</summary>
public static class StudyBody
{
    /// <summary>The base and alternatives with their problems; or the refusal of the body (413, 415).</summary>
    public sealed record Outcome(JsonObject? Base, IReadOnlyList<StudyAlternative> Alternatives,
        Dictionary<string, string[]> Errors, ProblemHttpResult? Refusal = null);

    public static async Task<Outcome> ReadAsync(HttpRequest request, string? baseName, IAnalysisStore store, ExampleCatalog catalog,
        CancellationToken cancellation)
    {
        var read = await RequestBody.ReadAsync(request, "Studies", [RequestBody.Json, RequestBody.Csv], cancellation);
        if (read.Refusal is { } refusal) return new Outcome(null, [], [], refusal);
        string body = read.Text;
        var errors = new Dictionary<string, string[]>();
        if (read.MediaType == RequestBody.Csv)
        {
            var problems = new List<ImportProblem>();
            var alternatives = StudyCsv.Read(body, problems);
            foreach (var (key, messages) in ApiProblems.Errors(problems)) errors[key] = messages;
            string? json = baseName is null ? null
                : await store.GetJsonAsync(baseName, AnalysisPart.Section, cancellation) ?? catalog.Json(baseName);
            if (json is null)
                errors["base"] = [baseName is null
                    ? "A CSV study needs ?base= naming the base section: an analysis id or an example name."
                    : $"'{baseName}' is neither a stored analysis nor an example."];
            var baseSection = json is null ? null : CheckBase(json, "", errors);
            return Finish(baseSection, alternatives, errors);
        }
        JsonNode? root;
        var options = new JsonDocumentOptions { MaxDepth = 32, AllowTrailingCommas = true, AllowDuplicateProperties = false };
        try { root = JsonNode.Parse(body, documentOptions: options); }
        catch (JsonException ex)
        {
            // A member given twice (which one would win?) or broken syntax, keyed by where the reader stopped.
            string? twice = DuplicateMemberFinder.Find(body);
            errors[twice ?? SectionParser.ToPointer(ex.Path)] = [twice is null
                ? $"is not valid JSON at line {ex.LineNumber + 1}, character {ex.BytePositionInLine + 1}: {ex.Message.Split(" LineNumber:")[0].Trim()}"
                : "is given twice in its object; give each member once (which one should count?)."];
            return new Outcome(null, [], errors);
        }
        if (root is not JsonObject obj) { errors[""] = ["A study is a JSON object { \"base\": <section>, \"alternatives\": [...] }."]; return new Outcome(null, [], errors); }
        JsonObject? section = obj["base"] is JsonObject b ? CheckBase(b.ToJsonString(), "/base", errors) : null;
        if (obj["base"] is not JsonObject) errors["/base"] = ["must be the base section document (a JSON object)."];
        var list = new List<StudyAlternative>();
        if (obj["alternatives"] is not JsonArray array) errors["/alternatives"] = ["must be an array of { \"name\", \"changes\" }."];
        else
            for (int i = 0; i < array.Count; i++)
            {
                if (array[i] is not JsonObject alt || alt["changes"] is not JsonObject changes)
                {
                    errors[$"/alternatives/{i}/changes"] = ["must be an object of JSON pointer → value, e.g. { \"/heads/0/total\": 7.5 }."];
                    continue;
                }
                foreach (var change in changes)
                    if (SectionContract.CheckPointer(change.Key) is { } why)
                        errors[$"/alternatives/{i}/changes/{change.Key.Replace("~", "~0").Replace("/", "~1")}"] = [$"'{change.Key}' {why}"];
                string name = (alt["name"] as JsonValue)?.TryGetValue(out string? n) == true && !string.IsNullOrWhiteSpace(n) ? n! : $"alternative {i + 1}";
                list.Add(new StudyAlternative(name, changes.Select(c => KeyValuePair.Create(c.Key, c.Value?.DeepClone())).ToList()));
            }
        return Finish(section, list, errors);
    }

    private static Outcome Finish(JsonObject? section, IReadOnlyList<StudyAlternative> alternatives, Dictionary<string, string[]> errors)
    {
        if (alternatives.Count == 0 && !errors.ContainsKey("/alternatives"))
            errors["/alternatives"] = ["The study has no alternatives."];
        if (alternatives.Count > StudyService.MaxAlternatives)
            errors["/alternatives"] = [$"has {alternatives.Count} alternatives; at most {StudyService.MaxAlternatives} are accepted."];
        return new Outcome(section, alternatives, errors);
    }

    // The base must be a valid section by itself; its problems are keyed under the base's pointer.
    internal static JsonObject? CheckBase(string json, string prefix, Dictionary<string, string[]> errors)
    {
        var document = SectionParser.Parse(json, out var parseProblems);
        var problems = document is null ? parseProblems : SectionValidator.Validate(document).Problems;
        foreach (var (key, messages) in ApiProblems.Errors(problems, p => prefix + p.Pointer, p => p.Message))
            errors[key.Length == 0 ? "base" : key] = messages;
        return problems.Count == 0 ? JsonNode.Parse(json) as JsonObject : null;
    }
}
