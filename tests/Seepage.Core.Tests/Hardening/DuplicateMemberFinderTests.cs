using Seepage.Core.Sections;

namespace Seepage.Core.Tests.Hardening;

public class DuplicateMemberFinderTests
{
    [Theory]
    [InlineData("{\"a\":1,\"a\":2}", "/a")]
    [InlineData("{\"alternatives\":[{\"changes\":{}},{\"changes\":{\"/heads/0/total\":5,\"/heads/0/total\":4}}]}", "/alternatives/1/changes/~1heads~10~1total")]
    [InlineData("{\"x\":[1,[2,3],{\"k\":1,\"k\":1}]}", "/x/2/k")]
    public void Find_MemberGivenTwice_ItsPointer(string json, string pointer) => Assert.Equal(pointer, DuplicateMemberFinder.Find(json));

    [Theory]
    [InlineData("{\"a\":{\"b\":1},\"b\":{\"a\":1}}")]
    [InlineData("[{\"a\":1},{\"a\":2}]")]
    [InlineData("{\"a\":")] // not JSON: for the parser to report
    public void Find_NoDuplicate_Null(string json) => Assert.Null(DuplicateMemberFinder.Find(json));

    [Fact]
    public void Parse_SectionWithDuplicateMember_ProblemAtTheMember()
    {
        var doc = SectionParser.Parse("{\"title\":\"a\",\"soils\":[{\"id\":\"s\",\"kx\":1e-4,\"kx\":1e-3}]}", out var problems);
        Assert.Null(doc);
        Assert.StartsWith("/soils/0", Assert.Single(problems).Pointer);
    }
}
