using System.Text.Json;
using Seepage.Api.Contracts;
using Seepage.Api.Storage;
using Seepage.Core;
using Seepage.Core.Sections;
using Xunit.Abstractions;

namespace Seepage.Api.Tests.Storage;

/// <summary>The compact stored form of field data gives back exactly the JSON the field endpoint served before it.</summary>
public sealed class FieldCodecTests(ITestOutputHelper output)
{
    internal static FieldDto DesignExampleField()
    {
        string json = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "design-example.section.json"));
        var model = SectionValidator.Validate(SectionParser.Parse(json, out _)!).Model!;
        return ResultMapper.ToFieldDto("a0123456789abcde", Analysis.Run(model));
    }

    [Fact]
    public void EncodeDecode_DesignExample_SameJsonAndUnder200kB()
    {
        var field = DesignExampleField();
        string before = JsonSerializer.Serialize(field, AnalysisService.Json);
        FieldCodec.Decode(FieldCodec.Encode(field));      // warm up
        var clock = System.Diagnostics.Stopwatch.StartNew();
        byte[] stored = FieldCodec.Encode(field);
        double encode = clock.Elapsed.TotalMilliseconds;
        var decoded = FieldCodec.Decode(stored);
        double decode = clock.Elapsed.TotalMilliseconds - encode;
        string after = JsonSerializer.Serialize(decoded, AnalysisService.Json);
        output.WriteLine($"field JSON {before.Length / 1024.0:F0} kB, stored {stored.Length / 1024.0:F1} kB, {field.Nodes.Length} nodes; " +
            $"encode {encode:F0} ms, decode {decode:F0} ms");
        Assert.Equal(before, after);
        Assert.True(stored.Length < 200 * 1024, $"stored field is {stored.Length} bytes");
    }

    [Fact]
    public void Decode_DamagedData_Throws()
    {
        byte[] stored = FieldCodec.Encode(DesignExampleField());
        Assert.Throws<InvalidDataException>(() => FieldCodec.Decode("XXXX"u8.ToArray()));
        Assert.ThrowsAny<Exception>(() => FieldCodec.Decode(stored[..(stored.Length / 2)]));
    }
}
