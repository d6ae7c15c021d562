using System.Globalization;

namespace Seepage.Core.Imports;

/// <summary>
/// Keeps exported text from becoming a live formula when a CSV or workbook is opened in a spreadsheet program (CSV or
/// formula injection: a title such as <c>=HYPERLINK(...)</c>). A text cell that begins with <c>=</c>, <c>+</c>, <c>-</c>,
/// <c>@</c>, a tab or a carriage return gets a leading apostrophe, as the OWASP "CSV Injection" guidance advises; numbers stay
/// numbers (a numeric cell, or text that reads as a number such as <c>-9</c>, is left alone). The readers take the apostrophe
/// off again, so an exported template reads back to the same section.
/// </summary>
public static class FormulaGuard
{
    private static bool Risky(char c) => c is '=' or '+' or '-' or '@' or '\t' or '\r';

    /// <summary>The cell to write: text that a spreadsheet would read as a formula, prefixed with an apostrophe.</summary>
    public static object? Escape(object? cell) =>
        cell is string { Length: > 0 } text && Risky(text[0]) && !IsNumber(text) ? "'" + text : cell;

    /// <summary>The text as it was before <see cref="Escape"/>.</summary>
    public static string Unescape(string text) => text.Length > 1 && text[0] == '\'' && Risky(text[1]) ? text[1..] : text;

    private static bool IsNumber(string text) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out _);
}
