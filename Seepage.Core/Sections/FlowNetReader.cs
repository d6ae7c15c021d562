using Seepage.Core.Results;

namespace Seepage.Core.Sections;

/// <summary>Reads <c>flowNet</c> of a section document.</summary>
internal static class FlowNetReader
{
    /// <summary>Nd from <c>flowNet.headDrops</c>, or null for the automatic choice; a value out of range is a problem.</summary>
    public static int? HeadDrops(FlowNetDocument? doc, List<SectionProblem> problems)
    {
        if (doc?.HeadDrops is not { } nd) return null;
        if (nd >= FlowNetBuilder.MinHeadDrops && nd <= FlowNetBuilder.MaxHeadDrops) return nd;
        problems.Add(new("/flowNet/headDrops", FormattableString.Invariant(
            $"must be a whole number of head drops from {FlowNetBuilder.MinHeadDrops} to {FlowNetBuilder.MaxHeadDrops}.")));
        return null;
    }
}
