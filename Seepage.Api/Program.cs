using Seepage.Api;
using Seepage.Api.Admission;
using Seepage.Api.Endpoints;
using Seepage.Api.Storage;

var builder = WebApplication.CreateBuilder(new WebApplicationOptions { Args = args, WebRootPath = ServiceSetup.PageFolder() });
builder.Services.AddSeepageServices(builder.Configuration, builder.Environment);
builder.Services.AddSeepageOpenApi();
builder.Services.AddSeepageAdmission(builder.Configuration);

var app = builder.Build();
app.UseSeepageSecurityHeaders();
app.UseSeepageErrorHandling();
app.UseSeepageAdmission();
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
app.MapStoredWorkEndpoints();
app.MapSeepageHealth();
app.MapReportEndpoints();
app.MapSystemExportEndpoints();
app.LogPageAddress();
app.Run();

/// <summary>Entry point, visible to the integration tests.</summary>
public partial class Program;
