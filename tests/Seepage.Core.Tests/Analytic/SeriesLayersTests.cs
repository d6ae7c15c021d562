using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class SeriesLayersTests
{
    // Darcy's law for layers in series (Darcy, "Les fontaines publiques de la ville de Dijon", 1856; e.g. Harr,
    // "Groundwater and Seepage", 1962, ch. 1): vertical flow through layers of thickness Lᵢ and conductivity kᵢ
    // gives q = B·H / Σ(Lᵢ/kᵢ) over a width B. The exact head is piecewise linear with kinks on mesh edges, so P1
    // reproduces it and the flow agrees to round-off.
    // With a contrast of 10⁶ the reactions in the pervious layers are differences of terms about k_max/k_min
    // times larger than the flow, so round-off (ε ≈ 2e-16) limits the agreement to about 1e-7 there.
    [Theory]
    [InlineData(1e-4, 1e-5, 1e-6, 1e-9)]
    [InlineData(1e-3, 1e-9, 1e-3, 1e-7)] // contrast 10⁶ between neighbours
    public void Analysis_LayersInSeries_MatchesDarcy(double k1, double k2, double k3, double tolerance)
    {
        double width = 10, h = 5;
        double[] thickness = [3, 2, 4];
        double[] k = [k1, k2, k3];
        var doc = new SectionDocument
        {
            Soils = [new() { Id = "a", Kx = k1 }, new() { Id = "b", Kx = k2 }, new() { Id = "c", Kx = k3 }],
            Zones = [new() { Soil = "a", Outline = Rect(0, -3, width, 0) }, new() { Soil = "b", Outline = Rect(0, -5, width, -3) },
                     new() { Soil = "c", Outline = Rect(0, -9, width, -5) }],
            Heads = [new() { Name = "top", Along = [P(0, 0), P(width, 0)], Total = h }, new() { Name = "bottom", Along = [P(0, -9), P(width, -9)], Total = 0 }],
            Mesh = new() { Size = 1.0 },
        };
        // A tight solver tolerance: this checks the discretisation, which is exact here, not the stopping rule.
        var options = new AnalysisOptions { Solver = new Seepage.Core.Solvers.SolverOptions { RelativeTolerance = 1e-14 } };
        var result = Seepage.Core.Analysis.Run(Valid(doc), options);
        double exact = width * h / (thickness[0] / k[0] + thickness[1] / k[1] + thickness[2] / k[2]);
        Assert.Equal(1.0, result.Flow.Inflow / exact, tolerance);
        Assert.Equal(1.0, result.Flow.Outflow / exact, tolerance);
    }
}
