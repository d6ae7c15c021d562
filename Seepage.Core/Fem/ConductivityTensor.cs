using Seepage.Core.Sections;

namespace Seepage.Core.Fem;

/// <summary>The symmetric conductivity tensor K = R diag(kx, ky) Rᵀ of a soil, m/s, R the rotation by the
/// bedding angle (counter-clockwise from +x).</summary>
public readonly record struct ConductivityTensor(double Kxx, double Kxy, double Kyy)
{
    public static ConductivityTensor Of(Soil soil)
    {
        double a = soil.BeddingAngle * Math.PI / 180, c = Math.Cos(a), s = Math.Sin(a);
        return new ConductivityTensor(
            soil.Kx * c * c + soil.Ky * s * s,
            (soil.Kx - soil.Ky) * c * s,
            soil.Kx * s * s + soil.Ky * c * c);
    }

    /// <summary>The tensor times a dimensionless factor (a relative conductivity), m/s.</summary>
    public ConductivityTensor Scaled(double factor) => new(Kxx * factor, Kxy * factor, Kyy * factor);

    /// <summary>Geometric mean conductivity √(kx·ky), m/s: the isotropic equivalent for flow-net counts.</summary>
    public double Mean => Math.Sqrt(Kxx * Kyy - Kxy * Kxy);
}
