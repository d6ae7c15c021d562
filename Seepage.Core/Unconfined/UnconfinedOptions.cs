namespace Seepage.Core.Unconfined;

/// <summary>Settings of the unconfined (free-surface) iteration. Every default is echoed in the result's method text.</summary>
public sealed record UnconfinedOptions
{
    /// <summary>Width δ of the pressure-head band over which k_r falls from 1 to the floor, as a fraction of the
    /// section's height H (highest fixed head minus lowest node, m). Default 0.001 (δ = 0.1 % of H).</summary>
    public double BandFraction { get; init; } = 0.001;

    /// <summary>Relative conductivity floor f of unsaturated soil (dimensionless). Default 1e-5: the flow carried
    /// above the phreatic surface is then of order 1e-5 of the discharge.</summary>
    public double Floor { get; init; } = 1e-5;

    /// <summary>Stop when the largest nodal head change of an iteration is below this fraction of H and the
    /// seepage-face switch is settled. Default 1e-7.</summary>
    public double Tolerance { get; init; } = 1e-7;

    /// <summary>Iteration cap; the iteration throws with its figures when it is reached. Default 1000 (the embankment
    /// example needs about 70 at its default mesh of 4,000 triangles and 566 at 362,000).</summary>
    public int MaxIterations { get; init; } = 1000;

    /// <summary>Smallest damping factor ω of the update h ← h + ω (h* − h). Default 0.05: on fine meshes the undamped
    /// map is not a contraction and a floor of 0.2 left a 200k-triangle embankment in a limit cycle.</summary>
    public double MinDamping { get; init; } = 0.05;
}
