using System.Numerics;
using System.Runtime.InteropServices;

namespace Seepage.Core.Solvers;

/// <summary>Dense vector kernels of the Krylov loop, SIMD through <see cref="Vector{T}"/> and split over
/// two threads for long vectors. Fused where a loop would otherwise read the same arrays twice.</summary>
internal static unsafe class VectorKernels
{
    public static double Dot(ReadOnlySpan<double> u, ReadOnlySpan<double> v)
    {
        int n = u.Length;
        fixed (double* pu = u, pv = v)
        {
            nint a = (nint)pu, b = (nint)pv;
            return TwoWay.Sum(n, TwoWay.Middle(n), (lo, hi) =>
                DotRange(new ReadOnlySpan<double>((double*)a + lo, hi - lo), new ReadOnlySpan<double>((double*)b + lo, hi - lo)));
        }
    }

    /// <summary>x += α p; r −= α q; returns r·r — one pass of the CG update.</summary>
    public static double UpdateSolutionAndResidual(Span<double> x, Span<double> r, ReadOnlySpan<double> p,
        ReadOnlySpan<double> q, double alpha)
    {
        int n = x.Length;
        fixed (double* px = x, pr = r, pp = p, pq = q)
        {
            nint ax = (nint)px, ar = (nint)pr, ap = (nint)pp, aq = (nint)pq;
            return TwoWay.Sum(n, TwoWay.Middle(n), (lo, hi) => UpdateRange(
                new Span<double>((double*)ax + lo, hi - lo), new Span<double>((double*)ar + lo, hi - lo),
                new ReadOnlySpan<double>((double*)ap + lo, hi - lo), new ReadOnlySpan<double>((double*)aq + lo, hi - lo), alpha));
        }
    }

    /// <summary>p = z + β p.</summary>
    public static void UpdateDirection(Span<double> p, ReadOnlySpan<double> z, double beta)
    {
        int n = p.Length;
        fixed (double* pp = p, pz = z)
        {
            nint ap = (nint)pp, az = (nint)pz;
            TwoWay.For(n, TwoWay.Middle(n), (lo, hi) => DirectionRange(
                new Span<double>((double*)ap + lo, hi - lo), new ReadOnlySpan<double>((double*)az + lo, hi - lo), beta));
        }
    }

    private static double DotRange(ReadOnlySpan<double> u, ReadOnlySpan<double> v)
    {
        int w = Vector<double>.Count, i = 0;
        var vu = MemoryMarshal.Cast<double, Vector<double>>(u);
        var vv = MemoryMarshal.Cast<double, Vector<double>>(v);
        var acc = Vector<double>.Zero;
        for (int k = 0; k < vu.Length; k++) acc += vu[k] * vv[k];
        double s = Vector.Sum(acc);
        for (i = vu.Length * w; i < u.Length; i++) s += u[i] * v[i];
        return s;
    }

    private static double UpdateRange(Span<double> x, Span<double> r, ReadOnlySpan<double> p, ReadOnlySpan<double> q, double alpha)
    {
        var vx = MemoryMarshal.Cast<double, Vector<double>>(x);
        var vr = MemoryMarshal.Cast<double, Vector<double>>(r);
        var vp = MemoryMarshal.Cast<double, Vector<double>>(p);
        var vq = MemoryMarshal.Cast<double, Vector<double>>(q);
        var va = new Vector<double>(alpha);
        var acc = Vector<double>.Zero;
        for (int k = 0; k < vx.Length; k++)
        {
            vx[k] += va * vp[k];
            var rk = vr[k] - va * vq[k];
            vr[k] = rk;
            acc += rk * rk;
        }
        double s = Vector.Sum(acc);
        for (int i = vx.Length * Vector<double>.Count; i < x.Length; i++)
        {
            x[i] += alpha * p[i];
            r[i] -= alpha * q[i];
            s += r[i] * r[i];
        }
        return s;
    }

    private static void DirectionRange(Span<double> p, ReadOnlySpan<double> z, double beta)
    {
        var vp = MemoryMarshal.Cast<double, Vector<double>>(p);
        var vz = MemoryMarshal.Cast<double, Vector<double>>(z);
        var vb = new Vector<double>(beta);
        for (int k = 0; k < vp.Length; k++) vp[k] = vz[k] + vb * vp[k];
        for (int i = vp.Length * Vector<double>.Count; i < p.Length; i++) p[i] = z[i] + beta * p[i];
    }
}
