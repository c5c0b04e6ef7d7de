namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Smallest root of the flexural-torsional buckling cubic of an asymmetric section
/// (SANS 10162-1 cl. 13.3.2, as CSA S16 13.3.2 (c)):
/// <code>
/// (Fe − Fe1)(Fe − Fe2)(Fe − Fez) − Fe²(Fe − Fe2)(x0/r0)² − Fe²(Fe − Fe1)(y0/r0)² = 0
/// </code>
/// Fe1, Fe2 = flexural buckling stresses about the principal axes 1 and 2, MPa (&gt; 0); Fez =
/// torsional buckling stress, MPa (&gt; 0); x0, y0 = shear-centre coordinates from the centroid along
/// axes 1 and 2, mm; r0² = x0² + y0² + r1² + r2², mm², so (x0² + y0²)/r0² &lt; 1.
/// <para>The cubic is negative at 0 (−Fe1·Fe2·Fez) and not negative at min(Fe1, Fe2, Fez), so the
/// smallest root lies in (0, min]. It is the lowest eigenvalue of a symmetric positive-definite pencil,
/// so all three roots are real.</para>
/// <para>Numerical choices (2026-12-01): the stresses are divided by m = min(Fe1, Fe2, Fez) so the root
/// sought lies in (0, 1]; the closed form is the trigonometric (Viète) solution of the depressed cubic
/// for three real roots, Cardano when rounding leaves one real root; the argument of arccos is clamped
/// to [−1, 1]. The closed-form root is accepted only when it lies in (0, 1] and its relative residual
/// |P(x)| / (|c3|x³ + |c2|x² + |c1|x + |c0|), with P evaluated in the factored form above (no
/// cancellation of expanded coefficients), is at most <see cref="ResidualTolerance"/>. Otherwise (strongly
/// different stresses make the depressed-cubic coefficients cancel) bisection on (0, 1] to machine
/// precision is used, which the sign change guarantees. Either way the result is finite and positive.</para>
/// </summary>
public static class FlexuralTorsionalCubic
{
    /// <summary>Largest accepted relative residual of the closed-form root, dimensionless (2026-12-01 choice).</summary>
    public const double ResidualTolerance = 1e-9;

    /// <summary>Bisection iteration cap; 200 halvings of (0, 1] pass machine precision (2026-12-01 choice).</summary>
    public const int BisectionIterations = 200;

    /// <summary>The smallest root Fe, MPa (in the units of the inputs).</summary>
    /// <param name="fe1">Flexural buckling stress about axis 1, MPa, &gt; 0.</param>
    /// <param name="fe2">Flexural buckling stress about axis 2, MPa, &gt; 0.</param>
    /// <param name="fez">Torsional buckling stress, MPa, &gt; 0.</param>
    /// <param name="x0">Shear-centre coordinate along axis 1, mm.</param>
    /// <param name="y0">Shear-centre coordinate along axis 2, mm.</param>
    /// <param name="r0">Polar radius of gyration about the shear centre, mm, r0² &gt; x0² + y0².</param>
    /// <exception cref="ArgumentOutOfRangeException">A stress is not finite and positive, or r0² ≤ x0² + y0².</exception>
    public static double SmallestRoot(double fe1, double fe2, double fez, double x0, double y0, double r0)
        => SmallestRoot(fe1, fe2, fez, x0, y0, r0, out _);

    /// <summary>As <see cref="SmallestRoot(double, double, double, double, double, double)"/>; <paramref name="usedClosedForm"/> tells which route gave the root.</summary>
    public static double SmallestRoot(double fe1, double fe2, double fez, double x0, double y0, double r0, out bool usedClosedForm)
    {
        RequirePositive(fe1, nameof(fe1));
        RequirePositive(fe2, nameof(fe2));
        RequirePositive(fez, nameof(fez));
        if (!double.IsFinite(x0))
        {
            throw new ArgumentOutOfRangeException(nameof(x0), x0, "must be finite");
        }

        if (!double.IsFinite(y0))
        {
            throw new ArgumentOutOfRangeException(nameof(y0), y0, "must be finite");
        }

        RequirePositive(r0, nameof(r0));
        var a = x0 / r0 * (x0 / r0);
        var b = y0 / r0 * (y0 / r0);
        var h = 1 - a - b;
        if (!(h > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(r0), r0, "r0² must exceed x0² + y0² (H = 1 − (x0² + y0²)/r0² > 0)");
        }

        var m = Math.Min(fe1, Math.Min(fe2, fez));
        var f1 = fe1 / m;
        var f2 = fe2 / m;
        var f3 = fez / m;

        var closed = ClosedFormSmallest(f1, f2, f3, a, b, h);
        if (double.IsFinite(closed) && closed > 0 && closed <= 1 + 1e-12
            && NormalisedResidual(closed, f1, f2, f3, a, b, h) <= ResidualTolerance)
        {
            usedClosedForm = true;
            return Math.Min(closed, 1) * m;
        }

        usedClosedForm = false;
        return Bisect(f1, f2, f3, a, b) * m;
    }

