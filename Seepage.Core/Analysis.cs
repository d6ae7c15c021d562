using System.Diagnostics;
using Seepage.Core.Fem;
using Seepage.Core.Meshing;
using Seepage.Core.Results;
using Seepage.Core.Sections;
using Seepage.Core.Solvers;
using Seepage.Core.Unconfined;

namespace Seepage.Core;

/// <summary>
/// Runs the pipeline in order: section → planar graph → mesh → K and fixed heads → condensed SPD system
/// K_FF h_F = −K_FD h_D → solve → head field → figures (flow, uplift, exit gradient, heave, creep, flow net).
/// Each stage returns plain data; nothing reaches back.
/// </summary>
public static class Analysis
{
    public static AnalysisResult Run(SectionModel section, AnalysisOptions? options = null, CancellationToken cancellation = default)
    {
        options ??= new AnalysisOptions();
        var clock = Stopwatch.StartNew();
        var warnings = new List<string>(section.Warnings);

        var stage = options.StageDone ?? (_ => { });
        var mesh = MakeMesh(section, warnings, cancellation);
        stage("mesh");
        var free = section.Unconfined ? UnconfinedSolver.Solve(section, mesh, options.Unconfined, options.Solver, cancellation) : null;
        FieldSolution solution;
        if (free is not null) solution = free.Solution;
        else
        {
            var problem = FieldSolver.Assemble(section, mesh, section.Mesh.Order);
            stage("assembly");
            solution = FieldSolver.Solve(problem, mesh, options.Solver, cancellation);
        }
        stage("solve");
        var (field, boundary, fixedHeads, report) = (solution.Field, solution.Boundary, solution.FixedHeads, solution.Report);
        double tolerance = section.MatchTolerance;

        var (flow, reactions) = FlowCalculator.Compute(solution.System, field.Heads, boundary, section, tolerance, solution.Quadratic);
        var sampler = new FieldSampler(field);
        var uplift = UpliftCalculator.Compute(section, field, boundary, tolerance);
        var exit = ExitGradientCalculator.Compute(section, sampler, boundary, tolerance, warnings);
        ConfinedFlowCheck.Check(section, field, exit, warnings);
        var heave = HeaveCalculator.Compute(section, sampler, warnings);
        var exitSoil = ExitSoil(section, sampler, exit);
        var creep = CreepCalculator.Compute(section, exitSoil);
        var independent = IndependentVariableCalculator.Compute(section, sampler, exit, warnings);
        var gauges = GaugeCalculator.Compute(section, sampler, reactions, fixedHeads.IsFixed);
        stage("figures");
        var convergence = section.Mesh.ConvergenceCheck && !Skipped(free, "mesh.convergenceCheck", warnings)
            ? ConvergenceCheck.Run(section, solution, options.Solver, warnings, cancellation) : null;
        stage("convergence");
        // The first-order estimate costs nothing and always runs unless the section turns the check off; the wider
        // solve follows where needed when asked for, or automatically for small models.
        var truncation = section.TruncationCheck == false || Skipped(free, "truncationCheck", warnings) ? null
            : TruncationCheck.Run(section, solution, flow.PerMetre, s => MakeMesh(s, [], cancellation), options.Solver,
                section.TruncationCheck ?? mesh.TriangleCount < TruncationCheck.AutomaticBelowTriangles, warnings, cancellation);
        stage("truncation");

        FlowNet? net = null;
        if (options.FlowNet)
        {
            // The flow net is drawn from the vertex heads (the P1 part of a quadratic field).
            // Linear elements: ψ from the element velocities by a walk (no solve); quadratic ones solve for it. An internal
            // drain is a sink inside the domain, so ψ is not single-valued and no flow lines are drawn.
            var psi = section.Drains.Any(d => d.Internal)
                ? NoFlowLines(warnings)
                : StreamFunctionWalk.Solve(field, boundary, cancellation)
                    ?? StreamFunctionSolver.Solve(field, boundary, SparsityPattern.Of(mesh), fixedHeads.IsFixed, warnings, cancellation);
            stage("streamFunction");
            double high = section.Heads.Max(h => h.Total), low = section.Heads.Min(h => h.Total);
            if (section.Drains.Count > 0) low = Math.Min(low, section.Drains.SelectMany(d => d.Along).Min(p => p.Y));
            var reference = ConductivityTensor.Of(exitSoil);
            net = FlowNetBuilder.Build(field, psi, flow.PerMetre, high, low, reference.Mean,
                options.HeadDrops ?? section.FlowNetHeadDrops, field.ElementFactors?.Select(f => f >= 0.5).ToArray()) with
            {
                ReferenceSoil = exitSoil.Id,
                UniformIsotropic = exitSoil.Kx == exitSoil.Ky
                    && section.Zones.All(z => section.Soils[z.Soil] is var s && s.Kx == exitSoil.Kx && s.Ky == exitSoil.Ky),
            };
            stage("flowNet");
        }
        if (Math.Abs(flow.Balance) > 1e-6)
            warnings.Add(FormattableString.Invariant($"Flow balance: inflow and outflow differ by {flow.Balance:P4}."));
        var result = new AnalysisResult(section, mesh, field, flow, uplift, exit, heave, creep, report, net, warnings,
            clock.Elapsed.TotalSeconds)
        {
            IndependentVariables = independent, Gauges = gauges, Convergence = convergence, Truncation = truncation,
            Unconfined = free?.Report,
            PhreaticSurface = free is null ? [] : PhreaticSurfaceTracer.Trace(mesh, field.Heads),
            SeepageFaces = free is null ? [] : SeepageFaceCalculator.Compute(section, boundary, fixedHeads, free.FaceNodes, reactions, tolerance),
            HandMethods = free is null ? null : EmbankmentHandMethods.For(section, flow.PerMetre),
        };
        FiniteResultGuard.Check(result);
        return result;
    }

