using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Web.Components.Sections;

/// <summary>One line of a properties panel: symbol, words, value as Core computed it, and unit.</summary>
public sealed record SectionPropertyRow(string Symbol, string Description, double Value, string Unit)
{
    /// <summary>The value to 3 significant figures with its unit (<see cref="Display.Sig"/>).</summary>
    public string Text => string.IsNullOrEmpty(Unit) ? Display.Sig(Value) : $"{Display.Sig(Value)} {Unit}";

    /// <summary>Every computed property of a section, in the units of <see cref="SectionProperties"/> (Alpha also in degrees).</summary>
    public static IReadOnlyList<SectionPropertyRow> For(SectionProperties s)
    {
        ArgumentNullException.ThrowIfNull(s);
        var rows = new List<SectionPropertyRow>
        {
            new("A", "Gross area", s.Area, "mm²"),
            new("m", "Mass per metre (7 850 kg/m³)", s.MassPerMetre, "kg/m"),
            new("ex", "Centroid from the reference corner along x", s.CentroidX, "mm"),
            new("ey", "Centroid from the reference corner along y", s.CentroidY, "mm"),
            new("Ix", "Second moment of area about x-x", s.Ix, "mm⁴"),
            new("Iy", "Second moment of area about y-y", s.Iy, "mm⁴"),
            new("Ixy", "Product of area about x-x, y-y", s.Ixy, "mm⁴"),
            new("rx", "Radius of gyration about x-x", s.Rx, "mm"),
            new("ry", "Radius of gyration about y-y", s.Ry, "mm"),
            new("Iu", "Major principal second moment of area", s.Iu, "mm⁴"),
            new("Iv", "Minor principal second moment of area", s.Iv, "mm⁴"),
            new("ru", "Radius of gyration about u-u", s.Ru, "mm"),
            new("rv", "Radius of gyration about v-v", s.Rv, "mm"),
            new("α", "Angle from x-x to u-u", s.Alpha * 180 / Math.PI, "°"),
            new("Sx", "Elastic section modulus about x-x (smaller)", s.Sx, "mm³"),
            new("Sy", "Elastic section modulus about y-y (smaller)", s.Sy, "mm³"),
            new("J", "St Venant torsion constant", s.J, "mm⁴"),
            new("Cw", "Warping constant", s.Cw, "mm⁶"),
            new("x0", "Shear centre from the centroid along x", s.X0, "mm"),
            new("y0", "Shear centre from the centroid along y", s.Y0, "mm"),
            new("u0", "Shear centre from the centroid along u", s.U0, "mm"),
            new("v0", "Shear centre from the centroid along v", s.V0, "mm"),
            new("r0", "Polar radius of gyration about the shear centre", s.R0, "mm"),
            new("H", "Flexural-torsional constant", s.H, ""),
            new("t", "Governing thickness (yield strength band)", s.GoverningThickness, "mm"),
        };
        if (s.Gap > 0)
        {
            rows.Add(new("s", "Gap between the backs", s.Gap, "mm"));
        }

        return rows;
    }
}
