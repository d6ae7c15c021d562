using Seepage.Core.Geometry;

namespace Seepage.Core.Sections;

/// <summary>
/// Checks a section document against the contract and the physics, and builds the <see cref="SectionModel"/>.
/// Every problem found is reported (with its JSON pointer), not just the first.
/// </summary>
public static class SectionValidator
{
    /// <summary>Largest number of input vertices accepted (all outlines and polylines together).</summary>
    public const int MaxVertices = 20_000;

    /// <summary>Largest number of triangles a requested mesh size may lead to (estimated from area / size²).</summary>
    public const int MaxEstimatedTriangles = 4_000_000;

    public static ValidationOutcome Validate(SectionDocument doc)
    {
        var problems = new List<SectionProblem>();
        var warnings = new List<string>();
        var reader = new PointReader(problems);

        var posted = doc;
        doc = SectionUnits.ToSi(doc, problems);
        // An unknown unit is one problem: NaN keeps the conductivity range checks from adding follow-on ones.
        string? unit = SectionEnumerations.Read(doc.ConductivityUnit, "m/s", SectionEnumerations.ConductivityUnits,
            "/conductivityUnit", problems);
        double unitFactor = unit is null ? double.NaN : ConductivityUnits.ToMetresPerSecond[unit];

        double gammaW = doc.WaterUnitWeight ?? SectionDefaults.WaterUnitWeight;
        if (!double.IsFinite(gammaW) || gammaW < 5 || gammaW > 15)
            problems.Add(new("/waterUnitWeight", "must lie between 5 and 15 kN/m³ (fresh water 9.81, sea water about 10.05)."));

        var soils = ReadSoils(doc.Soils, unitFactor, problems);
        var zones = ReadZones(doc.Zones, soils, reader, problems, warnings);
        int vertexCount = (doc.Zones?.Sum(z => z?.Outline?.Count ?? 0) ?? 0) + (doc.Heads?.Sum(h => h?.Along?.Count ?? 0) ?? 0)
            + (doc.Drains?.Sum(h => h?.Along?.Count ?? 0) ?? 0) + (doc.SeepageFaces?.Sum(f => f?.Along?.Count ?? 0) ?? 0)
            + (doc.Structures?.Sum(s => s?.Base?.Count ?? 0) ?? 0)
            + 2 * (doc.Cutoffs?.Count ?? 0);
        if (vertexCount > MaxVertices)
            problems.Add(new("", $"has {vertexCount} vertices; at most {MaxVertices} are accepted."));

        Domain? domain = null;
        double tolerance = 1e-6;
        if (zones is not null && zones.Count > 0 && problems.All(p => !p.Pointer.StartsWith("/zones", StringComparison.Ordinal)))
        {
            domain = new Domain(zones.Select(z => z.Outline));
            double extent = Extent(zones);
            tolerance = GeometricTolerance.Input * extent;
            ZoneTilingCheck.Check(domain, tolerance, problems);
        }

        var structures = ReadPolylines(doc.Structures?.Select(s => s is null ? null : Entry(s.Name, s.Base)).ToList(), "/structures", "base", "structure",
            "the base polyline", domain, tolerance, reader, problems)
            .Where(x => x.Line is not null).Select(x => new Structure(x.Name, x.Line!)).ToList();
        var heads = ReadHeads(doc.Heads, domain, tolerance, reader, problems);
        // A drain may also run inside the domain (a chimney filter, a blanket on a zone interface): the mesher
        // carries it as an internal constraint and it takes water from both sides.
        var drains = ReadPolylines(doc.Drains?.Select(d => d is null ? null : Entry(d.Name, d.Along)).ToList(), "/drains", "along", "drain",
            "the drain polyline", domain, tolerance, reader, problems, mayRunInside: true)
            .Where(x => x.Line is not null).Select(x => new DrainBoundary(x.Name, x.Line!)
            { Internal = domain is not null && !domain.PolylineOnBoundary(x.Line!, tolerance * 10) }).ToList();
        var faces = ReadPolylines(doc.SeepageFaces?.Select(f => f is null ? null : Entry(f.Name, f.Along)).ToList(), "/seepageFaces",
            "along", "seepage face", "the seepage face polyline", domain, tolerance, reader, problems)
            .Where(x => x.Line is not null).Select(x => new SeepageFace(x.Name, x.Line!)).ToList();
        bool unconfined = doc.Unconfined ?? false;
        if (!unconfined && doc.SeepageFaces is { Count: > 0 })
            problems.Add(new("/seepageFaces", "needs \"unconfined\": true; a confined section has no seepage face (use a drain)."));
        BoundaryConflictCheck.Check(doc, tolerance * 10, problems);
        var cutoffSet = CutoffReader.Read(doc.Cutoffs, domain, tolerance, unitFactor, reader, problems);
        var cutoffs = cutoffSet.Cutoffs;

        if (doc.Heads is not null && heads.Count > 0 && drains.Count == 0 && faces.Count == 0 && heads.Select(h => h.Total).Distinct().Count() == 1
            && problems.All(p => !p.Pointer.StartsWith("/heads", StringComparison.Ordinal)))
            problems.Add(new("/heads", $"every fixed head is {heads[0].Total} m and there is no drain: nothing drives a flow."));

        // An unconfined section's water leaves through its seepage faces: the exit check defaults to the first one.
        var exitDefault = unconfined && faces.Count > 0 ? faces[0].Along : heads.Count > 0 ? heads.MinBy(h => h.Total)!.Along : null;
        var exit = ReadExit(doc.ExitCheck, exitDefault, domain, tolerance, reader, problems);
        ExitSurfaceCheck.Check(doc, exit, heads, drains, tolerance, problems);
        double heaveFactor = doc.HeaveCheck?.RequiredFactor ?? SectionDefaults.HeaveRequiredFactor;
        if (!double.IsFinite(heaveFactor) || heaveFactor <= 0)
            problems.Add(new("/heaveCheck/requiredFactor", "must be a positive number."));
        var mesh = ReadMesh(doc.Mesh, zones, cutoffs, domain, problems);
        if (unconfined && mesh is { Order: 2 })
            problems.Add(new("/mesh/order", "an unconfined section is solved with linear triangles (order 1) only."));

        var gauges = ReadGauges(doc.Gauges, reader, problems);
        int? headDrops = FlowNetReader.HeadDrops(doc.FlowNet, problems);

        if (doc.StructureLength is { } len && (!double.IsFinite(len) || len <= 0 || len > PointReader.LargestCoordinate))
            problems.Add(new("/structureLength", "must be a positive length in metres, at most 1,000,000 m."));

        if (problems.Count > 0 || zones is null || exit is null || mesh is null)
            return new ValidationOutcome(null, problems);

        if (cutoffSet.Permeable.Count > 0)
        {
            (soils, zones) = WallZones.Insert(soils, zones, cutoffSet, domain!, tolerance, problems);
            if (problems.Count > 0) return new ValidationOutcome(null, problems);
        }

        var model = new SectionModel(doc.Title ?? "Untitled section", gammaW, soils, zones, structures, cutoffs, heads, drains,
            exit, heaveFactor, mesh, doc.StructureLength, warnings)
        {
            Gauges = gauges, TruncationCheck = doc.TruncationCheck, Unconfined = unconfined, SeepageFaces = faces,
            FlowNetHeadDrops = headDrops,
        };
        var (analysed, assumptions) = SectionAssumptions.Build(doc, posted, model, unit!, warnings);
        return new ValidationOutcome(model with { Analysed = analysed, Assumptions = assumptions }, problems);
    }

