namespace Seepage.Core.Sections;

/// <summary>The defaults a section takes for members it leaves out, named once. The validator applies them, the
/// result echoes them (every default used is stated), and the memo and the page read them from the result.</summary>
public static class SectionDefaults
{
    /// <summary>Unit weight of fresh water, kN/m³ (common practice; sea water is about 10.05).</summary>
    public const double WaterUnitWeight = 9.81;

    /// <summary>Depth below the exit surface over which the exit gradient is averaged, m (common practice: about
    /// the size of the soil grains' arching zone; the gradient at the surface itself is mesh-dependent).</summary>
    public const double ExitDepth = 0.5;

    /// <summary>Required factor of safety against piping (critical / exit gradient); common practice, local codes
    /// govern.</summary>
    public const double ExitRequiredFactor = 3.0;

    /// <summary>Required factor of safety against heave of Terzaghi's prism (Terzaghi, "Theoretical Soil
    /// Mechanics", 1943, recommends about 1.5 to 2; local codes govern).</summary>
    public const double HeaveRequiredFactor = 1.5;

    /// <summary>Smallest triangle angle of the quality mesh, degrees (the mesher guarantees up to 33°).</summary>
    public const double MinAngle = 28.0;

    /// <summary>The allowable exit gradient i_c / F_required (dimensionless), or null without a critical gradient or
    /// a positive required factor. Computed here only; the API and the page read it from the result.</summary>
    public static double? AllowableGradient(double? criticalGradient, double requiredFactor) =>
        criticalGradient is { } ic && requiredFactor > 0 ? ic / requiredFactor : null;
}
