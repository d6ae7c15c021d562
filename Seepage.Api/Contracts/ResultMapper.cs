using System.Text.Json;
using System.Text.Json.Nodes;
using Seepage.Core;
using Seepage.Core.Sections;
using Seepage.Core.Geometry;
using Seepage.Core.Results;

namespace Seepage.Api.Contracts;

/// <summary>The one place where Core results become response contracts.</summary>
public static class ResultMapper
{
    public static AnalysisResultDto ToDto(string id, DateTimeOffset createdAt, AnalysisResult r)
    {
        var checks = CheckSummary.Of(r);
        var (pass, covers) = CheckSummary.Overall(checks);
        var f = r.Flow;
        var flow = new FlowDto(f.PerMetre, "m³/s per m", f.Inflow, f.Outflow, f.Balance, f.PerMetre * 86_400, f.PerMetre * 60_000,
            f.Boundaries.Select(b => new BoundaryFlowDto(b.Name, b.Kind, b.Flow)).ToList(),
            r.Section.StructureLength, f.PerMetre * r.Section.StructureLength, f.PerMetre * r.Section.StructureLength * 86_400);
        var uplift = r.Uplift.Select(u => new UpliftDto(u.Structure,
            u.Stations.Select(s => new UpliftStationDto(s.X, s.Y, s.Head, s.Pressure)).ToList(),
            u.Force, u.CentroidX, u.MomentAboutDownstreamToe, u.DownstreamToeX,
            u.Junctions.Select(j => new UpliftJunctionDto(j.Cutoff, j.X, j.UpstreamFacePercent, j.DownstreamFacePercent)).ToList())).ToList();
        ExitDto? exit = r.Exit is { } e
            ? new ExitDto(e.MaxGradient, [e.AtX, e.AtY], e.CriticalGradient, e.Factor, e.RequiredFactor, e.Pass, e.Depth, e.Method,
                e.Profile.Select(p => new ExitProfilePointDto(p.X, p.Gradient, p.RowGradient)).ToList(),
                e.RowGradientAtMax, e.MaxRowGradient, [e.MaxRowX, e.MaxRowY], e.AllowableGradient)
            : null;
        var heave = r.Heave.Select(h => new HeaveDto(h.Cutoff, h.Depth, h.AverageExcessHead, h.Factor, h.RequiredFactor, h.Pass,
            h.EffectiveWeight, h.PrismUpliftForce, [h.PrismFromX, h.PrismToX, h.SurfaceY], Skipped: h.Skipped)).ToList();
        CreepDto? creep = r.Creep is { } c ? new CreepDto(Creep(c.Lane), Creep(c.Bligh)) : null;
        var q = r.Mesh.Quality;
        var mesh = new MeshStatsDto(q.Nodes, q.Triangles, q.MinAngle, q.MaxAngle, q.MinAngleHistogram, q.Seconds);
        var s = r.Solver;
        var solver = new SolverStatsDto(s.Method, s.Levels, s.OperatorComplexity, s.Unknowns, s.Iterations, s.Residual, s.Seconds);
        return new AnalysisResultDto(id, r.Section.Title, createdAt, flow, uplift, exit, heave, creep, mesh, solver,
            r.Warnings, AnalysisResult.Caution, r.Seconds, Independent(r.IndependentVariables),
            r.Gauges.Select(g => new GaugeDto(g.Name, g.Flow, g.Length, g.Method, g.LineIntegral)).ToList(),
            r.Convergence is { } cv ? new ConvergenceDto(cv.Triangles, cv.Figures.Select(x =>
                new ConvergenceFigureDto(x.Name, x.Unit, x.Values, x.ObservedOrder, x.Extrapolated, x.EstimatedError)).ToList()) : null,
            r.Truncation is { } tr ? new TruncationDto(tr.LeftX, tr.RightX, tr.ExtendedLeftX, tr.ExtendedRightX, tr.Flow, tr.ExtendedFlow, tr.Change,
                tr.Method) : null,
            PhreaticSurface: r.PhreaticSurface.Select(l => new PhreaticLineDto(Line(l.Points))).ToList(),
            SeepageFaces: r.SeepageFaces.Select(x => new SeepageFaceDto(x.Name, x.Flow, Pair(x.ExitPoint), x.WettedLength)).ToList(),
            Unconfined: r.Unconfined is { } u ? new UnconfinedDto(u.Iterations, u.Method, u.Change, u.Band, u.Floor, u.LinearIterations, u.Seconds) : null,
            HandMethods: r.HandMethods is { } hm ? new HandMethodsDto(hm.ReservoirDepth, hm.Estimates.Select(x =>
                new HandEstimateDto(x.Method, x.Source, x.Applies, x.Note, x.Flow, Pair(x.ExitPoint), x.Difference)).ToList()) : null)
            with { Checks = checks.Select(c => new CheckDto(c.Check, c.Pass, c.Skipped)).ToList(), Pass = pass, PassCovers = covers,
                AnalysedSection = r.Section.Analysed is { } a ? JsonNode.Parse(SectionParser.Write(a)) : null,
                Assumptions = r.Section.Assumptions.Select(x => new AssumptionDto(x.Member, JsonSerializer.SerializeToNode(x.Value), x.Unit,
                    x.Origin, x.Note)).ToList() };
    }

