using Seepage.Api.Contracts;
using Seepage.Core.Imports;

namespace Seepage.Api.Reports;

/// <summary>The station tables of an analysis as CSV, header row with units.</summary>
public static class StationCsv
{
    /// <summary>Uplift stations of every structure: structure, x (m), y (m), total head (m), pore pressure (kPa).</summary>
    public static string Uplift(AnalysisResultDto r)
    {
        var rows = new List<IReadOnlyList<object?>> { new object?[] { "structure", "x (m)", "y (m)", "total head (m)", "pore pressure (kPa)" } };
        foreach (var u in r.Uplift)
            rows.AddRange(u.Stations.Select(s => new object?[] { u.Structure, s.X, s.Y, s.Head, s.Pressure }));
        return CsvText.Write(rows);
    }

    /// <summary>Exit gradient profile: x (m), averaged upward gradient, allowable gradient i_c / F (when known).</summary>
    public static string Exit(AnalysisResultDto r)
    {
        var rows = new List<IReadOnlyList<object?>> { new object?[] { "x (m)", "upward exit gradient (-)", "allowable gradient i_c/F (-)" } };
        double? allowable = r.Exit?.AllowableGradient;
        foreach (var p in r.Exit?.Profile ?? []) rows.Add(new object?[] { p.X, p.Gradient, allowable });
        return CsvText.Write(rows);
    }
}
