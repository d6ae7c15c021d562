using Microsoft.Extensions.Options;
using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Errors;
using Seepage.Core.Imports;
using Seepage.Core.Sections;

namespace Seepage.Api.Endpoints;

/// <summary>Sections from spreadsheets: import CSV or .xlsx in our block layout, and download filled-in templates.</summary>
public static class ImportEndpoints
{
    public static IEndpointRouteBuilder MapImportEndpoints(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/v1/sections").WithTags("Spreadsheets");
        group.MapPost("/import", Import)
            .WithName("ImportSection")
            .WithSummary("Read a section from a spreadsheet")
            .WithDescription("Reads a section from CSV (text/csv) or an .xlsx workbook (body or multipart file) laid out in blocks " +
                "(section, soils, zone vertices, structures, cutoffs, heads, drains, checks, mesh; see the templates) and validates it. " +
                "Answers 200 with the section document, ready to post to /api/v1/analyses, or 400 problem details whose errors are " +
                "keyed by the cell concerned, e.g. \"sheet 'soils' row 4 column B\".")
            .Accepts<string>(RequestBody.Csv, RequestBody.Xlsx, RequestBody.Multipart, "application/csv", "text/plain")
            .Produces<SectionDocument>(StatusCodes.Status200OK, "application/json")
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType);
        group.MapGet("/template.xlsx", (ExampleCatalog catalog) => Template(catalog, xlsx: true))
            .WithName("GetSectionTemplateXlsx")
            .WithSummary("Download the section template as an .xlsx workbook")
            .WithDescription("The example section (an invented weir) filled in, one sheet per block, with a notes sheet.")
            .Produces<byte[]>(StatusCodes.Status200OK, RequestBody.Xlsx);
        group.MapGet("/template.csv", (ExampleCatalog catalog) => Template(catalog, xlsx: false))
            .WithName("GetSectionTemplateCsv")
            .WithSummary("Download the section template as CSV")
            .WithDescription("The example section (an invented weir) filled in, all blocks on one sheet separated by blank rows.")
            .Produces<string>(StatusCodes.Status200OK, RequestBody.Csv);
        return app;
    }

    public static async Task<Results<ContentHttpResult, ValidationProblem, ProblemHttpResult>> Import(HttpRequest request,
        IOptions<ServiceLimits> limits, CancellationToken cancellation)
    {
        var body = await SpreadsheetBody.ReadAsync(request, limits.Value.Spreadsheets, cancellation);
        if (body.Refusal is { } refused) return refused;
        var import = body.Import!;
        if (import.Document is null) return Invalid(import.Problems, "The spreadsheet has cells that could not be read.");
        var outcome = SectionValidator.Validate(import.Document);
        if (!outcome.IsValid) return Invalid(import.Place(outcome.Problems), "The section in the spreadsheet has problems.");
        return TypedResults.Content(SectionParser.Write(import.Document), "application/json");
    }

    public static FileContentHttpResult Template(ExampleCatalog catalog, bool xlsx)
    {
        var doc = catalog.Document(ExampleCatalog.DefaultName);
        return xlsx
            ? TypedResults.File(SectionSpreadsheet.WriteXlsx(doc), RequestBody.Xlsx, "seepage-section.xlsx")
            : TypedResults.File(System.Text.Encoding.UTF8.GetBytes(SectionSpreadsheet.WriteCsv(doc)), RequestBody.Csv + "; charset=utf-8",
                "seepage-section.csv");
    }

    private static ValidationProblem Invalid(IReadOnlyList<ImportProblem> problems, string title) =>
        ApiProblems.Invalid(ApiProblems.Errors(problems), title,
            $"{problems.Count} problem(s) found; each is listed under the cell concerned (sheet, row, column).");
}