    private static double[]? Pair(Point2? p) => p is { } v ? [Math.Round(v.X, 5), Math.Round(v.Y, 5)] : null;

    private static UnconfinedFieldDto? UnconfinedField(AnalysisResult r)
    {
        if (r.Unconfined is null || r.Field.ElementFactors is not { } kr) return null;
        var p = Seepage.Core.Results.PhreaticSurfaceTracer.PressureHead(r.Mesh, r.Field.Heads);
        return new UnconfinedFieldDto(p.Select(v => Math.Round(v, 6)).ToArray(), kr.Select(Significant).ToArray(),
            r.PhreaticSurface.Select(l => Line(l.Points)).ToList());
    }

    public static FieldDto ToFieldDto(string id, AnalysisResult r)
    {
        var m = r.Mesh;
        var nodes = new double[m.NodeCount][];
        for (int i = 0; i < m.NodeCount; i++) nodes[i] = [Math.Round(m.X[i], 6), Math.Round(m.Y[i], 6)];
        var triangles = new int[m.TriangleCount][];
        for (int t = 0; t < m.TriangleCount; t++) triangles[t] = [m.Triangles[3 * t], m.Triangles[3 * t + 1], m.Triangles[3 * t + 2]];
        var net = r.FlowNet;
        var equipotentials = net?.Equipotentials.Select(e => new EquipotentialDto(e.Head, e.Paths.Select(Line).ToList())).ToList() ?? [];
        var flowLines = net?.FlowLines.SelectMany(l => l.Paths.Select(p => new FlowLineDto(l.Fraction, Line(p)))).ToList() ?? [];
        var counts = net is null ? new FlowNetDto(0, 0, 0, 0)
            : new FlowNetDto(net.FlowChannels, net.HeadDrops, net.ShapeFactor, net.HeadDifference, net.FlowChannelsExact,
                net.HeadDropsSource, net.ReferenceConductivity, net.ReferenceSoil, net.UniformIsotropic);
        counts = counts with { Caption = Reports.FlowNetCaption.Of(counts) };
        var walls = r.Section.Cutoffs.Select(c => Line([c.Top, c.Tip]))
            .Concat(r.Section.Structures.Select(s => Line(s.Base))).ToList();
        var gradients = new double[m.TriangleCount][];
        var velocities = new double[m.TriangleCount][];
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var (gx, gy) = r.Field.Gradient(t);
            var (vx, vy) = r.Field.Velocity(t);
            gradients[t] = [Significant(gx), Significant(gy)];
            velocities[t] = [Significant(vx), Significant(vy)];
        }
        return new FieldDto(id, nodes, triangles, m.Zones, r.Field.Heads.Take(m.NodeCount).Select(h => Math.Round(h, 6)).ToArray(),
            equipotentials, flowLines, counts, walls, gradients, velocities,
            r.Section.Zones.Select(z => r.Section.Soils[z.Soil].Id).ToList(),
            WaterUnitWeight: r.Section.WaterUnitWeight, Unconfined: UnconfinedField(r));
    }

    private static IndependentVariablesDto? Independent(IndependentVariableResult? v) => v is null ? null :
        new(v.Structure, v.FloorLength, v.FloorThickness, v.HeadDifference,
            v.Piles.Select(p => new KeyPointPileDto(p.Cutoff, p.Position, p.X, p.Depth, Key(p.E), Key(p.D), Key(p.C))).ToList(),
            v.ExitGradient, v.FeExitGradient, v.FeRowExitGradient, v.CorrectionsApplied, v.CorrectionsNotApplied, v.Notes, v.Source);

    private static KeyPointDto Key(KeyPoint k) => new(k.Basic, k.Correction, k.Corrected, k.Fe, k.Difference);

    // Six significant figures keep the field document small without losing what a drawing needs.
    private static double Significant(double v)
    {
        if (v == 0 || !double.IsFinite(v)) return 0;
        int digits = 5 - (int)Math.Floor(Math.Log10(Math.Abs(v)));
        return digits > 15 ? v : Math.Round(v, Math.Max(digits, 0));
    }

    private static CreepCheckDto Creep(CreepCheck c) => new(c.WeightedLength, c.Ratio, c.Required, c.Pass, c.Source, c.Skipped);

    private static double[][] Line(IReadOnlyList<Point2> points) =>
        points.Select(p => new[] { Math.Round(p.X, 5), Math.Round(p.Y, 5) }).ToArray();
}