    /// <summary>
    /// Relative residual of a trial root <paramref name="fe"/> of the cubic with the given inputs:
    /// |P(Fe)| / (|c3|Fe³ + |c2|Fe² + |c1|Fe + |c0|), P in factored form, dimensionless.
    /// </summary>
    public static double RelativeResidual(double fe, double fe1, double fe2, double fez, double x0, double y0, double r0)
    {
        var a = x0 / r0 * (x0 / r0);
        var b = y0 / r0 * (y0 / r0);
        var m = Math.Min(fe1, Math.Min(fe2, fez));
        return NormalisedResidual(fe / m, fe1 / m, fe2 / m, fez / m, a, b, 1 - a - b);
    }

    private static void RequirePositive(double value, string name)
    {
        if (!double.IsFinite(value) || value <= 0)
        {
            throw new ArgumentOutOfRangeException(name, value, "must be finite and greater than 0");
        }
    }

    private static double Cubic(double x, double f1, double f2, double f3, double a, double b)
        => (x - f1) * (x - f2) * (x - f3) - x * x * (x - f2) * a - x * x * (x - f1) * b;

    private static double NormalisedResidual(double x, double f1, double f2, double f3, double a, double b, double h)
    {
        // Expanded coefficients (only their magnitudes are used, as the scale of the residual).
        var c3 = h;
        var c2 = -(f1 + f2 + f3) + a * f2 + b * f1;
        var c1 = f1 * f2 + f1 * f3 + f2 * f3;
        var c0 = -f1 * f2 * f3;
        var ax = Math.Abs(x);
        var scale = Math.Abs(c3) * ax * ax * ax + Math.Abs(c2) * ax * ax + Math.Abs(c1) * ax + Math.Abs(c0);
        return Math.Abs(Cubic(x, f1, f2, f3, a, b)) / scale;
    }

    private static double ClosedFormSmallest(double f1, double f2, double f3, double a, double b, double h)
    {
        // x³ + B x² + C x + D = 0 after dividing by c3 = H.
        var bb = (-(f1 + f2 + f3) + a * f2 + b * f1) / h;
        var cc = (f1 * f2 + f1 * f3 + f2 * f3) / h;
        var dd = -f1 * f2 * f3 / h;

        // Depressed cubic t³ + p t + q = 0 with x = t − B/3.
        var shift = bb / 3;
        var p = cc - bb * bb / 3;
        var q = 2 * bb * bb * bb / 27 - bb * cc / 3 + dd;

        if (p < 0)
        {
            var m = 2 * Math.Sqrt(-p / 3);
            var arg = 3 * q / (p * m);
            if (arg >= -1 - 1e-12 && arg <= 1 + 1e-12)
            {
                var theta = Math.Acos(Math.Clamp(arg, -1, 1)) / 3;
                var smallest = double.PositiveInfinity;
                for (var k = 0; k < 3; k++)
                {
                    var x = m * Math.Cos(theta - 2 * Math.PI * k / 3) - shift;
                    if (x > 0 && x < smallest)
                    {
                        smallest = x;
                    }
                }

                return smallest;
            }
        }

        // One real root (or p = 0): Cardano.
        var disc = q * q / 4 + p * p * p / 27;
        if (disc < 0)
        {
            return double.NaN;
        }

        var s = Math.Sqrt(disc);
        return Math.Cbrt(-q / 2 + s) + Math.Cbrt(-q / 2 - s) - shift;
    }

    private static double Bisect(double f1, double f2, double f3, double a, double b)
    {
        // P(0) < 0 and P(1) ≥ 0 (1 = min of the normalised stresses): keep the sign change bracketed.
        var lo = 0.0;
        var hi = 1.0;
        if (Cubic(hi, f1, f2, f3, a, b) <= 0)
        {
            return hi;
        }

        for (var i = 0; i < BisectionIterations; i++)
        {
            var mid = 0.5 * (lo + hi);
            if (mid <= lo || mid >= hi)
            {
                break;
            }

            if (Cubic(mid, f1, f2, f3, a, b) < 0)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return hi;
    }
}
