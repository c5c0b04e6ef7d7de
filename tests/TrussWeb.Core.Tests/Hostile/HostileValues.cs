using FsCheck;
using FsCheck.Fluent;

namespace TrussWeb.Core.Tests.Hostile;

/// <summary>
/// Generators of hostile numbers: NaN, infinities, zero, negative zero, negatives, tiny and huge
/// magnitudes, mixed with ordinary engineering values, so every entry point sees both.
/// </summary>
public static class HostileValues
{
    private static readonly double[] Specials =
    [
        double.NaN, double.PositiveInfinity, double.NegativeInfinity, 0.0, -0.0, -1.0, 1e-300, -1e-300,
        double.Epsilon, 1e300, -1e300, double.MaxValue, double.MinValue, 1e-9, 1e12,
    ];

    /// <summary>A value that is hostile about half the time and an ordinary magnitude (0.1 to 20 000) otherwise.</summary>
    public static Gen<double> Number() =>
        Gen.OneOf(
            Gen.Elements(Specials),
            Gen.Choose(1, 200_000).Select(i => i / 10.0),
            Gen.Choose(-200_000, 200_000).Select(i => i / 10.0));

    /// <summary>A value that is ordinary (positive, 1 to 10 000) most of the time.</summary>
    public static Gen<double> MostlyOrdinary() =>
        Gen.Frequency(
            (1, Gen.Elements(Specials)),
            (6, Gen.Choose(10, 100_000).Select(i => i / 10.0)));

    public static bool AllFinite(params double[] values) => values.All(double.IsFinite);
}
