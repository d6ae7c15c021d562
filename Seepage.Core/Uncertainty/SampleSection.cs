using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using Seepage.Core.Studies;

namespace Seepage.Core.Uncertainty;

/// <summary>Makes the section of one sample: the base section document with each variable's member set to the sample
/// value (and, for a soil's kx, its ky scaled with it or held at the base value), parsed and validated like any posted
/// section. A sample value the validator refuses (e.g. a conductivity beyond the accepted range) gives problems instead.</summary>
public sealed class SampleSection
{
    // Kept as text and parsed per sample: a parsed JsonNode fills itself lazily and is not safe to read from several threads.
    private readonly string _base;
    private readonly IReadOnlyList<UncertainVariable> _variables;

    public SampleSection(JsonNode baseSection, IReadOnlyList<UncertainVariable> variables)
    {
        _base = baseSection.ToJsonString();
        _variables = variables;
    }

    /// <summary>The section of one sample, or null with the problems (JSON pointer + message).</summary>
    public SectionModel? Make(IReadOnlyList<double> values, out IReadOnlyList<SectionProblem> problems)
    {
        var section = JsonNode.Parse(_base)!;
        var original = JsonNode.Parse(_base)!;
        var list = new List<SectionProblem>();
        for (int j = 0; j < _variables.Count; j++)
        {
            var v = _variables[j];
            if (MemberKinds.SoilOfKx(v.Member) is { } soil && Number(JsonPointer.Get(original, v.Member)) is { } kx0)
            {
                string ky = $"/soils/{soil}/ky";
                double ky0 = Number(JsonPointer.Get(original, ky)) ?? kx0;
                if (!_variables.Any(o => o.Member == ky))
                    JsonPointer.Set(section, ky, JsonValue.Create(v.KeepAnisotropy ? ky0 * values[j] / kx0 : ky0));
            }
            if (JsonPointer.Set(section, v.Member, JsonValue.Create(values[j])) is { } error) list.Add(new SectionProblem(v.Member, error));
        }
        problems = list;
        if (list.Count > 0) return null;
        var document = SectionParser.Parse(section.ToJsonString(), out var parseProblems);
        if (document is null) { problems = parseProblems; return null; }
        var outcome = SectionValidator.Validate(document);
        problems = outcome.Problems;
        return outcome.IsValid ? outcome.Model : null;
    }

    /// <summary>A JSON number as a double, else null.</summary>
    public static double? Number(JsonNode? node) => node is JsonValue value && value.TryGetValue(out double d) ? d : null;
}
