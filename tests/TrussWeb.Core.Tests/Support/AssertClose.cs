using System.Globalization;
using Xunit.Sdk;

namespace TrussWeb.Core.Tests.Support;

/// <summary>The one relative-tolerance assertion of the test suites. NaN and infinities never pass.</summary>
public static class AssertClose
{
    /// <summary>Asserts |actual - expected| &lt;= relTol·|expected| (or absTol when expected is 0).</summary>
    public static void Relative(double expected, double actual, double relTol, string? what = null, double absTol = 1e-12)
    {
        if (!double.IsFinite(actual))
        {
            throw new XunitException($"{what ?? "value"}: expected {Fmt(expected)}, got non-finite {Fmt(actual)}");
        }

        if (!double.IsFinite(expected))
        {
            throw new XunitException($"{what ?? "value"}: the expected value {Fmt(expected)} is not finite (test defect)");
        }

        var allowed = expected == 0 ? absTol : Math.Abs(expected) * relTol;
        var diff = Math.Abs(actual - expected);
        if (diff > allowed)
        {
            var rel = expected == 0 ? double.PositiveInfinity : diff / Math.Abs(expected);
            throw new XunitException(
                $"{what ?? "value"}: expected {Fmt(expected)} ± {relTol:P2}, got {Fmt(actual)} (off by {rel:P3})");
        }
    }

    private static string Fmt(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
}
