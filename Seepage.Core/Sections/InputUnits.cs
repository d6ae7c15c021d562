namespace Seepage.Core.Sections;

/// <summary>Units a section may be posted in besides SI: lengths (<c>lengthUnit</c>) and unit weights
/// (<c>unitWeightUnit</c>). The validator converts to metres and kN/m³; the result document is always SI.</summary>
public static class InputUnits
{
    /// <summary>Metres per unit of <c>lengthUnit</c>: the international foot is exactly 0.3048 m.</summary>
    public static readonly IReadOnlyDictionary<string, double> LengthToMetres = new Dictionary<string, double>
    {
        ["m"] = 1.0,
        ["ft"] = 0.3048,
    };

    /// <summary>kN/m³ per unit of <c>unitWeightUnit</c>: 1 lbf/ft³ = 4.4482216152605 N / 0.028316846592 m³
    /// = 0.157087463 kN/m³ (exact definitions of the pound-force and the foot, NIST SP 811, 2008).</summary>
    public static readonly IReadOnlyDictionary<string, double> UnitWeightToKilonewtons = new Dictionary<string, double>
    {
        ["kN/m3"] = 1.0,
        ["pcf"] = 4.4482216152605e-3 / 0.028316846592,
    };
}
