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
    };
}
