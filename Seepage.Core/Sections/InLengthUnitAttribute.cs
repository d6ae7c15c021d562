namespace Seepage.Core.Sections;

/// <summary>Marks a number of the section document given in <c>lengthUnit</c> (points [x, y] always are, so they need no
/// mark). <see cref="SectionUnits"/> converts every marked member to metres.</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class InLengthUnitAttribute : Attribute;
