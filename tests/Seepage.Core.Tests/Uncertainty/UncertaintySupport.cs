using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Core.Sections;
using Seepage.Core.Uncertainty;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Uncertainty;

/// <summary>Runs uncertainty studies on section documents built by the tests.</summary>
internal static class UncertaintySupport
{
    private static readonly JsonSerializerOptions Web = new(JsonSerializerDefaults.Web)
    {
        DefaultIgnoreCondition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull,
    };

    public static UncertaintyResult Run(SectionDocument doc, UncertaintyStudy study, double tolerance = 1e-12)
    {
        var node = JsonSerializer.SerializeToNode(doc, Web)!;
        return UncertaintyRunner.Run(node, Valid(doc), study, new Seepage.Core.Solvers.SolverOptions { RelativeTolerance = tolerance });
    }

    /// <summary>Vertical flow through two layers in series: thickness L1 over L2 (m), width B (m), head H (m) on top, 0 below.</summary>
    public static SectionDocument TwoLayers(double l1, double l2, double b, double h) => new()
    {
        Title = "two layers in series",
        Soils = [new() { Id = "upper", Kx = 1e-4 }, new() { Id = "lower", Kx = 1e-6 }],
        Zones = [new() { Soil = "upper", Outline = Rect(0, -l1, b, 0) }, new() { Soil = "lower", Outline = Rect(0, -l1 - l2, b, -l1) }],
        Heads = [new() { Name = "top", Along = [P(0, 0), P(b, 0)], Total = h }, new() { Name = "bottom", Along = [P(0, -l1 - l2), P(b, -l1 - l2)], Total = 0 }],
        Mesh = new() { Size = 1.0 },
        TruncationCheck = false,
    };
}
