namespace Seepage.Core.Fem;

/// <summary>
/// The quadratic (P2) triangle in barycentric coordinates λ: vertex shapes N_i = λ_i(2λ_i − 1), mid-edge shapes
/// N_ij = 4λ_iλ_j, node order v0, v1, v2, m01, m12, m20. With ∇λ_i = (b_i, c_i)/2A (see <see cref="LinearTriangle"/>)
/// the gradients are ∇N_i = (4λ_i − 1)∇λ_i and ∇N_ij = 4(λ_j∇λ_i + λ_i∇λ_j). The element matrix
/// k_ij = ∫ (∇N_i)ᵀ K ∇N_j dA has a quadratic integrand on a straight triangle, so the three-point edge-midpoint
/// rule (weights A/3) integrates it exactly.
/// </summary>
public static class QuadraticTriangle
{
    private static readonly (double, double, double)[] Midpoints = [(0.5, 0.5, 0), (0, 0.5, 0.5), (0.5, 0, 0.5)];

    /// <summary>Shape function values at barycentric (l0, l1, l2).</summary>
    public static void Shapes(double l0, double l1, double l2, Span<double> n)
    {
        n[0] = l0 * (2 * l0 - 1); n[1] = l1 * (2 * l1 - 1); n[2] = l2 * (2 * l2 - 1);
        n[3] = 4 * l0 * l1; n[4] = 4 * l1 * l2; n[5] = 4 * l2 * l0;
    }

    /// <summary>Shape gradients (1/m) at barycentric (l0, l1, l2), given the gradients of λ: gx[i], gy[i].</summary>
    public static void ShapeGradients(double l0, double l1, double l2, ReadOnlySpan<double> lx, ReadOnlySpan<double> ly,
        Span<double> gx, Span<double> gy)
    {
        gx[0] = (4 * l0 - 1) * lx[0]; gy[0] = (4 * l0 - 1) * ly[0];
        gx[1] = (4 * l1 - 1) * lx[1]; gy[1] = (4 * l1 - 1) * ly[1];
        gx[2] = (4 * l2 - 1) * lx[2]; gy[2] = (4 * l2 - 1) * ly[2];
        gx[3] = 4 * (l1 * lx[0] + l0 * lx[1]); gy[3] = 4 * (l1 * ly[0] + l0 * ly[1]);
        gx[4] = 4 * (l2 * lx[1] + l1 * lx[2]); gy[4] = 4 * (l2 * ly[1] + l1 * ly[2]);
        gx[5] = 4 * (l0 * lx[2] + l2 * lx[0]); gy[5] = 4 * (l0 * ly[2] + l2 * ly[0]);
    }

    /// <summary>Gradients of the barycentric coordinates (1/m) of a triangle; returns twice its signed area (m²).</summary>
    public static double BarycentricGradients(double x0, double y0, double x1, double y1, double x2, double y2,
        Span<double> lx, Span<double> ly)
    {
        double twoArea = LinearTriangle.Coefficients(x0, y0, x1, y1, x2, y2, lx, ly);
        for (int i = 0; i < 3; i++) { lx[i] /= twoArea; ly[i] /= twoArea; }
        return twoArea;
    }

    /// <summary>Writes the 6×6 element matrix (row-major) into <paramref name="k"/>.</summary>
    public static void Stiffness(double x0, double y0, double x1, double y1, double x2, double y2, ConductivityTensor t, Span<double> k)
    {
        Span<double> lx = stackalloc double[3], ly = stackalloc double[3], gx = stackalloc double[6], gy = stackalloc double[6];
        double weight = BarycentricGradients(x0, y0, x1, y1, x2, y2, lx, ly) / 6; // A/3
        k[..36].Clear();
        foreach (var (l0, l1, l2) in Midpoints)
        {
            ShapeGradients(l0, l1, l2, lx, ly, gx, gy);
            for (int i = 0; i < 6; i++)
            {
                double kx = t.Kxx * gx[i] + t.Kxy * gy[i], ky = t.Kxy * gx[i] + t.Kyy * gy[i];
                for (int j = 0; j < 6; j++) k[6 * i + j] += weight * (kx * gx[j] + ky * gy[j]);
            }
        }
    }
}