    // The re-analyses on other meshes solve the confined problem; for an unconfined section they are not run (and
    // the warning says so) rather than giving figures of a different problem.
    private static bool Skipped(UnconfinedSolution? free, string member, List<string> warnings)
    {
        if (free is null) return false;
        warnings.Add($"{member} was not run: it is not yet available for unconfined sections.");
        return true;
    }

    private static double[]? NoFlowLines(List<string> warnings)
    {
        warnings.Add("Flow lines were not drawn: a drain inside the domain takes water from both sides, so no single "
            + "stream function describes the flow. Equipotentials are drawn.");
        return null;
    }

    /// <summary>Meshes the section (planar graph, then quality triangulation with slits at the cutoffs).</summary>
    /// <summary>Meshes and assembles a section without solving it: the condensed SPD system K_FF h_F = −K_FD h_D,
    /// e.g. to export it in Matrix Market form for checking with other tools.</summary>
    public static LinearSystem AssembleSystem(SectionModel section, CancellationToken cancellation = default)
    {
        var mesh = MakeMesh(section, [], cancellation);
        return FieldSolver.Assemble(section, mesh, section.Mesh.Order).System;
    }

    public static Mesh MakeMesh(SectionModel section, List<string> warnings, CancellationToken cancellation = default)
    {
        // Strong grading at singular points (tips, corners): the flow error there dominates otherwise.
        var options = new MeshOptions { Size = section.Mesh.Size, MinAngle = section.Mesh.MinAngle, SingularRefinement = 0.02 };
        var graph = SectionGraphBuilder.Build(section, options);
        var mesh = QualityMesher.Build(graph, options, cancellation);
        warnings.AddRange(mesh.Warnings);
        return mesh;
    }

    // The soil at the exit (or, without an exit check, of the first zone): its creep class and conductivity
    // serve the hand checks and the flow-net reference.
    private static Soil ExitSoil(SectionModel section, FieldSampler sampler, ExitResult? exit)
    {
        if (exit is not null)
        {
            int t = sampler.Locate(new Seepage.Core.Geometry.Point2(exit.AtX, exit.AtY - section.MatchTolerance));
            if (t >= 0) return section.Soils[section.Zones[sampler.Field.Mesh.Zones[t]].Soil];
        }
        return section.Soils[section.Zones[0].Soil];
    }
}
