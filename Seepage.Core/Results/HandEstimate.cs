using Seepage.Core.Geometry;

namespace Seepage.Core.Results;

/// <summary>One hand-method estimate beside the FE: the method and its source, whether it applies to this section (and
/// why not when it does not), its discharge (m³/s per m), the exit point it predicts on the downstream face (m, null
/// when the method gives none), and the difference (Flow − FE flow)/FE flow (dimensionless).</summary>
public sealed record HandEstimate(string Method, string Source, bool Applies, string Note, double? Flow, Point2? ExitPoint,
    double? Difference);
