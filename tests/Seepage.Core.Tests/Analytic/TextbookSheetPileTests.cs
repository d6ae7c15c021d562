using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Analytic;

public class TextbookSheetPileTests
{
    // A sheet-pile exercise (Das & Sobhan, "Principles of Geotechnical Engineering", 9th ed., 2018, chapter on
    // seepage; dimensions as recalled, from memory): upstream water 6 m, downstream 1.5 m above the ground, the pile
    // penetrates 3 m into a 6 m permeable layer on an impervious base, k = 4×10⁻⁴ cm/s. With s/T = 1/2 the exact
    // shape factor is K(m′)/(2K(m)) = 1/2 (m = m′ = sin 45°; Harr, "Groundwater and Seepage", 1962), so
    // q = k·H/2 = 4×10⁻⁶ m/s · 4.5 m / 2 = 9.0×10⁻⁶ m³/s per m = 0.7776 m³/day per m — the book's hand flow net
    // (Nf = 4, Nd = 8) gives the same. The layer extends 8T each side.
    [Fact]
    public void Analysis_DasSobhanSheetPile_FlowWithinOnePercentOfExact()
    {
        double t = 6, w = 48;
        var doc = new SectionDocument
        {
            ConductivityUnit = "cm/s",
            Soils = [new() { Id = "sand", Kx = 4e-4 }],
            Zones = [new() { Soil = "sand", Outline = Rect(-w, -t, w, 0) }],
            Cutoffs = [new() { Name = "sheet pile", Top = P(0, 0), Tip = P(0, -3) }],
            Heads = [new() { Name = "upstream", Along = [P(-w, 0), P(0, 0)], Total = 6 }, new() { Name = "downstream", Along = [P(0, 0), P(w, 0)], Total = 1.5 }],
            TruncationCheck = false,
        };
        var result = Seepage.Core.Analysis.Run(Valid(doc));
        double perDay = result.Flow.PerMetre * 86_400;
        Assert.True(Math.Abs(perDay / 0.7776 - 1) < 0.01, $"q = {perDay:F5} m³/day per m, exact 0.7776");
    }
}
