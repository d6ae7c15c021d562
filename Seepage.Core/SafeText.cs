using System.Text;

namespace Seepage.Core;

/// <summary>User text made safe to repeat in a message or a log line: at most a short excerpt (the rest is counted, not
/// copied) and every control character (ANSI escapes, CR, LF, tab, NUL) written as a visible <c>\uXXXX</c> escape, so a cell or
/// a title can neither flood an error reply nor forge or colour a log line.</summary>
public static class SafeText
{
    /// <summary>Characters of user text repeated in messages.</summary>
    public const int ExcerptLength = 60;

    public static string Of(string? text, int max = ExcerptLength)
    {
        if (text is null) return "";
        var sb = new StringBuilder(Math.Min(text.Length, max) + 32);
        int i = 0;
        for (; i < text.Length && sb.Length < max; i++)
        {
            char c = text[i];
            if (char.IsControl(c) || c is '\u2028' or '\u2029') sb.Append("\\u").Append(((int)c).ToString("x4"));
            else sb.Append(c);
        }
        if (i < text.Length) sb.Append("… (").Append(text.Length.ToString("N0", System.Globalization.CultureInfo.InvariantCulture))
            .Append(" characters)");
        return sb.ToString();
    }
}
