using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Support;

/// <summary>Hand-built test meshes for checks of the FE stage that must not depend on the mesher.</summary>
internal static class GridMesh
{
    /// <summary>A rectangle [x0,x1]×[y0,y1] split into nx×ny cells of two triangles each, interior nodes jiggled by
    /// up to <paramref name="jiggle"/> of a cell (deterministic), one zone.</summary>
    public static Mesh Rectangle(double x0, double x1, double y0, double y1, int nx, int ny, double jiggle = 0)
    {
        var x = new double[(nx + 1) * (ny + 1)]; var y = new double[x.Length];
        var random = new Random(12345);
        for (int j = 0; j <= ny; j++)
            for (int i = 0; i <= nx; i++)
            {
                double dx = 0, dy = 0;
                if (i > 0 && i < nx && j > 0 && j < ny)
                {
                    dx = (random.NextDouble() - 0.5) * 2 * jiggle * (x1 - x0) / nx;
                    dy = (random.NextDouble() - 0.5) * 2 * jiggle * (y1 - y0) / ny;
                }
                x[j * (nx + 1) + i] = x0 + (x1 - x0) * i / nx + dx;
                y[j * (nx + 1) + i] = y0 + (y1 - y0) * j / ny + dy;
            }
        var tri = new List<int>();
        for (int j = 0; j < ny; j++)
            for (int i = 0; i < nx; i++)
            {
                int a = j * (nx + 1) + i, b = a + 1, c = a + nx + 1, d = c + 1;
                if ((i + j) % 2 == 0) tri.AddRange([a, b, d, a, d, c]); else tri.AddRange([a, b, c, b, d, c]);
            }
        var triangles = tri.ToArray();
        return new Mesh(x, y, triangles, new int[triangles.Length / 3], MeshQuality.Measure(x, y, triangles, 0));
    }
}
