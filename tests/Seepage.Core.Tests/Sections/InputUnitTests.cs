using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Sections;

/// <summary>Sections posted in feet, ft/day and pcf give the SI figures (issue 14, "Units of either system"). The foot is
/// 0.3048 m exactly and the pound-force 4.4482216152605 N (NIST SP 811, "Guide for the Use of the International System
/// of Units", 2008).</summary>
public class InputUnitTests
{
    private const double Foot = 0.3048;

    private static List<double[]> Feet(List<double[]> points) => points.Select(p => new[] { p[0] / Foot, p[1] / Foot }).ToList();

    // The textbook sheet pile (s/T = 1/2) in feet and ft/day: the same section as in metres and m/s.
    private static SectionDocument InFeet(SectionDocument si)
    {
        double kFtPerDay = si.Soils![0].Kx!.Value * 86_400 / Foot;
        return si with
        {
            LengthUnit = "ft",
            ConductivityUnit = "ft/day",
            Soils = [si.Soils[0] with { Kx = kFtPerDay }],
            Zones = si.Zones!.Select(z => z with { Outline = Feet(z.Outline!) }).ToList(),
            Cutoffs = si.Cutoffs!.Select(c => c with { Top = [c.Top![0] / Foot, c.Top[1] / Foot], Tip = [c.Tip![0] / Foot, c.Tip[1] / Foot] }).ToList(),
            Heads = si.Heads!.Select(h => h with { Along = Feet(h.Along!), Total = h.Total / Foot }).ToList(),
            Mesh = si.Mesh! with { Size = si.Mesh.Size / Foot },
        };
    }

    [Fact]
    public void Analysis_SheetPileInFeet_SameFlowPerMetreAsSi()
    {
        var si = SheetPile(5, 10, 40, 4, size: 1.0);
        var siResult = Analysis.Run(Valid(si));
        var usResult = Analysis.Run(Valid(InFeet(si)));
        Assert.Equal(siResult.Mesh.TriangleCount, usResult.Mesh.TriangleCount);
        Assert.True(Math.Abs(usResult.Flow.PerMetre / siResult.Flow.PerMetre - 1) < 1e-9,
            $"ft: {usResult.Flow.PerMetre:E10}, m: {siResult.Flow.PerMetre:E10} m³/s per m");
    }

    [Fact]
    public void Validate_WaterUnitWeightInPcf_ConvertedToKilonewtons()
    {
        var model = Valid(SheetPile(5, 10, 40, 4) with { UnitWeightUnit = "pcf", WaterUnitWeight = 62.4 });
        Assert.Equal(62.4 * 0.157087463, model.WaterUnitWeight, 6); // 9.802 kN/m³
    }

    [Fact]
    public void Validate_UnknownLengthUnit_RefusedWithTheList()
    {
        var problems = SectionValidator.Validate(SheetPile(5, 10, 40, 4) with { LengthUnit = "feet" }).Problems;
        Assert.Contains(problems, p => p.Pointer == "/lengthUnit" && p.Message.Contains("ft"));
    }

    [Fact]
    public void Validate_ConductivityInFtPerMin_Converted()
    {
        var doc = SheetPile(5, 10, 40, 4);
        var model = Valid(doc with { ConductivityUnit = "ft/min", Soils = [doc.Soils![0] with { Kx = 1 }] });
        Assert.Equal(0.3048 / 60, model.Soils[0].Kx, 12);
    }
}