    private static List<Soil> ReadSoils(List<SoilDocument>? docs, double unitFactor, List<SectionProblem> problems)
    {
        var soils = new List<Soil>();
        if (docs is null || docs.Count == 0) { problems.Add(new("/soils", "at least one soil is required.")); return soils; }
        var seen = new HashSet<string>();
        for (int i = 0; i < docs.Count; i++)
        {
            var s = docs[i]; string at = $"/soils/{i}";
            if (s is null) { problems.Add(new(at, "must be an object.")); continue; }
            if (string.IsNullOrWhiteSpace(s.Id)) problems.Add(new($"{at}/id", "is required (a name the zones refer to)."));
            else if (!seen.Add(s.Id)) problems.Add(new($"{at}/id", $"'{s.Id}' is used by an earlier soil; ids must be unique."));
            double kx = s.Kx ?? double.NaN;
            if (s.Kx is null) problems.Add(new($"{at}/kx", "is required: hydraulic conductivity along the bedding."));
            else if (!double.IsFinite(kx) || kx <= 0) problems.Add(new($"{at}/kx", "must be a positive, finite conductivity."));
            else if (ConductivityUnits.OutOfRange(kx * unitFactor) is { } why) problems.Add(new($"{at}/kx", why));
            double ky = s.Ky ?? kx;
            if (s.Ky is { } kyv && (!double.IsFinite(kyv) || kyv <= 0)) problems.Add(new($"{at}/ky", "must be a positive, finite conductivity."));
            else if (s.Ky is { } kyr && ConductivityUnits.OutOfRange(kyr * unitFactor) is { } whyY) problems.Add(new($"{at}/ky", whyY));
            double angle = s.BeddingAngle ?? 0;
            if (!double.IsFinite(angle) || Math.Abs(angle) > 90) problems.Add(new($"{at}/beddingAngle", "must be an angle in degrees between -90 and 90."));
            if (s.SpecificGravity is { } gs && (!double.IsFinite(gs) || gs <= 1 || gs > 5)) problems.Add(new($"{at}/specificGravity", "must lie between 1 and 5."));
            if (s.VoidRatio is { } e && (!double.IsFinite(e) || e <= 0 || e > 10)) problems.Add(new($"{at}/voidRatio", "must lie between 0 and 10."));
            if (s.SaturatedUnitWeight is { } gsat && (!double.IsFinite(gsat) || gsat <= 0)) problems.Add(new($"{at}/saturatedUnitWeight", "must be a positive unit weight in kN/m³."));
            string? creepClass = s.CreepClass is null ? null
                : SectionEnumerations.Read(s.CreepClass, "", SectionEnumerations.CreepClasses, $"{at}/creepClass", problems);
            soils.Add(new Soil(s.Id ?? $"soil {i}", kx * unitFactor, ky * unitFactor, angle, s.SpecificGravity, s.VoidRatio,
                s.SaturatedUnitWeight, creepClass));
        }
        return soils;
    }

