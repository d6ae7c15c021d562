using System.Collections;

namespace Seepage.Api.Tests;

/// <summary>The OpenAPI document is good enough for a client generator: NSwag writes a C# client from it, the client
/// compiles, and it calls the running API (typed results, typed problem details) for a few operations.</summary>
[Trait("Category", "Slow")]
public class GeneratedClientTests
{
    private static async Task<object> Call(object client, string method, params object?[] arguments)
    {
        var info = client.GetType().GetMethods()
            .Single(m => m.Name == method && m.GetParameters().Length == arguments.Length);
        var task = (Task)info.Invoke(client, arguments)!;
        await task;
        return task.GetType().GetProperty("Result")!.GetValue(task)!;
    }

    private static object? Get(object target, string property) => target.GetType().GetProperty(property)!.GetValue(target);

    [Fact]
    public async Task GeneratedClient_CallsRunningApi_TypedResultsAndProblems()
    {
        using var factory = new SeepageFactory();
        var http = factory.CreateClient();
        var assembly = GeneratedClient.Compile(await GeneratedClient.SourceAsync(
            await http.GetStringAsync("/swagger/v1/swagger.json")));
        var clientType = assembly.GetType($"Generated.{GeneratedClient.ClassName}")!;
        object client = Activator.CreateInstance(clientType, http)!;

        var examples = ((IEnumerable)await Call(client, "ListExamplesAsync")).Cast<object>().ToList();
        Assert.Contains(examples, e => (string?)Get(e, "Name") == "twin-pile-weir");

        object section = await Call(client, "GetExampleAsync", "twin-pile-weir");
        Assert.Equal("SectionDocument", section.GetType().Name);
        object result = await Call(client, "CreateAnalysisAsync", section);
        string id = (string)Get(result, "Id")!;
        Assert.StartsWith("a", id);
        double flow = (double)Get(Get(result, "Flow")!, "PerMetre")!;
        Assert.True(flow > 0, $"flow {flow}");

        object stored = await Call(client, "GetAnalysisAsync", id);
        Assert.Equal(flow, (double)Get(Get(stored, "Flow")!, "PerMetre")!);

        // A query enum becomes a C# enum; the PDF arrives as a binary file response.
        var report = clientType.GetMethods()
            .Single(m => m.Name == "GetAnalysisReportAsync" && m.GetParameters().Length == 2);
        var declared = report.GetParameters()[1].ParameterType;
        var formatType = Nullable.GetUnderlyingType(declared) ?? declared;
        object file = await Call(client, "GetAnalysisReportAsync", id, Enum.Parse(formatType, "Html", ignoreCase: true));
        using (var reader = new StreamReader((Stream)Get(file, "Stream")!))
            Assert.Contains("<html", await reader.ReadToEndAsync(), StringComparison.OrdinalIgnoreCase);

        // Problems arrive as the client's typed exception with the status and the problem details.
        var missing = await Assert.ThrowsAnyAsync<Exception>(() => Call(client, "GetStudyAsync", "nope", null));
        Assert.Equal(404, (int)Get(missing, "StatusCode")!);
        var soils = (IList)Get(section, "Soils")!;
        soils[0]!.GetType().GetProperty("Kx")!.SetValue(soils[0], -1.0);
        var invalid = await Assert.ThrowsAnyAsync<Exception>(() => Call(client, "CreateAnalysisAsync", section));
        Assert.Equal(400, (int)Get(invalid, "StatusCode")!);
        var problem = Get(invalid, "Result")!;
        var errors = (IDictionary)Get(problem, "Errors")!;
        Assert.True(errors.Contains("/soils/0/kx"), string.Join(", ", errors.Keys.Cast<string>()));
    }
}
