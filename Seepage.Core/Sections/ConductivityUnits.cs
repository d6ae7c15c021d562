namespace Seepage.Core.Sections;

/// <summary>The conductivity units a section may use, with their factors to m/s.</summary>
public static class ConductivityUnits
{
    /// <summary>Factor to m/s for each accepted unit name.</summary>
    public static readonly IReadOnlyDictionary<string, double> ToMetresPerSecond = new Dictionary<string, double>
    {
        ["m/s"] = 1.0,
        ["cm/s"] = 0.01,
        ["m/day"] = 1.0 / 86_400,
        ["ft/day"] = 0.3048 / 86_400,
        ["ft/min"] = 0.3048 / 60,
    };

    /// <summary>Smallest and largest conductivity accepted, m/s: from below intact clay and rock (about 1e-13) to above
    /// open gravel and rockfill (about 1), with a margin either side (common practice; e.g. the ranges tabulated by
    /// Freeze &amp; Cherry, "Groundwater", 1979, table 2.2, recalled from memory).</summary>
    public const double Smallest = 1e-16, Largest = 100;

    /// <summary>Why a conductivity (m/s) lies outside the accepted range, or null when it is inside.</summary>
    public static string? OutOfRange(double metresPerSecond) =>
        metresPerSecond < Smallest || metresPerSecond > Largest
            ? FormattableString.Invariant($"is {metresPerSecond:G3} m/s, outside the range of soils and walls ({Smallest:G1} … {Largest:G3} m/s); check the value and conductivityUnit.")
            : null;
}
