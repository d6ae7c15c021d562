using System.Globalization;
using System.Text.RegularExpressions;

namespace Seepage.Browser.Tests;

/// <summary>Reads numbers as the page writes them: "3.210 × 10⁻⁵", "−0.0123", "612".</summary>
public static partial class ShownNumber
{
    private const string Superscripts = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    /// <summary>The first number in <paramref name="text"/>.</summary>
    public static double Parse(string text)
    {
        var match = Pattern().Match(text.Replace('−', '-'));
        if (!match.Success) throw new FormatException($"No number in \"{text}\".");
        var mantissa = double.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture);
        if (!match.Groups[2].Success) return mantissa;
        var exponentText = string.Concat(match.Groups[2].Value.Select(c => c == '⁻' ? '-' : (char)('0' + Superscripts.IndexOf(c))));
        return mantissa * Math.Pow(10, int.Parse(exponentText, CultureInfo.InvariantCulture));
    }

    [GeneratedRegex(@"(-?\d+(?:\.\d+)?)(?:\s*×\s*10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?")]
    private static partial Regex Pattern();
}
