using System.Reflection;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Seepage.Core.Sections;

/// <summary>Converts a section posted in feet and pcf to metres and kN/m³. Every point [x, y] of the document, and every
/// number marked <see cref="InLengthUnitAttribute"/>, is a length; every number marked
/// <see cref="InUnitWeightUnitAttribute"/> a unit weight. The members are found by reflection over the document records,
/// so a polyline added to the contract is converted with no change here.</summary>
public static class SectionUnits
{
    /// <summary>The document in metres and kN/m³ (<c>lengthUnit</c> "m", <c>unitWeightUnit</c> "kN/m3"); the document
    /// itself when it is already SI or a unit is not known (then a problem is added at the unit's member).</summary>
    public static SectionDocument ToSi(SectionDocument doc, List<SectionProblem> problems)
    {
        string? length = SectionEnumerations.Read(doc.LengthUnit, "m", SectionEnumerations.LengthUnits, "/lengthUnit", problems);
        string? weight = SectionEnumerations.Read(doc.UnitWeightUnit, "kN/m3", SectionEnumerations.UnitWeightUnits,
            "/unitWeightUnit", problems);
        if (length is null || weight is null) return doc;
        double metres = InputUnits.LengthToMetres[length], kilonewtons = InputUnits.UnitWeightToKilonewtons[weight];
        if (metres == 1 && kilonewtons == 1) return doc with { LengthUnit = length, UnitWeightUnit = weight };
        var node = JsonNode.Parse(SectionParser.Write(doc))!;
        Scale(typeof(SectionDocument), node, metres, kilonewtons);
        var si = node.Deserialize<SectionDocument>(SectionParser.Options)!;
        return si with { LengthUnit = "m", UnitWeightUnit = "kN/m3" };
    }

    private static void Scale(Type type, JsonNode? node, double metres, double kilonewtons)
    {
        if (node is null) return;
        type = Nullable.GetUnderlyingType(type) ?? type;
        if (type == typeof(double[]))
        {
            if (node is JsonArray point) ScaleItems(point, metres);
            return;
        }
        if (type.IsGenericType && type.GetGenericTypeDefinition() == typeof(List<>))
        {
            if (node is JsonArray list)
                foreach (var item in list) Scale(type.GetGenericArguments()[0], item, metres, kilonewtons);
            return;
        }
        if (node is not JsonObject obj || type == typeof(string)) return;
        foreach (var (name, property) in SectionContract.MembersOf(type))
        {
            if (!obj.TryGetPropertyValue(name, out var child) || child is null) continue;
            double factor = property.GetCustomAttribute<InLengthUnitAttribute>() is not null ? metres
                : property.GetCustomAttribute<InUnitWeightUnitAttribute>() is not null ? kilonewtons : double.NaN;
            if (!double.IsNaN(factor)) obj[name] = Times(child, factor);
            else Scale(property.PropertyType, child, metres, kilonewtons);
        }
    }

    private static void ScaleItems(JsonArray array, double factor)
    {
        for (int i = 0; i < array.Count; i++)
            if (array[i] is { } item) array[i] = Times(item, factor);
    }

    private static JsonNode Times(JsonNode value, double factor) =>
        value is JsonValue v && v.TryGetValue(out double d) ? JsonValue.Create(d * factor) : value;
}
