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

    /// <summary>Study answer format: <c>json</c> (default) or <c>csv</c>; <c>Accept: text/csv</c> also gives CSV.</summary>
    public static readonly QueryChoice StudyFormat = new("format", "json", ["json", "csv"],
        "Answer format: json (default) or csv (one row per alternative, units in the header); Accept: text/csv " +
        "gives CSV as well.");

    /// <summary>Whether a study runs in the background: <c>false</c> (default) or <c>true</c>.</summary>
    public static readonly QueryChoice Background = new("background", "false", ["false", "true"],
        "true answers 202 at once and runs the study in the background; false (default) waits for studies of " +
        $"up to {Storage.StudyService.WaitLimit} alternatives.");

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