    private static List<Zone>? ReadZones(List<ZoneDocument>? docs, List<Soil> soils, PointReader reader,
        List<SectionProblem> problems, List<string> warnings)
    {
        if (docs is null || docs.Count == 0) { problems.Add(new("/zones", "at least one zone is required.")); return null; }
        var zones = new List<Zone>();
        for (int i = 0; i < docs.Count; i++)
        {
            var z = docs[i]; string at = $"/zones/{i}";
            if (z is null) { problems.Add(new(at, "must be an object.")); continue; }
            int soil = soils.FindIndex(s => s.Id == z.Soil);
            if (z.Soil is null) problems.Add(new($"{at}/soil", "is required: the id of one of the soils."));
            else if (soil < 0) problems.Add(new($"{at}/soil", $"'{z.Soil}' is not the id of any soil."));
            if (z.Size is { } size && (!double.IsFinite(size) || size <= 0)) problems.Add(new($"{at}/size", "must be a positive length in metres."));
            var ring = reader.Polyline(z.Outline, $"{at}/outline", 3, "the zone outline");
            if (ring is null) continue;
            if (ring.Count > 3 && ring[0].NearlyEquals(ring[^1], 1e-12 * (1 + ring[0].Length))) ring.RemoveAt(ring.Count - 1);
            if (ring.Count < 3) { problems.Add(new($"{at}/outline", "needs at least 3 distinct points.")); continue; }
            var polygon = Domain.ToPolygon(ring);
            if (!polygon.IsValid || Math.Abs(PolygonMath.SignedArea(ring)) <= 0)
            {
                problems.Add(new($"{at}/outline", "intersects itself (or has zero area); an outline must be a simple polygon."));
                continue;
            }
            if (PolygonMath.SignedArea(ring) < 0) ring.Reverse(); // either orientation is accepted; stored counter-clockwise
            zones.Add(new Zone(Math.Max(soil, 0), ring, z.Size));
        }
        return zones;
    }

    private static (string? Name, List<double[]>? Line)? Entry(string? name, List<double[]>? line) => (name, line);

    // Returns one entry per input item (Line null where it could not be read), so indices stay aligned. A null item
    // (JSON null in the list) is reported once, at the item.
    private static List<(string Name, List<Point2>? Line)> ReadPolylines(List<(string? Name, List<double[]>? Line)?>? docs,
        string collection, string member, string kind, string what, Domain? domain, double tolerance, PointReader reader,
        List<SectionProblem> problems, bool mayRunInside = false)
    {
        var result = new List<(string, List<Point2>?)>();
        if (docs is null) return result;
        for (int i = 0; i < docs.Count; i++)
        {
            if (docs[i] is not { } item)
            {
                problems.Add(new($"{collection}/{i}", "must be an object."));
                result.Add(($"{kind} {i + 1}", null));
                continue;
            }
            string at = $"{collection}/{i}/{member}";
            var line = reader.Polyline(item.Line, at, 2, what);
            result.Add((item.Name ?? $"{kind} {i + 1}", line));
            if (line is null) continue;
            if (domain is null || domain.PolylineOnBoundary(line, tolerance * 10)) continue;
            if (!mayRunInside)
                problems.Add(new(at, $"does not lie on the boundary of the zones; a {kind} must run along the edge of the domain."));
            else if (Enumerable.Range(0, line.Count - 1).Any(k => !domain.SegmentInside(line[k], line[k + 1], tolerance * 10)))
                problems.Add(new(at, $"leaves the zones; a {kind} must run along the edge of the domain or inside it."));
        }
        return result;
    }

