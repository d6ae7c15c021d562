using System.Globalization;
using Seepage.Api.Contracts;
using static Seepage.Api.Reports.ReportFormat;

namespace Seepage.Api.Reports;

/// <summary>The one caption of a flow net, shown by the page and printed in the memo: Nf with its fraction, Nd and
/// how it was chosen, Nf/Nd as the shape factor q/(k·H), which k, and whether the hand relation is exact.</summary>
public static class FlowNetCaption
{
    public static string Of(FlowNetDto net)
    {
        if (net.HeadDrops == 0) return "No flow net was drawn for this analysis.";
        string nf = net.FlowChannelsExact.ToString("0.00", CultureInfo.InvariantCulture);
        string chosen = net.HeadDropsSource == "section" ? "set by the section's flowNet.headDrops"
            : "chosen so the cells are curvilinear squares with at least four flow channels";
        string k = $"k = √(kx·ky) = {N(net.ReferenceConductivity, 3)} m/s of {net.ReferenceSoil ?? "the exit soil"}";
        string exactness = net.UniformIsotropic
            ? "The section is one isotropic soil, so q = k·H·Nf/Nd holds for the drawn net."
            : "The section is layered or anisotropic: cells are squares only in the reference soil (transformed for its " +
              "anisotropy), and q = k·H·Nf/Nd with that k is approximate; the discharge reported is the FE value.";
        return $"Flow net: Nf = {nf} flow channels (the last a part channel), Nd = {net.HeadDrops} equal head drops ({chosen}); " +
            $"Nf/Nd = {N(net.ShapeFactor, 3)} = shape factor q/(k·H), {k}, H = {N(net.HeadDifference, 3)} m. {exactness}";
    }
}
