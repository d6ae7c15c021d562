namespace Seepage.Api.Reports;

/// <summary>
/// The units a memo or a download is written in: SI (the result document's own) or US customary (ft, ft/day, psf,
/// kip/ft, pcf, ft³/day per ft and gal/min per ft). The stored result stays SI; only what is printed converts, by the
/// exact definitions 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N and 1 US gal = 3.785411784 L (NIST Special
/// Publication 811, "Guide for the Use of the International System of Units", 2008, appendix B).
/// </summary>
public sealed class PresentationUnits
{
    private const double Foot = 0.3048, PoundForce = 4.4482216152605, Gallon = 3.785411784e-3;

    public static readonly PresentationUnits Si = new("si", 1, "m", 1, "kPa", 1, "kN/m", 1, "kN·m/m", 1, "m³/s per m",
        60_000, "L/min per m", 1, "m/s", 1, "kN/m³");

    // kPa → psf: 1000 N/m² ÷ (lbf/ft²); kN/m → kip/ft: 1000 N/m ÷ (1000 lbf/ft); m³/s per m → ft³/day per ft:
    // 86400 s/day ÷ (ft³/ft = ft²); → gal/min per ft: 60 s/min ÷ (gal/ft).
    public static readonly PresentationUnits Us = new("us", 1 / Foot, "ft", 1000 / (PoundForce / (Foot * Foot)), "psf",
        1 / (PoundForce / Foot), "kip/ft", 1 / PoundForce, "kip·ft/ft", 86_400 / (Foot * Foot), "ft³/day per ft",
        60 * Foot / Gallon, "gal/min per ft", 86_400 / Foot, "ft/day", 1000 / (PoundForce / (Foot * Foot * Foot)), "pcf");

    private PresentationUnits(string name, double length, string lengthUnit, double pressure, string pressureUnit, double force,
        string forceUnit, double moment, string momentUnit, double flow, string flowUnit, double flowAlt, string flowAltUnit,
        double conductivity, string conductivityUnit, double unitWeight, string unitWeightUnit)
    {
        (Name, LengthFactor, LengthUnit, PressureFactor, PressureUnit, ForceFactor, ForceUnit) =
            (name, length, lengthUnit, pressure, pressureUnit, force, forceUnit);
        (MomentFactor, MomentUnit, FlowFactor, FlowUnit, FlowAltFactor, FlowAltUnit) = (moment, momentUnit, flow, flowUnit, flowAlt, flowAltUnit);
        (ConductivityFactor, ConductivityUnit, UnitWeightFactor, UnitWeightUnit) = (conductivity, conductivityUnit, unitWeight, unitWeightUnit);
    }

    /// <summary>"si" or "us", as given to <c>?units=</c>.</summary>
    public string Name { get; }
    public bool IsSi => Name == "si";
    public double LengthFactor { get; }
    public string LengthUnit { get; }
    public double PressureFactor { get; }
    public string PressureUnit { get; }
    public double ForceFactor { get; }
    public string ForceUnit { get; }
    public double MomentFactor { get; }
    public string MomentUnit { get; }
    public double FlowFactor { get; }
    public string FlowUnit { get; }
    public double FlowAltFactor { get; }
    public string FlowAltUnit { get; }
    public double ConductivityFactor { get; }
    public string ConductivityUnit { get; }
    public double UnitWeightFactor { get; }
    public string UnitWeightUnit { get; }

    /// <summary>Lengths, coordinates and heads from m.</summary>
    public double? Length(double? metres) => metres * LengthFactor;
    public double? Pressure(double? kPa) => kPa * PressureFactor;
    public double? Force(double? kNPerMetre) => kNPerMetre * ForceFactor;
    public double? Moment(double? kNmPerMetre) => kNmPerMetre * MomentFactor;
    public double? Flow(double? m3PerSecondPerMetre) => m3PerSecondPerMetre * FlowFactor;
    public double? FlowAlt(double? m3PerSecondPerMetre) => m3PerSecondPerMetre * FlowAltFactor;
    public double? Conductivity(double? metresPerSecond) => metresPerSecond * ConductivityFactor;
    public double? UnitWeight(double? kNPerCubicMetre) => kNPerCubicMetre * UnitWeightFactor;

    /// <summary>The units named by <c>?units=</c> (null or empty: SI), or null for a name that is neither.</summary>
    public static PresentationUnits? Parse(string? name) => name?.Trim().ToLowerInvariant() switch
    {
        null or "" or "si" => Si,
        "us" => Us,
        _ => null,
    };
}
