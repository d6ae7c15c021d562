using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Application;
using Seepage.Api.Contracts;
using Seepage.Api.Errors;
using Seepage.Api.OpenApi;
using Seepage.Api.Reports;
using Seepage.Api.Storage;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>Design memos (HTML or PDF) and CSV station tables, built from the stored JSON of an analysis or a study.</summary>
public static class ReportEndpoints
{
    private const string Pdf = "application/pdf", Html = "text/html; charset=utf-8", Csv = "text/csv; charset=utf-8";

    public static IEndpointRouteBuilder MapReportEndpoints(this IEndpointRouteBuilder app)
    {
        var analyses = app.MapGroup("/api/v1/analyses").WithTags("Reports");
        analyses.MapGet("/{id}/report", AnalysisReport)
            .WithName("GetAnalysisReport")
            .WithSummary("Design memo of an analysis (HTML, or PDF with ?format=pdf)")
            .WithDescription("A printable memo: caution, inputs (soils with units, geometry figure, heads), flow net, uplift diagram, exit " +
                "gradient profile with the allowable line, the figures-and-checks table (achieved and required factors, pass/fail), methods " +
                "and sources, mesh and solver statistics. Vector figures (inline SVG; PDF drawing). Built from the stored analysis. ?units=us " +
                "writes every figure in US customary units (ft, ft/day, psf, kip/ft, pcf, ft³/day and gal/min per ft); default si.")
            .Produces<string>(StatusCodes.Status200OK, "text/html")
            .Produces<byte[]>(StatusCodes.Status200OK, Pdf)
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithMetadata(QueryChoice.ReportFormat, QueryChoice.Units, ParameterNote.AnalysisId);
        analyses.MapGet("/{id}/uplift.csv", UpliftCsv)
            .WithName("GetUpliftCsv")
            .WithSummary("Uplift stations as CSV")
            .WithDescription("structure, x (m), y (m), total head (m), pore pressure (kPa), one row per station of every structure base; " +
                "?units=us gives ft and psf. The last line is the caution.")
            .Produces<string>(StatusCodes.Status200OK, "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(QueryChoice.Units, ParameterNote.AnalysisId);
        analyses.MapGet("/{id}/exit.csv", ExitCsv)
            .WithName("GetExitCsv")
            .WithSummary("Exit gradient profile as CSV")
            .WithDescription("x (m), averaged upward exit gradient, allowable gradient i_c/F, one row per station of the exit surface; " +
                "?units=us gives x in ft. The last line is the caution.")
            .Produces<string>(StatusCodes.Status200OK, "text/csv")
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .WithMetadata(QueryChoice.Units, ParameterNote.AnalysisId);
        app.MapGroup("/api/v1/studies").WithTags("Reports").MapGet("/{id}/report", StudyReport)
            .WithName("GetStudyReport")
            .WithSummary("Comparison memo of a study (HTML, or PDF with ?format=pdf)")
            .WithDescription("A table of the alternatives and their key figures and a chart of one figure (?figure=flow|upliftForce|" +
                "exitGradient|exitFactor, default flow) against the first varied member whose values are numbers.")
            .Produces<string>(StatusCodes.Status200OK, "text/html")
            .Produces<byte[]>(StatusCodes.Status200OK, Pdf)
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithMetadata(QueryChoice.ReportFormat, StudyFigure, ParameterNote.StudyId);
        return app;
    }

    public static async Task<Results<ContentHttpResult, FileContentHttpResult, ValidationProblem, ProblemHttpResult>> AnalysisReport(
        string id, string? format, string? units, AnalysisService service, IAnalysisStore store,
        CancellationToken cancellation)
    {
        var (chosen, badFormat) = QueryChoice.ReportFormat.Read(format);
        if (badFormat is not null) return badFormat;
        var (system, badUnits) = QueryChoice.Units.Read(units);
        if (badUnits is not null) return badUnits;
        var result = await service.GetResultAsync(id, cancellation);
        var field = await service.GetFieldAsync(id, cancellation);
        var sectionJson = await store.GetJsonAsync(id, AnalysisPart.Section, cancellation);
        if (result is null || field is null || sectionJson is null) return NotFound("analysis", id);
        // The memo is written from the section in SI (a section posted in ft and pcf is converted as the analysis was).
        var section = SectionUnits.ToSi(SectionParser.Parse(sectionJson, out _) ?? new SectionDocument(), []);
        var report = AnalysisReportBuilder.Build(result, field, section, DateTimeOffset.UtcNow,
            PresentationUnits.Parse(system)!);
        return Render(report, chosen, $"seepage-{id}.pdf");
    }

    public static async Task<Results<ContentHttpResult, FileContentHttpResult, ValidationProblem, ProblemHttpResult>> StudyReport(
        string id, string? format, string? figure, StudyService service, CancellationToken cancellation)
    {
        var (chosen, badFormat) = QueryChoice.ReportFormat.Read(format);
        if (badFormat is not null) return badFormat;
        var (chart, badFigure) = StudyFigure.Read(figure);
        if (badFigure is not null) return badFigure;
        if (await service.GetAsync(id, cancellation) is not { } study) return NotFound("study", id);
        return Render(StudyReportBuilder.Build(study, chart, DateTimeOffset.UtcNow), chosen, $"seepage-{id}.pdf");
    }

    public static async Task<Results<ContentHttpResult, ValidationProblem, ProblemHttpResult>> UpliftCsv(string id,
        string? units, AnalysisService service, CancellationToken cancellation)
    {
        var (system, badUnits) = QueryChoice.Units.Read(units);
        if (badUnits is not null) return badUnits;
        return await service.GetResultAsync(id, cancellation) is { } r
            ? TypedResults.Content(StationCsv.Uplift(r, PresentationUnits.Parse(system)!), Csv) : NotFound("analysis", id);
    }

    public static async Task<Results<ContentHttpResult, ValidationProblem, ProblemHttpResult>> ExitCsv(string id,
        string? units, AnalysisService service, CancellationToken cancellation)
    {
        var (system, badUnits) = QueryChoice.Units.Read(units);
        if (badUnits is not null) return badUnits;
        return await service.GetResultAsync(id, cancellation) is { } r
            ? TypedResults.Content(StationCsv.Exit(r, PresentationUnits.Parse(system)!), Csv) : NotFound("analysis", id);
    }

    /// <summary>The memo as HTML, or as PDF for <paramref name="format"/> <c>pdf</c> (503 when no font is installed).</summary>
    internal static Results<ContentHttpResult, FileContentHttpResult, ValidationProblem, ProblemHttpResult> Render(
        ReportDocument report, string format, string fileName)
    {
        if (format != "pdf") return TypedResults.Content(HtmlReportWriter.Write(report), Html);
        if (!ReportFonts.Available)
            return TypedResults.Problem(statusCode: StatusCodes.Status503ServiceUnavailable, title: "PDF reports are unavailable on this server.",
                detail: "No TrueType font was found (install the Debian package fonts-dejavu-core); the HTML report works.");
        return TypedResults.File(PdfReportWriter.Write(report), Pdf, fileName);
    }

    /// <summary>The figure charted by a study report: one of <see cref="StudyReportBuilder.Figures"/>, default flow.</summary>
    public static readonly QueryChoice StudyFigure = new("figure", "flow", [.. StudyReportBuilder.Figures.Keys],
        "The figure charted against the first varied member: flow (m³/s per m, default), upliftForce (kN/m), " +
        "exitGradient or exitFactor.");

    private static ProblemHttpResult NotFound(string kind, string id) => ApiProblems.NotFound(kind, id);
}
