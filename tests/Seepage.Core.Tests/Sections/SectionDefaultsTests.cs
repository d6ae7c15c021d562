using Seepage.Core.Sections;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Sections;

/// <summary>The defaults are named once (<see cref="SectionDefaults"/>) and the validator applies exactly those.</summary>
public class SectionDefaultsTests
{
    [Fact]
    public void Validate_MembersLeftOut_TakeTheNamedDefaults()
    {
        var doc = SheetPile(3, 8, 12, 2) with { Mesh = null };
        var model = Valid(doc);
        Assert.Equal(SectionDefaults.WaterUnitWeight, model.WaterUnitWeight);
        Assert.Equal(SectionDefaults.ExitDepth, model.ExitCheck.Depth);
        Assert.Equal(SectionDefaults.ExitRequiredFactor, model.ExitCheck.RequiredFactor);
        Assert.Equal(SectionDefaults.HeaveRequiredFactor, model.HeaveRequiredFactor);
        Assert.Equal(SectionDefaults.MinAngle, model.Mesh.MinAngle);
        Assert.Equal(SectionDefaults.MinAngle, new Seepage.Core.Meshing.MeshOptions().MinAngle);
        Assert.Equal(10 * model.Tolerance, model.MatchTolerance, 1e-15);
    }

    // i_c = (Gs − 1)/(1 + e) = 1.65/1.65 = 1 for Gs 2.65, e 0.65 (Terzaghi, "Theoretical Soil Mechanics", 1943), so
    // the allowable gradient with the default required factor 3 is 1/3.
    [Fact]
    public void Analysis_SheetPile_AllowableGradientIsCriticalOverRequired()
    {
        var result = Seepage.Core.Analysis.Run(Valid(SheetPile(3, 8, 12, 2, size: 1.0)));
        var exit = result.Exit!;
        Assert.Equal(1.0, exit.CriticalGradient!.Value, 12);
        Assert.Equal(1.0 / 3.0, exit.AllowableGradient!.Value, 12);
        Assert.Null(SectionDefaults.AllowableGradient(null, 3));
        Assert.Null(SectionDefaults.AllowableGradient(1, 0));
    }
}
