namespace Seepage.Core.Results;

/// <summary>One check of an analysis and its outcome: <see cref="Pass"/> true or false when it ran and gave a verdict,
/// null otherwise, with <see cref="Skipped"/> saying why it did not run or gave no verdict.</summary>
/// <param name="Check">exit, heave, lane, bligh, truncation, convergence or independentVariables.</param>
/// <param name="Pass">The verdict, or null.</param>
/// <param name="Skipped">Why the check did not run or gave no verdict; null when it gave one (or ran as a report).</param>
public sealed record CheckVerdict(string Check, bool? Pass, string? Skipped);
