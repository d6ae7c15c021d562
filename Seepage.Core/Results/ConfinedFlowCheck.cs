using Seepage.Core.Fem;
using Seepage.Core.Sections;

namespace Seepage.Core.Results;

/// <summary>
/// Signs that a section was analysed as confined flow when it is not: negative pore pressure over a material part of
/// the soil (the solution draws water up into soil that would drain: the upper surface is a free surface, not a no-flow
/// boundary), and an exit surface that receives inflow. Both are warnings with figures; neither changes a result.
/// Negative pressure is counted by triangle, at the centroid, where the pressure head h − y is below −0.1 % of the head
/// difference (so round-off on a boundary at atmospheric pressure is not counted); "material" is more than 1 % of the
/// area (common practice).
/// </summary>
public static class ConfinedFlowCheck
{
    /// <summary>Share of the area with negative pore pressure above which a warning is given.</summary>
    public const double MaterialShare = 0.01;

    public static void Check(SectionModel section, HeadField field, ExitResult? exit, List<string> warnings)
    {
        if (exit is not null && exit.MaxGradient <= 0)
            warnings.Add("Exit gradient: the exit surface receives inflow (the upward gradient is nowhere positive on it), so it is not where water leaves and the piping check is not applicable. Check the heads (swapped?) and exitCheck.along.");
        if (section.Unconfined) return; // the phreatic surface is found: negative pressure above it is the unsaturated zone
        var mesh = field.Mesh;
        double headDifference = section.Heads.Max(h => h.Total) - section.Heads.Min(h => h.Total);
        if (section.Drains.Count > 0) headDifference = Math.Max(headDifference, section.Heads.Max(h => h.Total) - section.Drains.SelectMany(d => d.Along).Min(p => p.Y));
        double limit = -1e-3 * Math.Max(headDifference, 1e-9);
        double total = 0, negative = 0, x0 = double.MaxValue, x1 = double.MinValue, y0 = double.MaxValue, y1 = double.MinValue;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = mesh.Triangles[3 * t], b = mesh.Triangles[3 * t + 1], c = mesh.Triangles[3 * t + 2];
            double area = 0.5 * Math.Abs((mesh.X[b] - mesh.X[a]) * (mesh.Y[c] - mesh.Y[a]) - (mesh.X[c] - mesh.X[a]) * (mesh.Y[b] - mesh.Y[a]));
            total += area;
            double pressureHead = (field.Heads[a] + field.Heads[b] + field.Heads[c] - mesh.Y[a] - mesh.Y[b] - mesh.Y[c]) / 3;
            if (pressureHead >= limit) continue;
            negative += area;
            x0 = Math.Min(x0, Math.Min(mesh.X[a], Math.Min(mesh.X[b], mesh.X[c])));
            x1 = Math.Max(x1, Math.Max(mesh.X[a], Math.Max(mesh.X[b], mesh.X[c])));
            y0 = Math.Min(y0, Math.Min(mesh.Y[a], Math.Min(mesh.Y[b], mesh.Y[c])));
            y1 = Math.Max(y1, Math.Max(mesh.Y[a], Math.Max(mesh.Y[b], mesh.Y[c])));
        }
        if (total > 0 && negative / total > MaterialShare)
            warnings.Add(FormattableString.Invariant(
                $"Pore pressure is negative over {100 * negative / total:F1} % of the section's area (within x = {x0:G4} … {x1:G4} m, y = {y0:G4} … {y1:G4} m). A confined solution draws water up into soil that would drain there: the upper surface is probably a free (phreatic) surface. Check that every boundary under standing water is a head boundary, or analyse the section as unconfined flow (\"unconfined\": true)."));
    }
}
