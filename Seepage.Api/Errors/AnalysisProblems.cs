using Microsoft.AspNetCore.Http.HttpResults;
using Seepage.Core.Results;
using Seepage.Core.Solvers;

namespace Seepage.Api.Errors;

/// <summary>Problem details (422) for a valid section the analysis could not finish. Every figure in them is a
/// finite JSON number or null: a residual that overflowed is reported as null beside the text of what it was.</summary>
public static class AnalysisProblems
{
    public static ProblemHttpResult NotConverged(SolverNotConvergedException ex)
    {
        // The solvers report NaN for a residual they did not measure (a failed setup) and for one that overflowed.
        string residual = double.IsFinite(ex.Residual)
            ? FormattableString.Invariant($", relative residual {ex.Residual:E3} (target {ex.Tolerance:E1})")
            : ", relative residual not a finite number (or not measured)";
        return TypedResults.Problem(statusCode: StatusCodes.Status422UnprocessableEntity,
            title: "The linear solve did not converge.",
            detail: $"{ex.Method} did not converge: {ex.Reason} after {ex.Iterations} iterations{residual}. The " +
                "section is valid, but its conductivity contrast or geometry is beyond what the solver resolves; " +
                "bring the extreme conductivities closer together.",
            extensions: new Dictionary<string, object?>
            {
                ["method"] = ex.Method, ["reason"] = ex.Reason, ["iterations"] = ex.Iterations,
                ["residual"] = Finite(ex.Residual), ["tolerance"] = Finite(ex.Tolerance),
            });
    }

    /// <summary>The assembled system was refused before solving (not symmetric positive definite).</summary>
    public static ProblemHttpResult Refused(MatrixRefusedException ex) => TypedResults.Problem(
        statusCode: StatusCodes.Status422UnprocessableEntity, title: "The assembled system was refused before solving.",
        detail: ex.Message, extensions: new Dictionary<string, object?> { ["method"] = ex.Method, ["reason"] = ex.Reason });

    public static ProblemHttpResult NonFinite(NonFiniteResultException ex) => TypedResults.Problem(
        statusCode: StatusCodes.Status422UnprocessableEntity, title: "The analysis produced a figure that is not finite.",
        detail: ex.Message, extensions: new Dictionary<string, object?> { ["member"] = ex.Member });

    // JSON has no NaN: a residual that was never computed is written as null.
    private static double? Finite(double value) => double.IsFinite(value) ? value : null;
}
