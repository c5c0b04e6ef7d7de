namespace TrussWeb.Core.Tests.Sections;

/// <summary>Inch-to-millimetre conversions for the AISC table rows. Source: 1 in = 25.4 mm exactly (international inch).</summary>
internal static class UnitConversion
{
    public const double MmPerInch = 25.4;

    public static double Mm(double inches) => inches * MmPerInch;

    public static double Mm2(double squareInches) => squareInches * Math.Pow(MmPerInch, 2);

    public static double Mm4(double inches4) => inches4 * Math.Pow(MmPerInch, 4);

    public static double Mm6(double inches6) => inches6 * Math.Pow(MmPerInch, 6);

    /// <summary>cm, cm², cm⁴ to mm, mm², mm⁴ (EN tables).</summary>
    public static double FromCm(double value, int power) => value * Math.Pow(10, power);
}
