using CsCheck;
using Seepage.Core.Meshing;

namespace Seepage.Core.Tests.Meshing;

/// <summary>Property tests over random layered sections with cutoffs (slits) and a floor. The invariants
/// are those of a constrained Delaunay quality mesh (Shewchuk, "Delaunay refinement algorithms for
/// triangular mesh generation", Comput. Geom. 22, 2002): positive orientation, conservation of the zone
/// areas, segments as unions of edges, no node inside a triangle, the angle bound (every input angle in
/// these sections is 90° or more, so it holds everywhere), and local Delaunayhood of unconstrained edges.</summary>
public class MesherPropertyTests
{
    private static readonly Gen<LayeredSection> Sections =
        Gen.Select(
            Gen.Double[20, 120], Gen.Double[5, 30],
            Gen.Double[0.1, 0.9].Array[0, 3],
            Gen.Double[0.05, 0.4].Array[0, 2],
            Gen.Select(Gen.Double[-0.45, 0.45], Gen.Double[0.05, 1.0]).Array[0, 3],
            (width, depth, interfaces, floor, cutoffs) =>
            {
                var s = new LayeredSection { Left = -width / 2, Right = width / 2, Bottom = -depth };
                foreach (double f in interfaces.Select(f => Math.Round(f, 2)).Distinct()) s.Interfaces.Add(-depth * f);
                if (floor.Length == 2) { s.FloorEnds.Add(-floor[0] * width); s.FloorEnds.Add(floor[1] * width); }
                foreach (var (fx, fd) in cutoffs)
                {
                    double x = Math.Round(fx, 2) * width;
                    if (s.Cutoffs.Any(c => Math.Abs(c.X - x) < 1e-9)) continue;
                    s.Cutoffs.Add((x, fd >= 0.99 ? -depth : -Math.Min(fd, 0.8) * depth));
                }
                s.TipSize = floor.Length == 2 ? 0.3 : 0;
                return s;
            });

    [Trait("Category", "Slow")] // property test over random sections
    [Fact]
    public void Build_RandomLayeredSections_SatisfiesMeshInvariants()
    {
        Sections.Sample(section =>
        {
            double area = (section.Right - section.Left) * -section.Bottom;
            double size = Math.Sqrt(area * 2.3 / 1500);
            if (section.TipSize > 0) section.TipSize = 0.3 * size;
            var graph = section.Build();
            var options = new MeshOptions { Size = size, MinAngle = 28 };
            // A case (about 1,500 triangles) that takes more than 60 s means the refinement loops: cancel and fail.
            using var budget = new CancellationTokenSource(TimeSpan.FromSeconds(60));
            var mesh = QualityMesher.Build(graph, options, budget.Token);
            var problems = new List<string>();
            problems.AddRange(MeshChecks.CounterClockwise(mesh));
            var levels = section.Levels();
            var areas = MeshChecks.ZoneAreas(mesh, levels.Count - 1);
            for (int k = 0; k + 1 < levels.Count; k++)
            {
                double expected = (section.Right - section.Left) * (levels[k] - levels[k + 1]);
                if (Math.Abs(areas[k] - expected) > 1e-9 * expected) problems.Add($"zone {k} area {areas[k]} != {expected}");
            }
            var constrained = new HashSet<(int, int)>();
            problems.AddRange(MeshChecks.SegmentsCovered(mesh, graph, constrained));
            problems.AddRange(MeshChecks.NoNodeInside(mesh));
            problems.AddRange(MeshChecks.LocallyDelaunay(mesh, constrained));
            if (mesh.Quality.MinAngle < options.MinAngle - 1e-9) problems.Add($"min angle {mesh.Quality.MinAngle:F3}°");
            foreach (var (x, tip) in section.Cutoffs) problems.AddRange(MeshChecks.SlitOpen(mesh, x, tip, tip > section.Bottom));
            if (problems.Count > 0) throw new Exception(string.Join("; ", problems.Take(8)));
        }, iter: int.Parse(Environment.GetEnvironmentVariable("MESH_PROPERTY_ITER") ?? "40"), print: s => $"W={s.Right - s.Left:G4} D={-s.Bottom:G4} interfaces=[{string.Join(",", s.Interfaces)}] floor=[{string.Join(",", s.FloorEnds)}] cutoffs=[{string.Join(",", s.Cutoffs)}]");
    }
}
