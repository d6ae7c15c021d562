namespace Seepage.Core.Sections;

/// <summary>Suggests the names a misspelt one was probably meant to be: the same letters in another case, or within a
/// small edit distance (optimal string alignment: insertions, deletions, substitutions, adjacent swaps).</summary>
public static class NearMatch
{
    /// <summary>The candidates near <paramref name="given"/>, best first (at most three).</summary>
    public static IReadOnlyList<string> Of(string given, IEnumerable<string> candidates)
    {
        string key = Fold(given);
        int allowed = key.Length <= 3 ? 1 : key.Length <= 7 ? 2 : 3;
        return candidates.Select(c => (Name: c, Distance: Distance(key, Fold(c))))
            .Where(x => x.Distance <= allowed).OrderBy(x => x.Distance).ThenBy(x => x.Name, StringComparer.Ordinal)
            .Take(3).Select(x => x.Name).ToList();
    }

    /// <summary>"did you mean `a` or `b`?" for the near candidates, or null when none is near.</summary>
    public static string? Suggestion(string given, IEnumerable<string> candidates)
    {
        var near = Of(given, candidates);
        return near.Count == 0 ? null : "did you mean " + string.Join(" or ", near.Select(n => $"`{n}`")) + "?";
    }

    // Case, spaces, hyphens and underscores do not count as differences.
    private static string Fold(string s) =>
        new(s.Where(c => c is not (' ' or '-' or '_')).Select(char.ToLowerInvariant).ToArray());

    private static int Distance(string a, string b)
    {
        if (Math.Abs(a.Length - b.Length) > 3) return int.MaxValue;
        var d = new int[a.Length + 1, b.Length + 1];
        for (int i = 0; i <= a.Length; i++) d[i, 0] = i;
        for (int j = 0; j <= b.Length; j++) d[0, j] = j;
        for (int i = 1; i <= a.Length; i++)
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1]) d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
            }
        return d[a.Length, b.Length];
    }
}
