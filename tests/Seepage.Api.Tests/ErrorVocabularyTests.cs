using System.Net;
using System.Text;
using System.Text.Json;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Api.Errors;
using Seepage.Core.Meshing;
using Seepage.Core.Solvers;

namespace Seepage.Api.Tests;

/// <summary>One error vocabulary (RFC 9457 problem details): a body of the wrong type is 415 on every endpoint that
/// reads one; an unknown query value is 400 naming the parameter and its allowed values; exceptions from Core map
/// to one status each.</summary>
public class ErrorVocabularyTests
{
    private static async Task<JsonElement> Problem(HttpResponseMessage response, HttpStatusCode status)
    {
        string text = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == status, $"{(int)response.StatusCode}: {text}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        return JsonDocument.Parse(text).RootElement;
    }

    [Theory]
    [InlineData("/api/v1/analyses", "text/xml")]
    [InlineData("/api/v1/sections/validate", "application/x-www-form-urlencoded")]
    [InlineData("/api/v1/sections/system", "text/csv")]
    [InlineData("/api/v1/studies", "application/xml")]
    [InlineData("/api/v1/sections/import", "application/json")]
    public async Task Post_WrongContentType_415(string path, string type)
    {
        using var factory = new SeepageFactory();
        var response = await factory.CreateClient().PostAsync(path, new StringContent("{}", Encoding.UTF8, type));
        var problem = await Problem(response, HttpStatusCode.UnsupportedMediaType);
        Assert.Contains(RequestBody.MediaType(type), problem.GetProperty("detail").GetString());
    }

    [Theory]
    [InlineData("/api/v1/analyses/nope/report?format=docx", "format", "html, pdf")]
    [InlineData("/api/v1/studies/nope/report?figure=colour", "figure", "flow, upliftForce, exitGradient, exitFactor")]
    [InlineData("/api/v1/studies/nope/report?format=svg", "format", "html, pdf")]
    [InlineData("/api/v1/studies/nope?format=xml", "format", "json, csv")]
    public async Task Get_UnknownQueryValue_400NamingParameterAndValues(string path, string parameter, string allowed)
    {
        using var factory = new SeepageFactory();
        var problem = await Problem(await factory.CreateClient().GetAsync(path), HttpStatusCode.BadRequest);
        string message = Assert.Single(problem.GetProperty("errors").GetProperty(parameter).EnumerateArray()).GetString()!;
        Assert.Contains(allowed, message);
    }

    [Theory]
    [InlineData("/api/v1/sections/system?part=everything", "part")]
    [InlineData("/api/v1/studies?background=maybe", "background")]
    [InlineData("/api/v1/studies?format=pdf", "format")]
    public async Task Post_UnknownQueryValue_400NamingParameter(string path, string parameter)
    {
        using var factory = new SeepageFactory();
        var body = new StringContent("{}", Encoding.UTF8, "application/json");
        var response = await factory.CreateClient().PostAsync(path, body);
        var problem = await Problem(response, HttpStatusCode.BadRequest);
        Assert.True(problem.GetProperty("errors").TryGetProperty(parameter, out _), problem.ToString());
    }

    [Fact]
    public void For_CoreExceptions_OneStatusEach()
    {
        var meshing = Assert.IsType<ValidationProblem>(ProblemExceptionHandler.For(new MeshingException("crossing"), false));
        Assert.Equal(400, meshing.StatusCode);
        Assert.Equal(["crossing"], meshing.ProblemDetails.Errors[""]);

        var refused = Assert.IsType<ProblemHttpResult>(
            ProblemExceptionHandler.For(new MatrixRefusedException("linear solve", "diagonal entry -2 in row 1"), false));
        Assert.Equal(422, refused.StatusCode);
        Assert.Equal("diagonal entry -2 in row 1", refused.ProblemDetails.Extensions["reason"]);

        var stalled = Assert.IsType<ProblemHttpResult>(ProblemExceptionHandler.For(
            new SolverNotConvergedException("PCG", 7, 1e-3, 1e-10, "iteration cap reached"), false));
        Assert.Equal(422, stalled.StatusCode);
        Assert.Equal(7, stalled.ProblemDetails.Extensions["iterations"]);
        Assert.NotEqual(refused.ProblemDetails.Title, stalled.ProblemDetails.Title);

        var gone = Assert.IsType<ProblemHttpResult>(ProblemExceptionHandler.For(new OperationCanceledException(), true));
        Assert.Equal(ProblemExceptionHandler.ClientClosedRequest, gone.StatusCode);
        var late = Assert.IsType<ProblemHttpResult>(ProblemExceptionHandler.For(new OperationCanceledException(), false));
        Assert.Equal(StatusCodes.Status504GatewayTimeout, late.StatusCode);
        var fault = Assert.IsType<ProblemHttpResult>(ProblemExceptionHandler.For(new InvalidOperationException("x"), false));
        Assert.Equal(500, fault.StatusCode);
        Assert.Null(fault.ProblemDetails.Detail);
    }
}
