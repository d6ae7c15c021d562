using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Contracts;
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
            .Produces(StatusCodes.Status200OK, contentType: "text/html")
            .Produces(StatusCodes.Status200OK, contentType: Pdf)
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable);
        analyses.MapGet("/{id}/uplift.csv", UpliftCsv)
            .WithName("GetUpliftCsv")
            .WithSummary("Uplift stations as CSV")
            .WithDescription("structure, x (m), y (m), total head (m), pore pressure (kPa), one row per station of every structure base; " +
                "?units=us gives ft and psf. The last line is the caution.")
            .Produces(StatusCodes.Status200OK, contentType: "text/csv")
            .ProducesProblem(StatusCodes.Status404NotFound);
        analyses.MapGet("/{id}/exit.csv", ExitCsv)
            .WithName("GetExitCsv")
            .WithSummary("Exit gradient profile as CSV")
            .WithDescription("x (m), averaged upward exit gradient, allowable gradient i_c/F, one row per station of the exit surface; " +
                "?units=us gives x in ft. The last line is the caution.")
            .Produces(StatusCodes.Status200OK, contentType: "text/csv")
            .ProducesProblem(StatusCodes.Status404NotFound);
        app.MapGroup("/api/v1/studies").WithTags("Reports").MapGet("/{id}/report", StudyReport)
            .WithName("GetStudyReport")
            .WithSummary("Comparison memo of a study (HTML, or PDF with ?format=pdf)")
            .WithDescription("A table of the alternatives and their key figures and a chart of one figure (?figure=flow|upliftForce|" +
                "exitGradient|exitFactor, default flow) against the first varied member whose values are numbers.")
            .Produces(StatusCodes.Status200OK, contentType: "text/html")
            .Produces(StatusCodes.Status200OK, contentType: Pdf)
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable);
        return app;
    }

    public static async Task<Results<ContentHttpResult, FileContentHttpResult, ProblemHttpResult>> AnalysisReport(string id, string? format,
        string? units, AnalysisService service, AnalysisStore store, CancellationToken cancellation)
    {
        if (Format(format) is { } bad) return bad;
        if (PresentationUnits.Parse(units) is not { } u) return UnknownUnits(units);
        var result = await service.GetAsync<AnalysisResultDto>(id, AnalysisPart.Result, cancellation);
        var field = await service.GetAsync<FieldDto>(id, AnalysisPart.Field, cancellation);
        var sectionJson = await store.GetJsonAsync(id, AnalysisPart.Section, cancellation);
        if (result is null || field is null || sectionJson is null) return NotFound("analysis", id);
        var section = SectionParser.Parse(sectionJson, out _) ?? new SectionDocument();
        return Render(AnalysisReportBuilder.Build(result, field, section, DateTimeOffset.UtcNow, u), format, $"seepage-{id}.pdf");
    }

    public static async Task<Results<ContentHttpResult, FileContentHttpResult, ProblemHttpResult>> StudyReport(string id, string? format,
        string? figure, StudyService service, CancellationToken cancellation)
    {
        if (Format(format) is { } bad) return bad;
        figure ??= "flow";
        if (!StudyReportBuilder.Figures.ContainsKey(figure))
            return TypedResults.Problem(statusCode: StatusCodes.Status400BadRequest, title: "Unknown figure.",
                detail: $"'{figure}' is not a figure; use one of {string.Join(", ", StudyReportBuilder.Figures.Keys)}.");
        if (await service.GetAsync(id, cancellation) is not { } study) return NotFound("study", id);
        return Render(StudyReportBuilder.Build(study, figure, DateTimeOffset.UtcNow), format, $"seepage-{id}.pdf");
    }

    public static async Task<Results<ContentHttpResult, ProblemHttpResult>> UpliftCsv(string id, string? units, AnalysisService service,
        CancellationToken cancellation)
    {
        if (PresentationUnits.Parse(units) is not { } u) return UnknownUnits(units);
        return await service.GetAsync<AnalysisResultDto>(id, AnalysisPart.Result, cancellation) is { } r
            ? TypedResults.Content(StationCsv.Uplift(r, u), Csv) : NotFound("analysis", id);
    }

    public static async Task<Results<ContentHttpResult, ProblemHttpResult>> ExitCsv(string id, string? units, AnalysisService service,
        CancellationToken cancellation)
    {
        if (PresentationUnits.Parse(units) is not { } u) return UnknownUnits(units);
        return await service.GetAsync<AnalysisResultDto>(id, AnalysisPart.Result, cancellation) is { } r
            ? TypedResults.Content(StationCsv.Exit(r, u), Csv) : NotFound("analysis", id);
    }

    private static ProblemHttpResult UnknownUnits(string? units) =>
        TypedResults.Problem(statusCode: StatusCodes.Status400BadRequest, title: "Unknown units.",
            detail: $"'{units}' is not a unit system; use si (default) or us (ft, ft/day, psf, kip/ft, ft³/day per ft).");

    internal static Results<ContentHttpResult, FileContentHttpResult, ProblemHttpResult> Render(ReportDocument report, string? format, string fileName)
    {
        if (!string.Equals(format, "pdf", StringComparison.OrdinalIgnoreCase)) return TypedResults.Content(HtmlReportWriter.Write(report), Html);
        if (!ReportFonts.Available)
            return TypedResults.Problem(statusCode: StatusCodes.Status503ServiceUnavailable, title: "PDF reports are unavailable on this server.",
                detail: "No TrueType font was found (install the Debian package fonts-dejavu-core); the HTML report works.");
        return TypedResults.File(PdfReportWriter.Write(report), Pdf, fileName);
    }

    internal static ProblemHttpResult? Format(string? format) =>
        format is null || format.Equals("html", StringComparison.OrdinalIgnoreCase) || format.Equals("pdf", StringComparison.OrdinalIgnoreCase) ? null
            : TypedResults.Problem(statusCode: StatusCodes.Status400BadRequest, title: "Unknown report format.",
                detail: $"'{format}' is not a report format; use html (default) or pdf.");

    private static ProblemHttpResult NotFound(string kind, string id) =>
        TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: $"No such {kind}.", detail: $"No {kind} has the id '{id}'.");
}
