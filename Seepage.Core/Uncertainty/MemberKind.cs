using System.Text.RegularExpressions;

namespace Seepage.Core.Uncertainty;

/// <summary>What a varied member changes in the analysis, which decides how much of the base problem a sample can reuse.</summary>
public enum MemberKind
{
    /// <summary>Data that enter neither K nor the fixed heads (unit weights, specific gravity, void ratio, required factors).</summary>
    Figures,
    /// <summary>A head boundary's total head: the response is linear in it.</summary>
    Head,
    /// <summary>A conductivity (a soil's kx, ky or bedding angle, a permeable wall's kx): K changes, the mesh does not.</summary>
    Conductivity,
    /// <summary>Anything else (coordinates, mesh settings, ...): each sample is meshed and analysed afresh.</summary>
    Geometry,
}

/// <summary>Classifies a JSON pointer into the section document by what it changes.</summary>
public static partial class MemberKinds
{
    public static MemberKind Of(string pointer)
    {
        if (HeadPattern().IsMatch(pointer)) return MemberKind.Head;
        if (ConductivityPattern().IsMatch(pointer)) return MemberKind.Conductivity;
        if (FiguresPattern().IsMatch(pointer)) return MemberKind.Figures;
        return MemberKind.Geometry;
    }

    /// <summary>The soil index when the pointer is a soil's kx (/soils/{i}/kx), else null.</summary>
    public static int? SoilOfKx(string pointer) =>
        KxPattern().Match(pointer) is { Success: true } m ? int.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture) : null;

    [GeneratedRegex(@"^/heads/\d+/total$")]
    private static partial Regex HeadPattern();

    [GeneratedRegex(@"^(/soils/\d+/(kx|ky|beddingAngle)|/cutoffs/\d+/kx)$")]
    private static partial Regex ConductivityPattern();

    [GeneratedRegex(@"^(/waterUnitWeight|/soils/\d+/(specificGravity|voidRatio|saturatedUnitWeight)|/exitCheck/requiredFactor|/heaveCheck/requiredFactor)$")]
    private static partial Regex FiguresPattern();

    [GeneratedRegex(@"^/soils/(\d+)/kx$")]
    private static partial Regex KxPattern();
}
