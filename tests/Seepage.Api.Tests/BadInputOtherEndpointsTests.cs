using System.Net;
using System.Text;
using System.Text.Json.Nodes;

namespace Seepage.Api.Tests;

/// <summary>The other entry points under bad input: studies with random changes and spreadsheet imports of damaged
/// text never reach a server error (RFC 9457 problem details for client errors; common practice).</summary>
[Trait("Category", "Slow")]
public class BadInputOtherEndpointsTests
{
    private static readonly string[] Pointers =
        ["/cutoffs/1/tip/1", "/cutoffs/0/tip", "/heads/0/total", "/soils/0/kx", "/zones/0/outline/1", "/mesh/size", "/exitCheck/depth",
         "/structures/0/base/0", "/nothing/here", "/soils/9/kx", "/heads/-1/total", "", "/mesh/order"];

    private static readonly string[] Values = ["-8.0", "\"text\"", "null", "[]", "[1,2]", "{}", "1e300", "-1", "0", "true"];

    [Fact]
    public async Task PostStudy_RandomChanges_NeverServerError()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var random = new Random(4);
        string baseSection = await client.GetStringAsync("/api/v1/examples/twin-pile-weir");
        for (int trial = 0; trial < 12; trial++)
        {
            var alternatives = new JsonArray();
            for (int a = 0; a < 3; a++)
            {
                var changes = new JsonObject();
                for (int c = 0, n = 1 + random.Next(2); c < n; c++)
                    changes[Pointers[random.Next(Pointers.Length)]] = JsonNode.Parse(Values[random.Next(Values.Length)]);
                alternatives.Add(new JsonObject { ["name"] = $"alternative {a}", ["changes"] = changes });
            }
            var body = new JsonObject { ["base"] = JsonNode.Parse(baseSection), ["alternatives"] = alternatives };
            var response = await client.PostAsync("/api/v1/studies", new StringContent(body.ToJsonString(), Encoding.UTF8, "application/json"));
            string text = await response.Content.ReadAsStringAsync();
            Assert.True((int)response.StatusCode < 500, $"trial {trial}: {(int)response.StatusCode} {text[..Math.Min(400, text.Length)]}\n{body["alternatives"]!.ToJsonString()}");
        }
    }

    [Fact]
    public async Task PostImport_DamagedCsv_NeverServerError()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var random = new Random(11);
        string template = await client.GetStringAsync("/api/v1/sections/template.csv");
        string pieces = ",;\"\n\r#()x-1e3000.5 ";
        for (int trial = 0; trial < 200; trial++)
        {
            var text = new StringBuilder(template);
            for (int k = 0, n = 1 + random.Next(6); k < n; k++)
            {
                int at = random.Next(text.Length);
                if (random.Next(2) == 0) text.Remove(at, Math.Min(1 + random.Next(12), text.Length - at));
                else text.Insert(at, pieces[random.Next(pieces.Length)]);
            }
            var response = await client.PostAsync("/api/v1/sections/import", new StringContent(text.ToString(), Encoding.UTF8, "text/csv"));
            string answer = await response.Content.ReadAsStringAsync();
            Assert.True(response.StatusCode is HttpStatusCode.OK or HttpStatusCode.BadRequest, $"trial {trial}: {(int)response.StatusCode} {answer[..Math.Min(400, answer.Length)]}");
        }
    }

    [Fact]
    public async Task PostImport_DamagedWorkbook_NeverServerError()
    {
        using var factory = new SeepageFactory();
        var client = factory.CreateClient();
        var random = new Random(3);
        byte[] workbook = await client.GetByteArrayAsync("/api/v1/sections/template.xlsx");
        for (int trial = 0; trial < 30; trial++)
        {
            byte[] bytes = trial switch
            {
                0 => [],
                1 => Encoding.UTF8.GetBytes("not a workbook"),
                _ when trial % 3 == 0 => workbook[..random.Next(workbook.Length)], // cut short
                _ => Flip(workbook, random),
            };
            var content = new ByteArrayContent(bytes);
            content.Headers.ContentType = new("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
            var response = await client.PostAsync("/api/v1/sections/import", content);
            string answer = await response.Content.ReadAsStringAsync();
            Assert.True(response.StatusCode is HttpStatusCode.OK or HttpStatusCode.BadRequest, $"trial {trial}: {(int)response.StatusCode} {answer[..Math.Min(400, answer.Length)]}");
        }
    }

    private static byte[] Flip(byte[] original, Random random)
    {
        var copy = (byte[])original.Clone();
        for (int k = 0; k < 1 + random.Next(20); k++) copy[random.Next(copy.Length)] ^= (byte)(1 + random.Next(255));
        return copy;
    }
}
