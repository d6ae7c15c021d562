using Microsoft.AspNetCore.Http.HttpResults;

namespace Seepage.Api.Errors;

/// <summary>A query parameter that takes one of a fixed set of values (case-insensitive). An unknown value is
/// answered the same way on every endpoint: 400 naming the parameter and the allowed values
/// (<see cref="ApiProblems.UnknownValue"/>). The OpenAPI document lists the same values as the parameter's enum.</summary>
public sealed record QueryChoice(string Parameter, string Default, IReadOnlyList<string> Allowed, string Description)
{
    /// <summary>Report format: <c>html</c> (default) or <c>pdf</c>.</summary>
    public static readonly QueryChoice ReportFormat = new("format", "html", ["html", "pdf"],
        "Report format: html (printable page, default) or pdf.");

    /// <summary>Units of a memo or CSV table: <c>si</c> (default) or <c>us</c>.</summary>
    public static readonly QueryChoice Units = new("units", "si", ["si", "us"],
        "Units of every figure: si (default) or us (ft, ft/day, psf, kip/ft, pcf, ft³/day and gal/min per ft).");

    /// <summary>Study answer format: <c>json</c> (default) or <c>csv</c>; <c>Accept: text/csv</c> also gives CSV.</summary>
    public static readonly QueryChoice StudyFormat = new("format", "json", ["json", "csv"],
        "Answer format: json (default) or csv (one row per alternative, units in the header); Accept: text/csv " +
        "gives CSV as well.");

    /// <summary>Whether a study runs in the background: <c>false</c> (default) or <c>true</c>.</summary>
    public static readonly QueryChoice Background = new("background", "false", ["false", "true"],
        "true answers 202 at once and runs the study in the background; false (default) waits for studies of " +
        $"up to {Storage.StudyService.WaitLimit} alternatives.");

    /// <summary>Whether a target search or an uncertainty study runs in the background: <c>false</c> (default) or
    /// <c>true</c>.</summary>
    public static readonly QueryChoice RunInBackground = new("background", "false", ["false", "true"],
        "true answers 202 at once and runs the work in the background (GET its id for progress); false (default) " +
        "waits for the answer (an uncertainty study of many samples runs in the background anyway).");

    /// <summary>Which part of the assembled system to export: <c>matrix</c> (default) or <c>rhs</c>.</summary>
    public static readonly QueryChoice SystemPart = new("part", "matrix", ["matrix", "rhs"],
        "matrix (default): K_FF as a Matrix Market coordinate file; rhs: the right-hand side −K_FD h_D as an " +
        "array file.");

    /// <summary>The chosen value (the default when absent, lower case), or the 400 problem.</summary>
    public (string Value, ValidationProblem? Problem) Read(string? value)
    {
        if (string.IsNullOrEmpty(value)) return (Default, null);
        string? known = Allowed.FirstOrDefault(a => a.Equals(value, StringComparison.OrdinalIgnoreCase));
        return known is null ? (Default, ApiProblems.UnknownValue(Parameter, value, Allowed)) : (known, null);
    }
}
