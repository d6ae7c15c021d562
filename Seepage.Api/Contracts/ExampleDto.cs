namespace Seepage.Api.Contracts;

/// <summary>An entry of the example list: name (for /api/v1/examples/{name}), title and description.</summary>
public sealed record ExampleDto(string Name, string Title, string Description, bool IsDefault);

/// <summary>The answer of a successful section check.</summary>
public sealed record SectionCheckDto(bool Valid, IReadOnlyList<string> Warnings, SizeEstimateDto? Estimate = null);

/// <summary>Size of the analysis before it runs (approximate): triangles of the mesh, unknowns of the head solve,
/// element order, whether the convergence check adds two refined solves, the unknowns of the largest solve, and how
/// many times a plain order-1 solve that is (<c>multiplier</c>).</summary>
public sealed record SizeEstimateDto(long Triangles, long Unknowns, int Order, bool ConvergenceCheck, long LargestSolveUnknowns,
    double Multiplier);
