namespace Seepage.Core.Fem;

/// <summary>
/// The linear (P1) triangle: shape-function gradients and the element conductivity matrix
/// k_ij = A (∇N_i)ᵀ K (∇N_j), A the element area. For N_i = (a_i + b_i x + c_i y) / 2A,
/// b_i = y_j − y_k and c_i = x_k − x_j over the cyclic triple (i, j, k).
/// </summary>
public static class LinearTriangle
{
    /// <summary>Twice the signed area (m²) and the unscaled gradient coefficients b, c of the three nodes.</summary>
    public static double Coefficients(double x0, double y0, double x1, double y1, double x2, double y2,
        Span<double> b, Span<double> c)
    {
        b[0] = y1 - y2; b[1] = y2 - y0; b[2] = y0 - y1;
        c[0] = x2 - x1; c[1] = x0 - x2; c[2] = x1 - x0;
        return (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0);
    }

    /// <summary>Writes the 3×3 element matrix (row-major) into <paramref name="k"/>.</summary>
    public static void Stiffness(double x0, double y0, double x1, double y1, double x2, double y2,
        ConductivityTensor t, Span<double> k)
    {
        Span<double> b = stackalloc double[3], c = stackalloc double[3];
        double twoArea = Coefficients(x0, y0, x1, y1, x2, y2, b, c);
        double scale = 1.0 / (2 * twoArea); // A · (1/2A)² = 1/(4A) = 1/(2·2A)
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++)
                k[3 * i + j] = scale * (b[i] * (t.Kxx * b[j] + t.Kxy * c[j]) + c[i] * (t.Kxy * b[j] + t.Kyy * c[j]));
    }

    /// <summary>Gradient of the head (dh/dx, dh/dy) in a triangle, dimensionless.</summary>
    public static (double Dx, double Dy) Gradient(double x0, double y0, double x1, double y1, double x2, double y2,
        double h0, double h1, double h2)
    {
        Span<double> b = stackalloc double[3], c = stackalloc double[3];
        double twoArea = Coefficients(x0, y0, x1, y1, x2, y2, b, c);
        return ((b[0] * h0 + b[1] * h1 + b[2] * h2) / twoArea, (c[0] * h0 + c[1] * h1 + c[2] * h2) / twoArea);
    }
}
