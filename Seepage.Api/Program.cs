using Seepage.Api;
using Seepage.Api.Endpoints;

var builder = WebApplication.CreateBuilder(new WebApplicationOptions { Args = args, WebRootPath = ServiceSetup.PageFolder() });
builder.Services.AddSeepageServices(builder.Configuration, builder.Environment);
builder.Services.AddSeepageOpenApi();

var app = builder.Build();
app.UseSeepageErrorHandling();
app.UseDefaultFiles();
app.UseStaticFiles();
app.UseSeepageOpenApi();
app.MapAnalysisEndpoints();
app.MapSectionEndpoints();
app.MapExampleEndpoints();
app.MapImportEndpoints();
app.MapStudyEndpoints();
app.MapTargetSearchEndpoints();
app.MapUncertaintyEndpoints();
app.MapReportEndpoints();
app.MapSystemExportEndpoints();
app.LogPageAddress();
app.Run();

/// <summary>Entry point, visible to the integration tests.</summary>
public partial class Program;
