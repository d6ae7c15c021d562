using Seepage.Core.Sections;
using L = Seepage.Core.Imports.SectionSheetLayout;

namespace Seepage.Core.Imports;

/// <summary>
/// Units written in column headers, such as <c>kx (cm/s)</c> or <c>x [ft]</c>: each is honoured, by converting the
/// column's values to the unit the section declares (<c>conductivityUnit</c>, <c>lengthUnit</c>, <c>unitWeightUnit</c>),
/// or refused at the header cell. Conductivity columns take m/s, cm/s, m/day, ft/day, ft/min; lengths (coordinates,
/// sizes, depths, heads) m or ft; unit weights kN/m³ or pcf; angles degrees; ratios and factors "-" or no unit.
/// Text columns (ids, names, classes) have no unit; text in parentheses there is a remark.
/// </summary>
internal static class HeaderUnits
{
    private static readonly string[] Dimensionless = ["specificGravity", "voidRatio", "requiredFactor"];
    private static readonly string[] Flags = ["truncationCheck", "convergenceCheck"];

    /// <summary>The text in the first parentheses or brackets of a header cell, trimmed; null when there is none.</summary>
    public static string? Of(string header)
    {
        int open = header.IndexOfAny(['(', '[']);
        if (open < 0) return null;
        int close = header.IndexOfAny([')', ']'], open + 1);
        string unit = (close < 0 ? header[(open + 1)..] : header[(open + 1)..close]).Trim();
        return unit.Length == 0 ? null : unit;
    }

    /// <summary>Factor from the header's unit to the section's unit for every numeric column with a unit in its header;
    /// a header unit that does not fit the column is a problem at the header cell.</summary>
    public static Dictionary<(SheetBlock, string), double> Factors(IEnumerable<SheetBlock> blocks, SectionDocument section,
        List<ImportProblem> problems)
    {
        var factors = new Dictionary<(SheetBlock, string), double>(new BlockColumnComparer());
        double? Declared(string? given, string fallback, IReadOnlyDictionary<string, double> table) =>
            SectionEnumerations.Match(given ?? fallback, table.Keys) is { } name ? table[name] : null;
        double? k = Declared(section.ConductivityUnit, "m/s", ConductivityUnits.ToMetresPerSecond);
        double? length = Declared(section.LengthUnit, "m", InputUnits.LengthToMetres);
        double? weight = Declared(section.UnitWeightUnit, "kN/m3", InputUnits.UnitWeightToKilonewtons);
        foreach (var block in blocks)
            foreach (var (column, unit) in block.Units)
            {
                var cell = new CellRef(block.Sheet.Name, block.HeaderRow + 1, block.Columns[column] + 1);
                string? why = null;
                double factor = 1;
                switch (L.Unit(column))
                {
                    case "k":
                        why = Convert(unit, ConductivityUnits.ToMetresPerSecond, k, "a conductivity", ref factor);
                        break;
                    case "m" or "m total head":
                        why = Convert(unit.Split(' ', StringSplitOptions.RemoveEmptyEntries)[0], InputUnits.LengthToMetres, length,
                            "a length", ref factor);
                        break;
                    case "kN/m³":
                        why = Convert(unit is "lb/ft3" or "lbf/ft3" or "lb/ft³" ? "pcf" : unit, InputUnits.UnitWeightToKilonewtons,
                            weight, "a unit weight", ref factor);
                        break;
                    case "degrees":
                        if (unit is not ("degrees" or "degree" or "deg" or "°")) why = "is an angle in degrees; write (degrees) or no unit.";
                        break;
                    default:
                        if (Dimensionless.Contains(column) || Flags.Contains(column))
                        {
                            if (unit is not ("-" or "–")) why = "takes no unit (a ratio, factor, number or yes/no); write (-) or no unit.";
                        }
                        break;
                }
                if (why is not null) problems.Add(new ImportProblem(cell, $"The unit '{unit}' in the '{column}' header: {why}"));
                else if (factor != 1) factors[(block, column)] = factor;
            }
        return factors;
    }

    // Factor from the header's unit to the section's; null reason on success.
    private static string? Convert(string unit, IReadOnlyDictionary<string, double> table, double? declared, string what, ref double factor)
    {
        if (SectionEnumerations.Match(unit, table.Keys) is not { } name)
            return $"{what} takes one of {string.Join(", ", table.Keys)}.";
        if (declared is not { } to) return null; // the section's own unit is unknown: the section check reports it
        factor = table[name] / to;
        return null;
    }

    private sealed class BlockColumnComparer : IEqualityComparer<(SheetBlock, string)>
    {
        public bool Equals((SheetBlock, string) a, (SheetBlock, string) b) => ReferenceEquals(a.Item1, b.Item1) && a.Item2 == b.Item2;
        public int GetHashCode((SheetBlock, string) x) => HashCode.Combine(System.Runtime.CompilerServices.RuntimeHelpers.GetHashCode(x.Item1), x.Item2);
    }
}
