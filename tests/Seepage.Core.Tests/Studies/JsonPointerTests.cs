using System.Text.Json.Nodes;
using Seepage.Core.Studies;

namespace Seepage.Core.Tests.Studies;

public class JsonPointerTests
{
    // The document and pointers of RFC 6901 (P. Bryan, K. Zyp, M. Nottingham, "JavaScript Object Notation (JSON) Pointer",
    // IETF, 2013), section 5.
    private static JsonNode Rfc() => JsonNode.Parse("""
        { "foo": ["bar", "baz"], "": 0, "a/b": 1, "c%d": 2, "e^f": 3, "g|h": 4, "i\\j": 5, "k\"l": 6, " ": 7, "m~n": 8 }
        """)!;

    [Theory]
    [InlineData("/foo/0", "\"bar\"")]
    [InlineData("/", "0")]
    [InlineData("/a~1b", "1")]
    [InlineData("/c%d", "2")]
    [InlineData("/i\\j", "5")]
    [InlineData("/k\"l", "6")]
    [InlineData("/ ", "7")]
    [InlineData("/m~0n", "8")]
    public void Get_Rfc6901Examples_FindTheValue(string pointer, string json) =>
        Assert.True(JsonNode.DeepEquals(JsonNode.Parse(json), JsonPointer.Get(Rfc(), pointer)), pointer);

    [Fact]
    public void Set_ArrayElementAndMember_ReplacesAndAdds()
    {
        var doc = JsonNode.Parse("""{ "cutoffs": [ { "tip": [14, -7] } ] }""")!;
        Assert.Null(JsonPointer.Set(doc, "/cutoffs/0/tip/1", JsonValue.Create(-9.5)));
        Assert.Null(JsonPointer.Set(doc, "/cutoffs/0/name", JsonValue.Create("deeper")));
        Assert.Equal(-9.5, doc["cutoffs"]![0]!["tip"]![1]!.GetValue<double>());
        Assert.Equal("deeper", doc["cutoffs"]![0]!["name"]!.GetValue<string>());
    }

    [Theory]
    [InlineData("cutoffs/0", "must start with '/'")]
    [InlineData("/cutoffs/3/tip", "is not in the base section")]
    [InlineData("/cutoffs/0/tip/5", "not an index")]
    [InlineData("", "whole section")]
    public void Set_BadPointer_SaysWhy(string pointer, string expected)
    {
        var doc = JsonNode.Parse("""{ "cutoffs": [ { "tip": [14, -7] } ] }""")!;
        Assert.Contains(expected, JsonPointer.Set(doc, pointer, JsonValue.Create(1.0)));
    }
}
