using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Results;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;

namespace Seepage.Core;

/// <summary>Everything one analysis produced: the engineering figures, the field for drawing, and the reports of
/// each stage. Units as in the component records (m, m/s, m³/s per m, kPa, kN/m).</summary>
public sealed record AnalysisResult(
    SectionModel Section,
    Mesh Mesh,
    HeadField Field,
    FlowSummary Flow,
    IReadOnlyList<UpliftResult> Uplift,
    ExitResult? Exit,
    IReadOnlyList<HeaveResult> Heave,
    CreepResult? Creep,
    SolveReport Solver,
    FlowNet? FlowNet,
    IReadOnlyList<string> Warnings,
    double Seconds)
{
    /// <summary>The method of independent variables beside the FE values (null when the section is not one level
    /// floor with one to three vertical cutoffs hanging from it).</summary>
    public IndependentVariableResult? IndependentVariables { get; init; }

    /// <summary>Flow across each gauge of the section, m³/s per m.</summary>
    public IReadOnlyList<GaugeFlow> Gauges { get; init; } = [];

    /// <summary>Convergence of the key figures over two uniform refinements (null unless mesh.convergenceCheck).</summary>
    public ConvergenceResult? Convergence { get; init; }

    /// <summary>The lateral-boundary truncation check (null when not run).</summary>
    public TruncationResult? Truncation { get; init; }

    /// <summary>How the phreatic surface was found (null for a confined section).</summary>
    public Unconfined.UnconfinedReport? Unconfined { get; init; }

    /// <summary>The phreatic surface (p = 0) polylines, m, upstream first; empty for a confined section.</summary>
    public IReadOnlyList<PhreaticLine> PhreaticSurface { get; init; } = [];

    /// <summary>Flow out of each seepage face, its exit point and wetted length; empty for a confined section.</summary>
    public IReadOnlyList<SeepageFaceResult> SeepageFaces { get; init; } = [];

    /// <summary>The hand methods for a homogeneous embankment beside the FE (null when none applies).</summary>
    public EmbankmentHandMethods? HandMethods { get; init; }

    /// <summary>The caution every report carries.</summary>
    public const string Caution =
        "These results depend on the idealised section and the soil data given. They support, and never replace, " +
        "review by a licensed geotechnical engineer; local codes govern the required factors of safety.";
}
