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

        // Stored work: listed, renamed through a typed body, deleted (then 404).
        object listed = await Call(client, "ListAnalysesAsync", null, null, null);
        Assert.Contains(((IEnumerable)Get(listed, "Items")!).Cast<object>(), i => (string?)Get(i, "Id") == id);
        var renameType = assembly.GetType("Generated.RenameDto")!;
        object rename = Activator.CreateInstance(renameType)!;
        renameType.GetProperty("Title")!.SetValue(rename, "Renamed by the generated client");
        object renamed = await Call(client, "RenameAnalysisAsync", id, rename);
        Assert.Equal("Renamed by the generated client", (string?)Get(renamed, "Title"));

        // A query enum becomes a C# enum; the PDF arrives as a binary file response.
        var report = clientType.GetMethods()
            .Single(m => m.Name == "GetAnalysisReportAsync" && m.GetParameters().Length == 3);
        var declared = report.GetParameters()[1].ParameterType;
        var formatType = Nullable.GetUnderlyingType(declared) ?? declared;
        object file = await Call(client, "GetAnalysisReportAsync", id, Enum.Parse(formatType, "Html", ignoreCase: true),
            null);
        using (var reader = new StreamReader((Stream)Get(file, "Stream")!))
            Assert.Contains("<html", await reader.ReadToEndAsync(), StringComparison.OrdinalIgnoreCase);

        await Call(client, "DeleteAnalysisAsync", id);
        var deleted = await Assert.ThrowsAnyAsync<Exception>(() => Call(client, "GetAnalysisAsync", id));
        Assert.Equal(404, (int)Get(deleted, "StatusCode")!);

        // Every operation of the document, including the design runs and imports, is a method of the client.
        using var document = System.Text.Json.JsonDocument.Parse(await http.GetStringAsync("/swagger/v1/swagger.json"));
        var methods = clientType.GetMethods().Select(m => m.Name).ToHashSet();
        var absent = document.RootElement.GetProperty("paths").EnumerateObject()
            .SelectMany(p => p.Value.EnumerateObject()).Select(o => o.Value.GetProperty("operationId").GetString() + "Async")
            .Where(name => !methods.Contains(name)).ToList();
        Assert.True(absent.Count == 0, "not in the client: " + string.Join(", ", absent));

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
