using Seepage.Core.Imports;

namespace Seepage.Api;

/// <summary>
/// What one request may cost, configured under <c>Limits</c> (e.g. <c>Limits__MaxWorkUnknowns=2000000</c> in the environment).
/// Work is counted in unknowns of every solve an analysis makes (see <see cref="Seepage.Core.Sections.WorkEstimate"/>); a request over
/// <see cref="MaxWorkUnknowns"/> is refused before it starts, one over <see cref="HeavyWorkUnknowns"/> waits for one of
/// <see cref="HeavyConcurrency"/> slots (queue of <see cref="HeavyQueueLength"/>, then 429 with <c>Retry-After</c>).
/// </summary>
public sealed class ServiceLimits
{
    public const string Section = "Limits";

    /// <summary>Largest estimated work of one analysis, unknowns summed over all its solves (default 6,000,000: about a
    /// 3-million-triangle linear mesh, or the design example at 0.15 m with the convergence check).</summary>
    public long MaxWorkUnknowns { get; set; } = 6_000_000;

    /// <summary>Largest estimated single solve, unknowns (default 2,000,000: about 1.4 GB while it runs).</summary>
    public long MaxSolveUnknowns { get; set; } = 2_000_000;

    /// <summary>Work above which an analysis counts as heavy and takes a slot (default 150,000 unknowns, about a second).</summary>
    public long HeavyWorkUnknowns { get; set; } = 150_000;

    /// <summary>Heavy analyses running at once in this process (default 0 = half the processor count, at least 1).</summary>
    public int HeavyConcurrency { get; set; }

    /// <summary>Heavy analyses waiting for a slot; one more is answered 429 (default 8).</summary>
    public int HeavyQueueLength { get; set; } = 8;

    /// <summary>The Retry-After of a 429, seconds (default 10).</summary>
    public int RetryAfterSeconds { get; set; } = 10;

    /// <summary>POST requests per client address and minute (default 600; 0 turns the rate limit off).</summary>
    public int PostsPerMinute { get; set; } = 600;

    /// <summary>Unpacked bytes of an .xlsx import (default 16 MiB).</summary>
    public long SpreadsheetUnpackedBytes { get; set; } = SpreadsheetLimits.Default.MaxUnpackedBytes;

    /// <summary>Rows of one sheet of an import (default 20,000).</summary>
    public int SpreadsheetRows { get; set; } = SpreadsheetLimits.Default.MaxRows;

    /// <summary>Columns of one sheet of an import (default 64).</summary>
    public int SpreadsheetColumns { get; set; } = SpreadsheetLimits.Default.MaxColumns;

    /// <summary>Characters of one cell of an import (default 4,000).</summary>
    public int SpreadsheetCellLength { get; set; } = SpreadsheetLimits.Default.MaxCellLength;

    public int EffectiveHeavyConcurrency => HeavyConcurrency > 0 ? HeavyConcurrency : Math.Max(1, Environment.ProcessorCount / 2);

    /// <summary>The problem when a section's estimated work is over the budget, else null.</summary>
    public Seepage.Core.Sections.SectionProblem? OverBudget(Seepage.Core.Sections.SectionModel section) =>
        Seepage.Core.Sections.WorkEstimate.Of(section).Exceeds(MaxWorkUnknowns, MaxSolveUnknowns);

    public SpreadsheetLimits Spreadsheets => new()
    {
        MaxUnpackedBytes = SpreadsheetUnpackedBytes, MaxRows = SpreadsheetRows, MaxColumns = SpreadsheetColumns,
        MaxCellLength = SpreadsheetCellLength,
    };
}
