namespace Seepage.Core.Sections;

/// <summary>Marks a unit weight of the section document given in <c>unitWeightUnit</c>; <see cref="SectionUnits"/>
/// converts every marked member to kN/m³.</summary>
[AttributeUsage(AttributeTargets.Property)]
public sealed class InUnitWeightUnitAttribute : Attribute;
