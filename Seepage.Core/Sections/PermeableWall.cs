using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// A permeable wall of finite thickness (a slurry wall or grout curtain): a strip of Thickness (m) centred on the
/// line from Top to Tip, of isotropic conductivity K (m/s). It enters the analysis as a zone of its own soil.
/// </summary>
public sealed record PermeableWall(string Name, Point2 Top, Point2 Tip, double Thickness, double K)
{
    /// <summary>The strip's four corners, counter-clockwise.</summary>
    public IReadOnlyList<Point2> Strip()
    {
        var d = Tip - Top;
        double len = d.Length;
        var n = new Point2(-d.Y / len * Thickness / 2, d.X / len * Thickness / 2);
        var ring = new List<Point2> { Top - n, Tip - n, Tip + n, Top + n };
        if (PolygonMath.SignedArea(ring) < 0) ring.Reverse();
        return ring;
    }
}
