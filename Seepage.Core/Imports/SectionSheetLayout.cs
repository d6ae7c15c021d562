namespace Seepage.Core.Imports;

/// <summary>
/// Our spreadsheet layout of a section document: blocks, each opened by a row holding only the block's name in
/// column A, then a row of column names (any order; a unit in parentheses is honoured or refused, see HeaderUnits), then one
/// row per item or per vertex. Blank rows and rows whose first cell starts with '#' are skipped anywhere. In a
/// workbook a sheet named after a block may leave out the block-name row; sheets named "notes" or starting with
/// '#' are ignored. The README section "Sections from a spreadsheet" documents the blocks.
/// </summary>
public static class SectionSheetLayout
{
    public const string Section = "section";
    public const string Soils = "soils";
    public const string Zones = "zone vertices";
    public const string Structures = "structures";
    public const string Cutoffs = "cutoffs";
    public const string Heads = "heads";
    public const string Drains = "drains";
    public const string Checks = "checks";
    public const string Mesh = "mesh";
    public const string Gauges = "gauges";
    public const string SeepageFaces = "seepage faces";

    /// <summary>Block names in the order the templates write them.</summary>
    public static readonly IReadOnlyList<string> Blocks = [Section, Soils, Zones, Structures, Cutoffs, Heads, Drains, SeepageFaces, Checks, Mesh, Gauges];

    /// <summary>Blocks every section needs.</summary>
    public static readonly IReadOnlyList<string> RequiredBlocks = [Soils, Zones, Heads];

    /// <summary>The columns of each block (canonical names, as in the JSON contract where one exists).</summary>
    public static readonly IReadOnlyDictionary<string, string[]> Columns = new Dictionary<string, string[]>
    {
        [Section] = ["title", "description", "conductivityUnit", "lengthUnit", "unitWeightUnit", "waterUnitWeight", "structureLength",
            "truncationCheck", "unconfined"],
        [Soils] = ["id", "kx", "ky", "beddingAngle", "specificGravity", "voidRatio", "saturatedUnitWeight", "creepClass"],
        [Zones] = ["zone", "soil", "x", "y", "size"],
        [Structures] = ["name", "x", "y"],
        [Cutoffs] = ["name", "topX", "topY", "tipX", "tipY", "thickness", "kx"],
        [Heads] = ["name", "total", "x", "y"],
        [Drains] = ["name", "x", "y"],
        [Checks] = ["check", "x", "y", "depth", "requiredFactor"],
        [Mesh] = ["size", "minAngle", "order", "convergenceCheck"],
        [Gauges] = ["name", "x", "y"],
        [SeepageFaces] = ["name", "x", "y"],
    };

    /// <summary>Columns a block cannot do without.</summary>
    public static readonly IReadOnlyDictionary<string, string[]> RequiredColumns = new Dictionary<string, string[]>
    {
        [Section] = [],
        [Soils] = ["id", "kx"],
        [Zones] = ["zone", "soil", "x", "y"],
        [Structures] = ["name", "x", "y"],
        [Cutoffs] = ["name", "topX", "topY", "tipX", "tipY"],
        [Heads] = ["name", "total", "x", "y"],
        [Drains] = ["name", "x", "y"],
        [Checks] = ["check"],
        [Mesh] = [],
        [Gauges] = ["name", "x", "y"],
        [SeepageFaces] = ["name", "x", "y"],
    };

    /// <summary>The unit written after a column name in the templates; "k" stands for the section's conductivity unit.</summary>
    public static string? Unit(string column) => column switch
    {
        "kx" or "ky" => "k",
        "x" or "y" or "topX" or "topY" or "tipX" or "tipY" or "size" or "depth" or "thickness" or "structureLength" => "m",
        "total" => "m total head",
        "beddingAngle" or "minAngle" => "degrees",
        "waterUnitWeight" or "saturatedUnitWeight" => "kN/m³",
        _ => null,
    };

    /// <summary>Compares names loosely: lower case, text in parentheses or brackets dropped, only letters and digits kept
    /// ("Kx (m/s)" → "kx", "zone vertices" → "zonevertices").</summary>
    public static string Normalise(string name)
    {
        var sb = new System.Text.StringBuilder();
        int depth = 0;
        foreach (char c in name)
        {
            if (c is '(' or '[') depth++;
            else if (c is ')' or ']') depth = Math.Max(0, depth - 1);
            else if (depth == 0 && char.IsLetterOrDigit(c)) sb.Append(char.ToLowerInvariant(c));
        }
        return sb.ToString();
    }

    /// <summary>The block a (normalised) name stands for, or null. "zones" is accepted for "zone vertices".</summary>
    public static string? BlockNamed(string name)
    {
        string key = Normalise(name);
        if (key == "zones") return Zones;
        return Blocks.FirstOrDefault(b => Normalise(b) == key);
    }

    /// <summary>The canonical column of a block a header cell names, or null.</summary>
    public static string? ColumnNamed(string block, string header)
    {
        string key = Normalise(header);
        if (block == Zones && key == "zonenumber") key = "zone";
        return Columns[block].FirstOrDefault(c => Normalise(c) == key);
    }
}
