namespace Seepage.Core.Results;

/// <summary>
/// Safe creep ratios by soil class, as the hand methods publish them. Values as recalled from the tables
/// (from memory; check against the originals): Lane, "Security from under-seepage: masonry dams on earth
/// foundations", Trans. ASCE 100, 1935 (weighted creep ratio C_w); Bligh, "Dams, barrages and weirs on porous
/// foundations", Engineering News 64, 1910 (line-of-creep ratio C). Bligh gives no values for clays.
/// </summary>
public static class CreepTables
{
    /// <summary>Lane's weighted creep ratios by creepClass.</summary>
    public static readonly IReadOnlyDictionary<string, double> Lane = new Dictionary<string, double>
    {
        ["very-fine-sand-or-silt"] = 8.5,
        ["fine-sand"] = 7.0,
        ["medium-sand"] = 6.0,
        ["coarse-sand"] = 5.0,
        ["fine-gravel"] = 4.0,
        ["medium-gravel"] = 3.5,
        ["coarse-gravel"] = 3.0,
        ["boulders"] = 2.5,
        ["soft-clay"] = 3.0,
        ["medium-clay"] = 2.0,
        ["hard-clay"] = 1.8,
        ["very-hard-clay"] = 1.6,
    };

    /// <summary>Bligh's line-of-creep ratios by creepClass (sands and gravels only).</summary>
    public static readonly IReadOnlyDictionary<string, double> Bligh = new Dictionary<string, double>
    {
        ["very-fine-sand-or-silt"] = 18.0,
        ["fine-sand"] = 15.0,
        ["medium-sand"] = 12.0,
        ["coarse-sand"] = 12.0,
        ["fine-gravel"] = 9.0,
        ["medium-gravel"] = 9.0,
        ["coarse-gravel"] = 9.0,
        ["boulders"] = 5.0,
    };

    public const string LaneSource = "Lane, Trans. ASCE 100 (1935): weighted creep, vertical and steeper-than-45° contacts in full, flatter ones one third";
    public const string BlighSource = "Bligh, Engineering News 64 (1910): line of creep, all contacts in full";
}
