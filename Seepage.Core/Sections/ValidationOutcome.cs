namespace Seepage.Core.Sections;

/// <summary>The validator's answer: a model when the section is usable, and every problem found.</summary>
public sealed record ValidationOutcome(SectionModel? Model, IReadOnlyList<SectionProblem> Problems)
{
    public bool IsValid => Model is not null && Problems.Count == 0;
}
