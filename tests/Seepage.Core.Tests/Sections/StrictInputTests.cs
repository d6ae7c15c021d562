using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Sections;

/// <summary>Input the service does not understand is refused at its JSON pointer, never read as something else
/// (issue 11: misspelt members, enumerations, error texts; common practice for a contract that feeds a safety memo).</summary>
public class StrictInputTests
{
    private static JsonObject Base() => (JsonObject)JsonNode.Parse(SectionParser.Write(SheetPile(5, 10, 40, 4)))!;

    private static IReadOnlyList<SectionProblem> ParseAndValidate(JsonNode json)
    {
        var doc = SectionParser.Parse(json.ToJsonString(), out var problems);
        return doc is null ? problems : SectionValidator.Validate(doc).Problems;
    }

    private static SectionProblem Single(IReadOnlyList<SectionProblem> problems, string pointer)
    {
        string all = string.Join("\n", problems.Select(p => $"{p.Pointer}: {p.Message}"));
        Assert.True(problems.Count == 1 && problems[0].Pointer == pointer, $"expected one problem at {pointer}; got:\n{all}");
        return problems[0];
    }

    [Fact]
    public void Parse_MisspeltNestedMember_RefusedWithPointerAndSuggestion()
    {
        var json = Base();
        json["exitCheck"] = new JsonObject { ["requiredfactor"] = 10 };
        var problem = Single(ParseAndValidate(json), "/exitCheck/requiredfactor");
        Assert.Contains("did you mean `requiredFactor`?", problem.Message, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void Parse_MisspeltSoilMember_RefusedNotMadeIsotropic()
    {
        var json = Base();
        json["soils"]![0]!["kY"] = 2e-5;
        var problem = Single(ParseAndValidate(json), "/soils/0/kY");
        Assert.Contains("`ky`", problem.Message);
    }

    [Fact]
    public void Parse_UnknownTopLevelMember_RefusedButExtensionKept()
    {
        var json = Base();
        json["hedas"] = new JsonArray();
        Assert.Contains("`heads`", Single(ParseAndValidate(json), "/hedas").Message);
        json.Remove("hedas");
        json["x-project-notes"] = "kept, ignored";
        Assert.Empty(ParseAndValidate(json));
    }

    [Fact]
    public void Parse_RepeatedMember_Refused()
    {
        string text = Base().ToJsonString().Replace("\"title\":", "\"title\":\"a\",\"title\":");
        Assert.NotNull(SectionParser.Parse(text.Replace("\"title\":\"a\",", ""), out _));
        Assert.Null(SectionParser.Parse(text, out var problems));
        Assert.Equal("/title", Assert.Single(problems).Pointer);
    }

    [Theory]
    [InlineData("\"2e-4 m/s\"", "/soils/0/kx", "the text \"2e-4 m/s\"")]
    [InlineData("\"2e-4\"", "/soils/0/kx", "without quotes")]
    [InlineData("[1, 2]", "/soils/0/kx", "a list of 2 items")]
    [InlineData("1e400", "/soils/0/kx", "beyond the range")]
    public void Parse_WrongKindOfValue_SaysExpectedAndFoundWithoutInternals(string value, string pointer, string found)
    {
        string text = Base().ToJsonString().Replace("\"kx\":1E-05", "\"kx\":" + value);
        Assert.Contains(value, text);
        Assert.Null(SectionParser.Parse(text, out var problems));
        var problem = Assert.Single(problems);
        Assert.Equal(pointer, problem.Pointer);
        Assert.Contains(found, problem.Message);
        Assert.DoesNotContain("System.", problem.Message);
        Assert.DoesNotContain("byte", problem.Message);
    }

    [Fact]
    public void Parse_SyntaxError_NamesLineAndCharacter()
    {
        Assert.Null(SectionParser.Parse("{\n  \"title\": \"a\",\n  \"soils\": [ }\n}", out var problems));
        var problem = Assert.Single(problems);
        Assert.Contains("line 3", problem.Message);
        Assert.DoesNotContain("byte", problem.Message);
        Assert.DoesNotContain("System.", problem.Message);
    }

    [Theory]
    [InlineData("Fine sand")]
    [InlineData("FINE_SAND")]
    [InlineData(" fine - sand ")]
    public void Validate_CreepClassSpelling_ReadAsTheClass(string spelling)
    {
        var doc = SheetPile(5, 10, 40, 4);
        var model = Valid(doc with { Soils = [doc.Soils![0] with { CreepClass = spelling }] });
        Assert.Equal("fine-sand", model.Soils[0].CreepClass);
    }

    [Fact]
    public void Validate_UnknownCreepClass_RefusedWithTheList()
    {
        var doc = SheetPile(5, 10, 40, 4);
        var problem = Single(SectionValidator.Validate(doc with { Soils = [doc.Soils![0] with { CreepClass = "finest sand" }] }).Problems,
            "/soils/0/creepClass");
        foreach (string name in SectionEnumerations.CreepClasses) Assert.Contains(name, problem.Message);
    }

    [Fact]
    public void Validate_UnknownConductivityUnit_OneClearProblem()
    {
        var doc = SheetPile(5, 10, 40, 4) with { ConductivityUnit = "cm/sec" };
        var problem = Single(SectionValidator.Validate(doc).Problems, "/conductivityUnit");
        Assert.Contains("`cm/s`", problem.Message);
        Assert.Contains("ft/min", problem.Message);
        Assert.Empty(SectionValidator.Validate(doc with { ConductivityUnit = "CM/S" }).Problems);
    }

    [Fact]
    public void CheckPointer_StudyChangeToUnknownMember_RefusedWithSuggestion()
    {
        Assert.Null(SectionContract.CheckPointer("/cutoffs/1/tip/1"));
        Assert.Null(SectionContract.CheckPointer("/exitCheck/requiredFactor"));
        Assert.Contains("`requiredFactor`", SectionContract.CheckPointer("/exitCheck/requiredfactor"));
        Assert.Contains("`total`", SectionContract.CheckPointer("/heads/0/totl"));
        Assert.NotNull(SectionContract.CheckPointer("/heads/first/total"));
        Assert.NotNull(SectionContract.CheckPointer("/heads/0/total/1"));
    }
}
