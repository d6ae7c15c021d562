using Seepage.Core.Fem;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Flow across each gauge polyline (m³/s per m, positive toward the normal 90° counter-clockwise from the walking
/// direction). A gauge that parts the section is read conservatively from the boundary fluxes of one side
/// (<see cref="GaugeRegions"/>); one that ends inside the soil is read from the element velocities along it
/// (<see cref="GaugeLineIntegral"/>). Both values are kept so the two can be compared.
/// </summary>
public static class GaugeCalculator
{
    public const string Conservative = "boundary fluxes of one side (conservative)";
    public const string AlongLine = "element velocities along the line";

    public static List<GaugeFlow> Compute(SectionModel section, FieldSampler sampler, double[] reactions, bool[] isFixed)
    {
        var list = new List<GaugeFlow>();
        if (section.Gauges.Count == 0) return list;
        var regions = new GaugeRegions(sampler.Field);
        foreach (var g in section.Gauges)
        {
            var (line, length) = GaugeLineIntegral.Compute(sampler, g.Along);
            double? parted = regions.Flow(g.Along, reactions, isFixed);
            list.Add(new GaugeFlow(g.Name, parted ?? line, length, parted is null ? AlongLine : Conservative, line));
        }
        return list;
    }
}