    private static List<HeadBoundary> ReadHeads(List<HeadDocument>? docs, Domain? domain, double tolerance, PointReader reader,
        List<SectionProblem> problems)
    {
        if (docs is null || docs.Count == 0)
        {
            problems.Add(new("/heads", "at least one fixed total head is required; without one the head field is undetermined."));
            return [];
        }
        var lines = ReadPolylines(docs.Select(d => d is null ? null : Entry(d.Name, d.Along)).ToList(), "/heads", "along", "head boundary",
            "the head polyline", domain, tolerance, reader, problems);
        var heads = new List<HeadBoundary>();
        for (int i = 0; i < docs.Count; i++)
        {
            if (docs[i] is null) continue; // reported by ReadPolylines
            if (docs[i].Total is not { } total || !double.IsFinite(total))
                problems.Add(new($"/heads/{i}/total", "is required: the total head in metres."));
            else if (Math.Abs(total) > PointReader.LargestCoordinate)
                problems.Add(new($"/heads/{i}/total", "must lie within ±1,000,000 m of total head."));
            else if (lines[i].Line is { } line)
                heads.Add(new HeadBoundary(lines[i].Name, line, total));
        }
        return heads;
    }

    private static ExitCheck? ReadExit(ExitCheckDocument? doc, IReadOnlyList<Point2>? defaultAlong, Domain? domain, double tolerance,
        PointReader reader, List<SectionProblem> problems)
    {
        double depth = doc?.Depth ?? SectionDefaults.ExitDepth;
        if (!double.IsFinite(depth) || depth <= 0) problems.Add(new("/exitCheck/depth", "must be a positive depth in metres."));
        double required = doc?.RequiredFactor ?? SectionDefaults.ExitRequiredFactor;
        if (!double.IsFinite(required) || required <= 0) problems.Add(new("/exitCheck/requiredFactor", "must be a positive number."));
        IReadOnlyList<Point2>? along;
        if (doc?.Along is not null)
        {
            along = reader.Polyline(doc.Along, "/exitCheck/along", 2, "the exit surface");
            if (along is not null && domain is not null && !domain.PolylineOnBoundary(along, tolerance * 10))
                problems.Add(new("/exitCheck/along", "does not lie on the boundary of the zones."));
        }
        else along = defaultAlong;
        return along is null ? null : new ExitCheck(along, depth, required, doc?.Along is not null);
    }

    /// <summary>Default mesh size, m: a hundredth of the domain's extent, and at most a third of the shortest cutoff.</summary>
    public static double DefaultMeshSize(double extent, IEnumerable<Cutoff> cutoffs) =>
        Math.Min(extent / 100, cutoffs.Select(c => c.Length / 3).DefaultIfEmpty(double.PositiveInfinity).Min());

    private static MeshSettings? ReadMesh(MeshDocument? doc, List<Zone>? zones, List<Cutoff> cutoffs, Domain? domain,
        List<SectionProblem> problems)
    {
        if (zones is null || zones.Count == 0) return null;
        double extent = Extent(zones);
        double size = doc?.Size ?? DefaultMeshSize(extent, cutoffs);
        double minAngle = doc?.MinAngle ?? SectionDefaults.MinAngle;
        if (!double.IsFinite(size) || size <= 0) { problems.Add(new("/mesh/size", "must be a positive edge length in metres.")); return null; }
        if (!double.IsFinite(minAngle) || minAngle < 10 || minAngle > 33)
            problems.Add(new("/mesh/minAngle", "must lie between 10° and 33° (larger bounds may not terminate)."));
        if (domain is not null)
        {
            double estimate = domain.Area / (0.433 * size * size);
            if (estimate > MaxEstimatedTriangles)
                problems.Add(new("/mesh/size", FormattableString.Invariant(
                    $"{size} m gives about {estimate:E2} triangles; at most {MaxEstimatedTriangles:E1} are accepted.")));
        }
        int order = doc?.Order ?? 1;
        if (order is not (1 or 2)) problems.Add(new("/mesh/order", "must be 1 (linear triangles) or 2 (quadratic triangles)."));
        return new MeshSettings(size, minAngle) { Order = order, ConvergenceCheck = doc?.ConvergenceCheck ?? false };
    }

    private static List<Gauge> ReadGauges(List<GaugeDocument>? docs, PointReader reader, List<SectionProblem> problems)
    {
        var gauges = new List<Gauge>();
        if (docs is null) return gauges;
        for (int i = 0; i < docs.Count; i++)
        {
            if (docs[i] is not { } g) { problems.Add(new($"/gauges/{i}", "must be an object.")); continue; }
            if (reader.Polyline(g.Along, $"/gauges/{i}/along", 2, "the gauge polyline") is { } line)
                gauges.Add(new Gauge(g.Name ?? $"gauge {i + 1}", line));
        }
        return gauges;
    }

    private static double Extent(IEnumerable<Zone> zones)
    {
        var pts = zones.SelectMany(z => z.Outline).ToList();
        return Math.Max(pts.Max(p => p.X) - pts.Min(p => p.X), pts.Max(p => p.Y) - pts.Min(p => p.Y));
    }
}
