using System.Reflection;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>The example sections shipped inside the service (invented scenarios), by name.</summary>
public sealed class ExampleCatalog
{
    private const string Prefix = "Seepage.Examples.";
    private const string Suffix = ".section.json";
    private readonly Dictionary<string, string> _json = new(StringComparer.OrdinalIgnoreCase);

    /// <summary>The example the page opens with.</summary>
    public const string DefaultName = "twin-pile-weir";

    public ExampleCatalog()
    {
        var assembly = typeof(ExampleCatalog).Assembly;
        foreach (string resource in assembly.GetManifestResourceNames().Where(r => r.StartsWith(Prefix) && r.EndsWith(Suffix)).Order())
        {
            using var reader = new StreamReader(assembly.GetManifestResourceStream(resource)!);
            _json[resource[Prefix.Length..^Suffix.Length]] = reader.ReadToEnd();
        }
    }

    public IEnumerable<string> Names => _json.Keys.Order();

    public string? Json(string name) => _json.GetValueOrDefault(name);

    public SectionDocument Document(string name) => SectionParser.Parse(_json[name], out _)!;
}
