using System.Collections;
using System.Reflection;

namespace Seepage.Core.Results;

/// <summary>
/// The last gate of an analysis: every number of the result (the figures' records, walked member by member, and the nodal
/// heads) must be finite, or <see cref="NonFiniteResultException"/> names the first one that is not. The walk covers every
/// public double of the result records, so a figure added later is guarded without a change here.
/// </summary>
public static class FiniteResultGuard
{
    // The section, mesh and field are inputs or bulk arrays (the heads are checked directly); the flow net is drawn from the heads.
    private static readonly HashSet<string> Skipped = [nameof(AnalysisResult.Section), nameof(AnalysisResult.Mesh),
        nameof(AnalysisResult.Field), nameof(AnalysisResult.FlowNet), nameof(AnalysisResult.Solver)];

    public static void Check(AnalysisResult result)
    {
        var heads = result.Field.Heads;
        for (int i = 0; i < heads.Length; i++)
            if (!double.IsFinite(heads[i])) throw new NonFiniteResultException($"/field/heads/{i}", heads[i]);
        foreach (var property in typeof(AnalysisResult).GetProperties(BindingFlags.Public | BindingFlags.Instance))
            if (!Skipped.Contains(property.Name)) Walk(property.GetValue(result), "/" + Camel(property.Name), 0);
    }

    private static void Walk(object? value, string path, int depth)
    {
        switch (value)
        {
            case null or string or bool or int: return;
            case double d:
                if (!double.IsFinite(d)) throw new NonFiniteResultException(path, d);
                return;
            case double[] array:
                for (int i = 0; i < array.Length; i++) Walk(array[i], $"{path}/{i}", depth);
                return;
            case IEnumerable list:
                int k = 0;
                foreach (var item in list) Walk(item, $"{path}/{k++}", depth + 1);
                return;
        }
        var type = value.GetType();
        if (depth > 6 || type.Namespace?.StartsWith("Seepage.Core", StringComparison.Ordinal) != true || type.IsEnum) return;
        foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance))
            if (property.GetIndexParameters().Length == 0) Walk(property.GetValue(value), path + "/" + Camel(property.Name), depth + 1);
    }

    private static string Camel(string name) => char.ToLowerInvariant(name[0]) + name[1..];
}
