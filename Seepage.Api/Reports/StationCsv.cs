using Seepage.Api.Contracts;
using Seepage.Core.Imports;

namespace Seepage.Api.Reports;

/// <summary>The station tables of an analysis as CSV: header row with units, then the stations, then the caution as the
/// last line (a CSV of engineering figures travels without the memo around it).</summary>
public static class StationCsv
{
    /// <summary>Uplift stations of every structure: structure, x, y, total head (m or ft), pore pressure (kPa or psf).</summary>
    public static string Uplift(AnalysisResultDto r, PresentationUnits? units = null)
    {
        var u = units ?? PresentationUnits.Si;
        string L = u.LengthUnit;
        var rows = new List<IReadOnlyList<object?>>
        {
            new object?[] { "structure", $"x ({L})", $"y ({L})", $"total head ({L})", $"pore pressure ({u.PressureUnit})" },
        };
        foreach (var up in r.Uplift)
            rows.AddRange(up.Stations.Select(s => new object?[] { up.Structure, u.Length(s.X), u.Length(s.Y), u.Length(s.Head), u.Pressure(s.Pressure) }));
        rows.Add(Caution(r));
        return CsvText.Write(rows);
    }

    /// <summary>Exit gradient profile: x (m or ft), averaged upward gradient, allowable gradient i_c / F (when known).</summary>
    public static string Exit(AnalysisResultDto r, PresentationUnits? units = null)
    {
        var u = units ?? PresentationUnits.Si;
        var rows = new List<IReadOnlyList<object?>>
        {
            new object?[] { $"x ({u.LengthUnit})", "upward exit gradient (-)", "allowable gradient i_c/F (-)" },
        };
        double? allowable = r.Exit?.AllowableGradient;
        foreach (var p in r.Exit?.Profile ?? []) rows.Add(new object?[] { u.Length(p.X), p.Gradient, allowable });
        rows.Add(Caution(r));
        return CsvText.Write(rows);
    }

    private static object?[] Caution(AnalysisResultDto r) => [$"# Caution: {r.Caution}"];
}
