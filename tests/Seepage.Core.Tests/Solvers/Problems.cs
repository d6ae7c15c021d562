namespace Seepage.Core.Tests.Solvers;

/// <summary>The test sections, built on <see cref="GridProblem"/>.</summary>
internal static class Problems
{
    /// <summary>Vertical flow through horizontal layers in series: head <paramref name="top"/> on y = H,
    /// 0 on y = 0, no-flow sides. Layer i (from the bottom) has thickness L_i and conductivity k_i.
    /// The exact head is piecewise linear in y with kinks on the layer interfaces, so it lies in the P1
    /// space when the interfaces are grid lines (integer thicknesses in metres here), and the discrete flow equals Darcy's series formula
    /// q = W ΔH / Σ(L_i / k_i) up to the solver error.</summary>
    public static GridProblem Layers(int nx, int cellsPerMetre, double width, double[] thickness, double[] k, double top,
        double anisotropy = 1)
    {
        double height = thickness.Sum();
        var interfaces = new double[thickness.Length];
        double y = 0;
        for (int i = 0; i < thickness.Length; i++) { y += thickness[i]; interfaces[i] = y; }
        (double, double) Conductivity(double _, double yc)
        {
            int layer = 0;
            while (layer < interfaces.Length - 1 && yc > interfaces[layer]) layer++;
            return (anisotropy * k[layer], k[layer]);
        }
        return new GridProblem(nx, (int)Math.Round(cellsPerMetre * height), width, height, Conductivity,
            (_, yv) => Near(yv, height) ? top : Near(yv, 0) ? 0.0 : null);
    }

    /// <summary>A harder case: heads fixed only on two short stretches of the top edge (a weir's head- and
    /// tailwater, no-flow elsewhere), two layers with contrast <paramref name="contrast"/> and horizontal
    /// anisotropy kx/ky = <paramref name="anisotropy"/>.</summary>
    public static GridProblem PartialHeads(int n, double contrast, double anisotropy)
    {
        const double width = 4, height = 1;
        return new GridProblem(4 * n, n, width, height,
            (_, yc) => yc > 0.6 * height ? (anisotropy, 1.0) : (anisotropy / contrast, 1.0 / contrast),
            (xv, yv) => !Near(yv, height) ? null : xv <= 0.5 * width / 4 + 1e-9 ? 5.0 : xv >= width - 0.5 * width / 4 - 1e-9 ? 1.0 : null);
    }

    private static bool Near(double a, double b) => Math.Abs(a - b) < 1e-9;
}
