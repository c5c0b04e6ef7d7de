using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Axial compressive resistance, SANS 10162-1 cl. 13.3 (formulas as CSA S16 13.3):
/// <code>
/// Cr = φ A Fy (1 + λ^(2n))^(−1/n),  λ = √(Fy/Fe)                      (cl. 13.3.1)
/// Fex = π²E/(KxLx/rx)²,  Fey = π²E/(KyLy/ry)²                         (cl. 13.3.2)
/// Fez = [π²E Cw/(KzLz)² + G J] / (A r0²)
/// </code>
/// Symbols: A area, mm² (effective area Ae for class 4 sections, with Fe from gross properties);
/// Fy yield strength, MPa; E, G elastic and shear moduli, MPa; KL effective lengths, mm; r radii of
/// gyration, mm; Cw warping constant, mm⁶; J torsion constant, mm⁴; r0 polar radius of gyration about
/// the shear centre, mm; n = 1.34 (hot-rolled, cold-formed non-stress-relieved HSS) or 2.24
/// (stress-relieved HSS).
/// <para>Elastic buckling stress Fe by symmetry: doubly symmetric min(Fex, Fey, Fez); singly symmetric
/// (y-y the axis of symmetry) min(Fex, Feyz); asymmetric (single angles, in principal axes u, v) the
/// smallest root of the cubic, <see cref="FlexuralTorsionalCubic"/>. Single angles (family Angle) always
/// use principal axes and the cubic, which also covers equal angles (one of u0, v0 is zero).</para>
/// <para>Scope: concentrically loaded prismatic members; no local-global interaction beyond the class 4
/// effective area.</para>
/// </summary>
public static class Compression
{
    /// <summary>Elastic flexural buckling stress π²E/ρ², MPa, for slenderness ρ = KL/r &gt; 0.</summary>
    public static double FlexuralBucklingStress(double e, double slenderness)
    {
        if (!double.IsFinite(slenderness) || slenderness <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(slenderness), slenderness, "KL/r must be finite and greater than 0");
        }

