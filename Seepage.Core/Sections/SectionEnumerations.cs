using Seepage.Core.Results;

namespace Seepage.Core.Sections;

/// <summary>
/// The members of the section document that take one of a fixed list of names, and how a given spelling is matched:
/// case, spaces, hyphens and underscores do not matter ("Fine sand", "FINE_SAND" and "fine-sand" are the same class),
/// and "³" is read as "3" ("kN/m³" is "kN/m3"). Anything else is refused with the list.
/// </summary>
public static class SectionEnumerations
{
    /// <summary>Accepted <c>conductivityUnit</c> names.</summary>
    public static IReadOnlyCollection<string> ConductivityUnits => Sections.ConductivityUnits.ToMetresPerSecond.Keys.ToList();

    /// <summary>Accepted <c>lengthUnit</c> names.</summary>
    public static IReadOnlyCollection<string> LengthUnits => InputUnits.LengthToMetres.Keys.ToList();

    /// <summary>Accepted <c>unitWeightUnit</c> names.</summary>
    public static IReadOnlyCollection<string> UnitWeightUnits => InputUnits.UnitWeightToKilonewtons.Keys.ToList();

    /// <summary>Accepted <c>soils[].creepClass</c> names (Lane's classes; Bligh's table covers the sands and gravels).</summary>
    public static IReadOnlyCollection<string> CreepClasses => CreepTables.Lane.Keys.ToList();

    /// <summary>The accepted name <paramref name="given"/> stands for, or null.</summary>
    public static string? Match(string given, IEnumerable<string> accepted)
    {
        string key = Fold(given);
        return accepted.FirstOrDefault(a => Fold(a) == key);
    }

    /// <summary>The canonical name, or null with a problem at <paramref name="pointer"/> naming the list.</summary>
    public static string? Read(string? given, string fallback, IReadOnlyCollection<string> accepted, string pointer,
        List<SectionProblem> problems)
    {
        if (given is null) return fallback;
        if (Match(given, accepted) is { } name) return name;
        string near = NearMatch.Suggestion(given, accepted) is { } s ? " " + char.ToUpperInvariant(s[0]) + s[1..] : "";
        problems.Add(new(pointer, $"'{given}' is not one of {string.Join(", ", accepted)}.{near}"));
        return null;
    }

    private static string Fold(string s) =>
        new(s.Replace('³', '3').Where(c => c is not (' ' or '-' or '_')).Select(char.ToLowerInvariant).ToArray());
}
