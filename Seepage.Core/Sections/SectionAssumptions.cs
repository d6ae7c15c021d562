namespace Seepage.Core.Sections;

/// <summary>
/// The section as analysed: every member the analysis uses with a default, filled in (in SI: metres, kN/m³, and
/// conductivities in m/s), and the list of those values with their origin. Defaults a reviewer might not expect (an exit
/// surface chosen by the service) are also named in the warnings. Built by the validator from the values it used, so
/// each default has one place (the validator).
/// </summary>
internal static class SectionAssumptions
{
    /// <param name="doc">The section in metres and kN/m³ (after <see cref="SectionUnits.ToSi"/>).</param>
    /// <param name="posted">The section as posted (for the units it was given in).</param>
    /// <param name="model">The validated model (the values used).</param>
    /// <param name="conductivityUnit">The canonical conductivity unit of the section.</param>
    /// <param name="warnings">Receives a warning for each default a reviewer might not expect.</param>
    public static (SectionDocument Analysed, List<Assumption> Assumptions) Build(SectionDocument doc, SectionDocument posted,
        SectionModel model, string conductivityUnit, List<string> warnings)
    {
        var list = new List<Assumption>();
        void Add(string member, bool given, object value, string unit, string note) =>
            list.Add(new Assumption(member, value, unit, given ? "given" : "default", note));

        Add("/lengthUnit", posted.LengthUnit is not null, posted.LengthUnit ?? "m", "",
            "unit of the lengths as given; the analysis and the result are in metres");
        Add("/unitWeightUnit", posted.UnitWeightUnit is not null, posted.UnitWeightUnit ?? "kN/m3", "",
            "unit of the unit weights as given; the analysis and the result are in kN/m³");
        Add("/conductivityUnit", doc.ConductivityUnit is not null, conductivityUnit, "", "unit of kx and ky as given");
        Add("/waterUnitWeight", doc.WaterUnitWeight is not null, model.WaterUnitWeight, "kN/m³", "unit weight of water γw");
        for (int i = 0; i < model.Soils.Count && i < (doc.Soils?.Count ?? 0); i++)
        {
            var s = doc.Soils![i];
            if (s is null) continue;
            Add($"/soils/{i}/ky", s.Ky is not null, model.Soils[i].Ky, "m/s", s.Ky is null ? "ky = kx (isotropic)" : "across the bedding");
            Add($"/soils/{i}/beddingAngle", s.BeddingAngle is not null, model.Soils[i].BeddingAngle, "degrees", "bedding from +x, counter-clockwise");
        }
        var exit = model.ExitCheck;
        string exitNote = "the exit surface";
        if (!exit.AlongGiven)
        {
            var low = model.Heads.MinBy(h => h.Total)!;
            exitNote = FormattableString.Invariant($"the head boundary '{low.Name}', the one with the lowest total head ({low.Total:G6} m)");
            warnings.Add($"Exit check: exitCheck.along is not given; the exit surface is {exitNote}.");
        }
        Add("/exitCheck/along", exit.AlongGiven, exit.Along.Select(p => new[] { p.X, p.Y }).ToArray(), "m", exitNote);
        Add("/exitCheck/depth", doc.ExitCheck?.Depth is not null, exit.Depth, "m", "depth over which the upward exit gradient is averaged");
        Add("/exitCheck/requiredFactor", doc.ExitCheck?.RequiredFactor is not null, exit.RequiredFactor, "",
            "required factor of safety against piping; local codes govern");
        Add("/heaveCheck/requiredFactor", doc.HeaveCheck?.RequiredFactor is not null, model.HeaveRequiredFactor, "",
            "required factor of safety against heave; local codes govern");
        Add("/mesh/size", doc.Mesh?.Size is not null, model.Mesh.Size, "m",
            doc.Mesh?.Size is null ? "a hundredth of the domain's extent, at most a third of the shortest cutoff" : "target edge length");
        Add("/mesh/minAngle", doc.Mesh?.MinAngle is not null, model.Mesh.MinAngle, "degrees", "smallest triangle angle");
        Add("/mesh/order", doc.Mesh?.Order is not null, model.Mesh.Order, "", model.Mesh.Order == 1 ? "linear triangles" : "quadratic triangles");
        Add("/mesh/convergenceCheck", doc.Mesh?.ConvergenceCheck is not null, model.Mesh.ConvergenceCheck, "", "two uniform refinements");
        Add("/truncationCheck", doc.TruncationCheck is not null, doc.TruncationCheck?.ToString().ToLowerInvariant() ?? "automatic", "",
            "automatic: run when the mesh has fewer than 20,000 triangles");

        var analysed = doc with
        {
            LengthUnit = "m",
            UnitWeightUnit = "kN/m3",
            ConductivityUnit = conductivityUnit,
            WaterUnitWeight = model.WaterUnitWeight,
            Soils = doc.Soils?.Select((s, i) => s with
            {
                Ky = s.Ky ?? s.Kx, BeddingAngle = model.Soils[i].BeddingAngle, CreepClass = model.Soils[i].CreepClass,
            }).ToList(),
            ExitCheck = (doc.ExitCheck ?? new ExitCheckDocument()) with
            {
                Along = exit.Along.Select(p => new[] { p.X, p.Y }).ToList(), Depth = exit.Depth, RequiredFactor = exit.RequiredFactor,
            },
            HeaveCheck = (doc.HeaveCheck ?? new HeaveCheckDocument()) with { RequiredFactor = model.HeaveRequiredFactor },
            Mesh = (doc.Mesh ?? new MeshDocument()) with
            {
                Size = model.Mesh.Size, MinAngle = model.Mesh.MinAngle, Order = model.Mesh.Order, ConvergenceCheck = model.Mesh.ConvergenceCheck,
            },
        };
        return (analysed, list);
    }
}
