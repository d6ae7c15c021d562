using System.Text.Json.Nodes;
using Seepage.Core.Imports;
using Seepage.Core.Studies;
using static Seepage.Core.Tests.Imports.SpreadsheetSupport;

namespace Seepage.Core.Tests.Studies;

public class StudyCsvTests
{
    [Fact]
    public void Read_HeaderOfPointers_OneAlternativePerRow()
    {
        var problems = new List<ImportProblem>();
        var alternatives = StudyCsv.Read("""
            name,/cutoffs/1/tip/1,/heads/0/total,/cutoffs/1/tip
            # a comment row
            short pile,-6,,
            long pile,-9,7.5,
            moved,,,"[15,-8]"
            """, problems);
        Assert.True(problems.Count == 0, Describe(problems));
        Assert.Equal(["short pile", "long pile", "moved"], alternatives.Select(a => a.Name));
        Assert.Single(alternatives[0].Changes);
        Assert.Equal(-9.0, alternatives[1].Changes[0].Value!.GetValue<double>());
        Assert.Equal(7.5, alternatives[1].Changes[1].Value!.GetValue<double>());
        Assert.True(JsonNode.DeepEquals(JsonNode.Parse("[15,-8]"), alternatives[2].Changes[0].Value));
    }

    [Fact]
    public void Read_HeaderCellNotAPointer_NamesTheCell()
    {
        var problems = new List<ImportProblem>();
        StudyCsv.Read("name,/heads/0/total,pile depth\r\na,1,2\r\n", problems);
        var p = Assert.Single(problems);
        Assert.Equal("sheet 'csv' row 1 column C", p.Location);
    }

    [Fact]
    public void RunOne_PointerNotInBase_RowReportsTheProblem()
    {
        var baseSection = JsonNode.Parse(ExampleJson())!;
        var alternative = new StudyAlternative("no such pile", [new("/cutoffs/5/tip/1", JsonValue.Create(-8.0))]);
        var (row, result) = StudyRunner.RunOne(baseSection, 0, alternative, null, CancellationToken.None);
        Assert.Null(result);
        Assert.False(row.Analysed);
        Assert.Equal("/cutoffs/5/tip/1", Assert.Single(row.Problems).Pointer);
        Assert.Equal(-7.0, baseSection["cutoffs"]![1]!["tip"]![1]!.GetValue<double>());   // the base is untouched
    }

    [Fact]
    public void RunOne_ChangeMakesSectionInvalid_RowReportsValidatorProblems()
    {
        var alternative = new StudyAlternative("negative k", [new("/soils/0/kx", JsonValue.Create(-1e-4))]);
        var (row, _) = StudyRunner.RunOne(JsonNode.Parse(ExampleJson())!, 3, alternative, null, CancellationToken.None);
        Assert.Equal(3, row.Index);
        Assert.Contains(row.Problems, p => p.Pointer == "/soils/0/kx");
        Assert.Null(row.Flow);
    }
}