        return Math.PI * Math.PI * e / (slenderness * slenderness);
    }

    /// <summary>Torsional buckling stress Fez = [π²E Cw/(KzLz)² + G J]/(A r0²), MPa (cl. 13.3.2).</summary>
    public static double TorsionalBucklingStress(double e, double g, double cw, double j, double area, double r0, double klz)
    {
        if (!(klz > 0) || !double.IsFinite(klz))
        {
            throw new ArgumentOutOfRangeException(nameof(klz), klz, "KzLz must be finite and greater than 0");
        }

        if (!(area > 0) || !(r0 > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(area), area, "area and r0 must be greater than 0");
        }

        return (Math.PI * Math.PI * e * cw / (klz * klz) + g * j) / (area * r0 * r0);
    }

    /// <summary>
    /// Flexural-torsional buckling stress of a singly symmetric section (y-y the axis of symmetry),
    /// Feyz = (Fey + Fez)/(2H) [1 − √(1 − 4 Fey Fez H/(Fey + Fez)²)], MPa (cl. 13.3.2 (b)).
    /// Evaluated in the equivalent form 2 Fey Fez / [(Fey + Fez)(1 + √(1 − k))], k = 4 Fey Fez H/(Fey + Fez)²,
    /// which avoids the cancellation of 1 − √(1 − k) for small k (2026-12-01). 0 &lt; H ≤ 1.
    /// </summary>
    public static double FlexuralTorsionalSinglySymmetric(double fey, double fez, double h)
    {
        if (!(fey > 0) || !(fez > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(fey), fey, "Fey and Fez must be greater than 0");
        }

        if (!(h > 0) || h > 1)
        {
            throw new ArgumentOutOfRangeException(nameof(h), h, "H must lie in (0, 1]");
        }

        var sum = fey + fez;
        var k = Math.Min(1.0, 4 * fey * fez * h / (sum * sum));
        return 2 * fey * fez / (sum * (1 + Math.Sqrt(1 - k)));
    }

    /// <summary>λ = √(Fy/Fe), dimensionless (cl. 13.3.1).</summary>
    public static double NonDimensionalSlenderness(double fy, double fe) => Math.Sqrt(fy / fe);

    /// <summary>Cr = φ A Fy (1 + λ^(2n))^(−1/n), N (cl. 13.3.1). A mm², Fy MPa, λ ≥ 0, n &gt; 0.</summary>
    public static double FactoredResistance(double phi, double area, double fy, double lambda, double n)
        => phi * area * fy * Math.Pow(1 + Math.Pow(lambda, 2 * n), -1 / n);

    /// <summary>
    /// Compressive resistance of a section with all its buckling modes (cl. 13.3.1, 13.3.2).
    /// </summary>
    /// <param name="section">Section properties (gross), mm.</param>
    /// <param name="material">Material, MPa.</param>
    /// <param name="lengths">Effective lengths; single angles use max(KxLx, KyLy) about u and v unless KLu/KLv are given.</param>
    /// <param name="n">Compression exponent (1.34 or 2.24).</param>
    /// <param name="area">Area for Cr: gross A, or Ae for class 4, mm².</param>
    /// <param name="slendernessY">Optional slenderness about y-y replacing KyLy/ry (modified slenderness ρe of a built-up member), or null.</param>
    /// <param name="record">Record to append the steps to, or null.</param>
    public static CompressionResistance Resistance(SectionProperties section, Material material, EffectiveLengths lengths,
        double n, double area, double? slendernessY, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(material);
        ArgumentNullException.ThrowIfNull(lengths);
        const string refFe = Sans10162References.ElasticBuckling;
        var e = material.E;
        var klz = lengths.Kz * lengths.Lz;
        double fe1, fe2, fe, rho1, rho2;
        string a1, a2, mode;
        var fez = TorsionalBucklingStress(e, material.G, section.Cw, section.J, section.Area, section.R0, klz);

        if (section.Family == SectionFamily.Angle)
        {
            a1 = "u";
            a2 = "v";
            var klMax = Math.Max(lengths.Kx * lengths.Lx, lengths.Ky * lengths.Ly);
            var klu = lengths.KLu ?? klMax;
            var klv = lengths.KLv ?? klMax;
            record?.Note(lengths.KLu is null || lengths.KLv is null
                ? $"Single angle: buckling about the principal axes u-u and v-v with KL = max(KxLx, KyLy) = max({Display.S(lengths.Kx * lengths.Lx)}, {Display.S(lengths.Ky * lengths.Ly)}) = {Display.S(klMax)} mm where no principal-axis length is given (conservative, common practice)."
                : "Single angle: buckling about the principal axes u-u and v-v with the principal-axis effective lengths given by the user.");
            rho1 = klu / section.Ru;
            rho2 = klv / section.Rv;
            fe1 = FlexuralBucklingStress(e, rho1);
            fe2 = FlexuralBucklingStress(e, rho2);
            record?.Add("KLu/ru", "Slenderness about the major principal axis u-u", "KLu / ru", $"{Display.S(klu)} / {Display.S(section.Ru)}", rho1, "", refFe);
            record?.Add("KLv/rv", "Slenderness about the minor principal axis v-v", "KLv / rv", $"{Display.S(klv)} / {Display.S(section.Rv)}", rho2, "", refFe);
            record?.Add("Feu", "Elastic flexural buckling stress about u-u", "π²E / (KLu/ru)²", $"π² × {Display.S(e)} / {Display.S(rho1)}²", fe1, "MPa", refFe);
            record?.Add("Fev", "Elastic flexural buckling stress about v-v", "π²E / (KLv/rv)²", $"π² × {Display.S(e)} / {Display.S(rho2)}²", fe2, "MPa", refFe);
            AddFez(record, section, material, klz, fez);
            fe = FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, section.U0, section.V0, section.R0);
            record?.Add("Fe", "Elastic buckling stress: smallest root of the flexural-torsional cubic (asymmetric section, principal axes)",
                "(Fe − Feu)(Fe − Fev)(Fe − Fez) − Fe²(Fe − Fev)(u0/r0)² − Fe²(Fe − Feu)(v0/r0)² = 0",
                $"Feu = {Display.S(fe1)}, Fev = {Display.S(fe2)}, Fez = {Display.S(fez)}, u0 = {Display.S(section.U0)}, v0 = {Display.S(section.V0)}, r0 = {Display.S(section.R0)}",
                fe, "MPa", refFe + ", asymmetric sections");
            mode = "flexural-torsional (single angle, principal axes)";
        }
        else
        {
            a1 = "x";
            a2 = "y";
            var klx = lengths.Kx * lengths.Lx;
            var kly = lengths.Ky * lengths.Ly;
            rho1 = klx / section.Rx;
            rho2 = slendernessY ?? kly / section.Ry;
            fe1 = FlexuralBucklingStress(e, rho1);
            fe2 = FlexuralBucklingStress(e, rho2);
            record?.Add("KxLx/rx", "Slenderness about x-x (in-plane buckling)", "KxLx / rx", $"{Display.S(klx)} / {Display.S(section.Rx)}", rho1, "", refFe);
            if (slendernessY is null)
            {
                record?.Add("KyLy/ry", "Slenderness about y-y (out-of-plane buckling)", "KyLy / ry", $"{Display.S(kly)} / {Display.S(section.Ry)}", rho2, "", refFe);
            }

            record?.Add("Fex", "Elastic flexural buckling stress about x-x", "π²E / (KxLx/rx)²", $"π² × {Display.S(e)} / {Display.S(rho1)}²", fe1, "MPa", refFe);
            record?.Add("Fey", slendernessY is null ? "Elastic flexural buckling stress about y-y" : "Elastic flexural buckling stress about y-y from the modified slenderness ρe",
                slendernessY is null ? "π²E / (KyLy/ry)²" : "π²E / ρe²", $"π² × {Display.S(e)} / {Display.S(rho2)}²", fe2, "MPa",
                slendernessY is null ? refFe : refFe + "; " + Sans10162References.ModifiedSlenderness);
            AddFez(record, section, material, klz, fez);

            if (section.Symmetry == SymmetryKind.Doubly)
            {
                fe = Math.Min(fe1, Math.Min(fe2, fez));
                mode = fe == fe1 ? "flexural about x-x" : fe == fe2 ? "flexural about y-y" : "torsional";
                record?.Add("Fe", "Elastic buckling stress, doubly symmetric section", "min(Fex, Fey, Fez)",
                    $"min({Display.S(fe1)}, {Display.S(fe2)}, {Display.S(fez)})", fe, "MPa", refFe + " (a), doubly symmetric");
            }
            else if (section.Symmetry == SymmetryKind.Singly)
            {
                var h = section.H;
                record?.Add("H", "Flexural-torsional constant (Ω)", "1 − (x0² + y0²)/r0²",
                    $"1 − ({Display.S(section.X0)}² + {Display.S(section.Y0)}²) / {Display.S(section.R0)}²", h, "", refFe);
                var feyz = FlexuralTorsionalSinglySymmetric(fe2, fez, h);
                record?.Add("Feyz", "Flexural-torsional buckling stress about the axis of symmetry y-y",
                    "(Fey + Fez)/(2H) [1 − √(1 − 4 Fey Fez H/(Fey + Fez)²)]",
                    $"({Display.S(fe2)} + {Display.S(fez)}) / (2 × {Display.S(h)}) × [1 − √(1 − 4 × {Display.S(fe2)} × {Display.S(fez)} × {Display.S(h)} / ({Display.S(fe2)} + {Display.S(fez)})²)]",
                    feyz, "MPa", refFe + " (b), singly symmetric");
                fe = Math.Min(fe1, feyz);
                mode = fe == fe1 ? "flexural about x-x" : "flexural-torsional about y-y";
                record?.Add("Fe", "Elastic buckling stress, singly symmetric section", "min(Fex, Feyz)",
                    $"min({Display.S(fe1)}, {Display.S(feyz)})", fe, "MPa", refFe + " (b)");
            }
            else
            {
                fe = FlexuralTorsionalCubic.SmallestRoot(fe1, fe2, fez, section.X0, section.Y0, section.R0);
                mode = "flexural-torsional (asymmetric section)";
                record?.Add("Fe", "Elastic buckling stress: smallest root of the flexural-torsional cubic (asymmetric section)",
                    "(Fe − Fex)(Fe − Fey)(Fe − Fez) − Fe²(Fe − Fey)(x0/r0)² − Fe²(Fe − Fex)(y0/r0)² = 0",
                    $"Fex = {Display.S(fe1)}, Fey = {Display.S(fe2)}, Fez = {Display.S(fez)}, x0 = {Display.S(section.X0)}, y0 = {Display.S(section.Y0)}, r0 = {Display.S(section.R0)}",
                    fe, "MPa", refFe + " (c), asymmetric sections");
            }
        }

        var lambda = NonDimensionalSlenderness(material.Fy, fe);
        record?.Add("λ", "Non-dimensional slenderness", "√(Fy / Fe)", $"√({Display.S(material.Fy)} / {Display.S(fe)})", lambda, "", Sans10162References.CompressionResistance);
        var cr = FactoredResistance(ResistanceFactors.Phi, area, material.Fy, lambda, n);
        record?.Add("Cr", "Factored compressive resistance", "φ A Fy (1 + λ^(2n))^(−1/n)",
            $"{Display.S(ResistanceFactors.Phi)} × {Display.S(area)} × {Display.S(material.Fy)} × (1 + {Display.S(lambda)}^(2 × {Display.S(n)}))^(−1/{Display.S(n)}) / 1000",
            cr / 1000, "kN", Sans10162References.CompressionResistance);
        record?.Note($"Governing elastic buckling mode: {mode}.");
        return new CompressionResistance(a1, a2, rho1, rho2, fe1, fe2, fez, fe, mode, area, lambda, cr);
    }

    /// <summary>
    /// The compression check of a member: Cf against Cr from <see cref="Resistance"/>, with the optional
    /// 0.85 factor on first web compression members of trusses (SANS 10162-1:2005 cl. 15, as reported),
    /// stated in the record.
    /// </summary>
    /// <param name="compression">Factored compressive force Cf, N, ≥ 0.</param>
    /// <param name="resistance">Resistance from <see cref="Resistance"/> (or the governing one of a built-up member).</param>
    /// <param name="options">Member options.</param>
    /// <param name="name">Check name.</param>
    /// <param name="record">Record, or null.</param>
    public static CheckResult Check(double compression, double resistance, DesignOptions options, string name, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(options);
        var cr = resistance;
        if (options.FirstWebMemberFactor)
        {
            cr = FirstWebMemberFactor * resistance;
            record?.Add("Cr'", "Resistance of a first web compression member of a truss with the further factor 0.85 (option)",
                "0.85 Cr", $"0.85 × {Display.S(resistance / 1000)}", cr / 1000, "kN", Sans10162References.Trusses);
            record?.Note("Option on: further factor 0.85 on the resistance of a first web compression member (SANS 10162-1:2005 cl. 15 as reported in a published synopsis; confirm for the edition in use).");
        }

        var u = cr > 0 ? compression / cr : double.PositiveInfinity;
        record?.Add("Cf/Cr", "Utilization in compression", "Cf / Cr", $"{Display.S(compression / 1000)} / {Display.S(cr / 1000)}", u, "", Sans10162References.CompressionResistance);
        return new CheckResult(name, compression, cr, u, u <= 1 ? CheckStatus.Pass : CheckStatus.Fail, "N", Sans10162References.CompressionResistance, record);
    }

    /// <summary>Further factor on first web compression members of trusses, dimensionless. Source: SANS 10162-1:2005 cl. 15 as reported in a published synopsis (REFERENCES.md §5).</summary>
    public const double FirstWebMemberFactor = 0.85;

    private static void AddFez(CalcRecord? record, SectionProperties s, Material m, double klz, double fez)
    {
        record?.Add("KzLz", "Torsional effective length", "Kz Lz", Display.S(klz), klz, "mm", Sans10162References.ElasticBuckling);
        record?.Add("r0", "Polar radius of gyration about the shear centre", "√(x0² + y0² + rx² + ry²)",
            $"√({Display.S(s.X0)}² + {Display.S(s.Y0)}² + {Display.S(s.Rx)}² + {Display.S(s.Ry)}²)", s.R0, "mm", Sans10162References.ElasticBuckling);
        record?.Add("Fez", "Elastic torsional buckling stress", "[π²E Cw / (KzLz)² + G J] / (A r0²)",
            $"[π² × {Display.S(m.E)} × {Display.S(s.Cw)} / {Display.S(klz)}² + {Display.S(m.G)} × {Display.S(s.J)}] / ({Display.S(s.Area)} × {Display.S(s.R0)}²)",
            fez, "MPa", Sans10162References.ElasticBuckling);
    }
}
