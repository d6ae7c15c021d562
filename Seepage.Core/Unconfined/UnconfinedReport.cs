namespace Seepage.Core.Unconfined;

/// <summary>How the phreatic surface was found: Picard iterations, the method in words (with the band and floor used),
/// Change = the largest nodal head change of the last iteration (m), Band (m), Floor, the linear solver iterations
/// summed over the Picard iterations, and the wall-clock seconds of the whole iteration.</summary>
public sealed record UnconfinedReport(int Iterations, string Method, double Change, double Band, double Floor,
    int LinearIterations, double Seconds);
