using Seepage.Core.Results;
using Seepage.Core.Sections;
using Seepage.Core.Tests.Support;
using static Seepage.Core.Tests.Support.Sections;

namespace Seepage.Core.Tests.Results;

public class FlowNetTests
{
    // Single sheet pile of penetration s in a layer of thickness T (Harr, "Groundwater and Seepage", 1962, ch. 5):
    // q/(kH) = Nf/Nd = K(m′)/(2K(m)), m = sin(πs/2T); s/T = 1/2 gives m = m′ and Nf/Nd = 1/2 exactly.
    private const double T = 10, H = 4, Width = 80;

    [Fact]
    public void Build_TextbookSheetPileHalfPenetration_NfOverNdIsOneHalfWithinHalfAChannel()
    {
        var net = Net(SheetPile(0.5 * T, T, Width, H) with { Mesh = null });
        Assert.Equal("automatic", net.HeadDropsSource);
        Assert.True(net.FlowChannelsExact >= FlowNetBuilder.MinChannels, $"Nf = {net.FlowChannelsExact}");
        double tolerance = 0.5 / net.HeadDrops;
        Assert.True(Math.Abs(net.FlowChannelsExact / net.HeadDrops - 0.5) <= tolerance,
            $"Nf/Nd = {net.FlowChannelsExact:F3}/{net.HeadDrops} = {net.FlowChannelsExact / net.HeadDrops:F4}, textbook 0.5 ± {tolerance:F4}");
        Assert.True(net.UniformIsotropic);
    }

    [Fact]
    public void Build_DeepPileSmallShapeFactor_RaisesNdToFourChannels()
    {
        // s/T = 0.9: q/(kH) = K(m′)/(2K(m)) ≈ 0.24 (Harr 1962), so 12 drops would give under three channels.
        double m = Math.Sin(Math.PI * 0.9 / 2);
        double exact = Elliptic.K(Elliptic.Complement(m)) / (2 * Elliptic.K(m));
        Assert.True(exact * FlowNetBuilder.DefaultHeadDrops < 4, $"shape factor {exact}");
        var net = Net(SheetPile(0.9 * T, T, Width, H) with { Mesh = null });
        Assert.True(net.HeadDrops > FlowNetBuilder.DefaultHeadDrops, $"Nd = {net.HeadDrops}");
        Assert.True(net.FlowChannelsExact >= 4 - 1e-9, $"Nf = {net.FlowChannelsExact}");
        Assert.True(Math.Abs(net.ShapeFactor / exact - 1) < 0.02, $"S = {net.ShapeFactor}, Harr {exact}");
        Assert.Equal(net.HeadDrops - 1, net.Equipotentials.Count);
    }

    [Fact]
    public void Build_FlowLines_OneEveryKTimesHeadDropOfDischarge()
    {
        var net = Net(SheetPile(0.5 * T, T, Width, H) with { Mesh = null });
        var fractions = net.FlowLines.Select(l => l.Fraction).ToList();
        Assert.Equal(net.FlowChannels - 1, fractions.Count);
        for (int j = 0; j < fractions.Count; j++)
            Assert.Equal((j + 1) / net.FlowChannelsExact, fractions[j], 12);
    }

    [Fact]
    public void Build_SectionSetsHeadDrops_UsesThem()
    {
        var net = Net(SheetPile(0.5 * T, T, Width, H) with { Mesh = null, FlowNet = new FlowNetDocument { HeadDrops = 20 } });
        Assert.Equal(20, net.HeadDrops);
        Assert.Equal("section", net.HeadDropsSource);
        Assert.Equal(19, net.Equipotentials.Count);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(61)]
    public void Validate_HeadDropsOutOfRange_NamesTheMember(int nd)
    {
        var outcome = SectionValidator.Validate(SheetPile(5, T, Width, H) with { FlowNet = new FlowNetDocument { HeadDrops = nd } });
        Assert.Contains(outcome.Problems, p => p.Pointer == "/flowNet/headDrops");
    }

    [Theory]
    [InlineData(0.5, 12)]
    [InlineData(0.1, 40)]
    [InlineData(4.0, 6)]
    [InlineData(0.01, 60)]
    public void ChooseHeadDrops_ShapeFactor_GivesFourToTwentyFourChannelsWithinRange(double shape, int expected)
    {
        Assert.Equal(expected, FlowNetBuilder.ChooseHeadDrops(shape));
    }

    private static FlowNet Net(SectionDocument doc) => Seepage.Core.Analysis.Run(Valid(doc)).FlowNet!;
}
