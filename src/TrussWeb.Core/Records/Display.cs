using System.Globalization;

namespace TrussWeb.Core.Records;

/// <summary>
/// The one number formatter of TrussWeb (invariant culture). Results display at 3 significant
/// figures; values substituted into expressions at 4 so that a checker can follow the arithmetic
/// (2026-12-01: 3 s.f. in substitutions made hand re-computation drift by up to 0.5 %).
/// Values are never rounded before this point.
/// </summary>
public static class Display
{
    /// <summary>Significant figures of a displayed result.</summary>
    public const int ResultFigures = 3;

    /// <summary>Significant figures of a value substituted into an expression.</summary>
    public const int SubstitutedFigures = 4;

    /// <summary>Formats <paramref name="value"/> to <paramref name="figures"/> significant figures, without exponent for ordinary magnitudes.</summary>
    public static string Sig(double value, int figures = ResultFigures)
    {
        if (double.IsNaN(value))
        {
            return "NaN";
        }

        if (double.IsInfinity(value))
        {
            return value > 0 ? "∞" : "-∞";
        }

        if (value == 0)
        {
            return "0";
        }

        var magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        if (magnitude >= 9 || magnitude <= -5)
        {
            return value.ToString("E" + (figures - 1), CultureInfo.InvariantCulture);
        }

        var decimals = Math.Max(0, figures - 1 - magnitude);
        var scale = Math.Pow(10, magnitude - figures + 1);
        var rounded = decimals > 0 ? Math.Round(value, decimals) : Math.Round(value / scale) * scale;
        return rounded.ToString("F" + decimals, CultureInfo.InvariantCulture);
    }

    /// <summary>A value as substituted into an expression (4 significant figures).</summary>
    public static string S(double value) => Sig(value, SubstitutedFigures);
}
