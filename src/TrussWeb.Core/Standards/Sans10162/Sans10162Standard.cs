using System.Globalization;
using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// SANS 10162-1 member design of truss members (axial force only): slenderness (cl. 10.4.2), class
/// (cl. 11), tension (cl. 13.2, 12.3, 13.11), compression with every buckling mode (cl. 13.3), built-up
/// members (cl. 19) and the optional AISC 360-16 E5 equivalent slenderness for single angles. The
/// member's record holds every check's record in that order.
/// </summary>
public sealed class Sans10162Standard : IDesignStandard
{
    /// <summary>Edition text shown in records and report headers.</summary>
    public const string EditionText = "SANS 10162-1:2011 (limit states design of hot-rolled steelwork; formulas as CSA S16; confirm the edition in use)";

    /// <summary>Code version of this module; enters every fingerprint.</summary>
    public const string ModuleVersion = "1.0.0";

    public string Code => Sans10162References.Code;

    public string Edition => EditionText;

    public string Version => ModuleVersion;

    /// <inheritdoc />
    public IReadOnlyList<ValidationIssue> Validate(DesignMember member)
    {
        ArgumentNullException.ThrowIfNull(member);
        var issues = new List<ValidationIssue>();
        var s = member.Section;
        var l = member.Lengths;
        ValidateSection(issues, s);
        Length(issues, nameof(EffectiveLengths.Lx), l.Lx);
        Length(issues, nameof(EffectiveLengths.Ly), l.Ly);
        Length(issues, nameof(EffectiveLengths.Lz), l.Lz);
        Factor(issues, nameof(EffectiveLengths.Kx), l.Kx);
        Factor(issues, nameof(EffectiveLengths.Ky), l.Ky);
        Factor(issues, nameof(EffectiveLengths.Kz), l.Kz);
        if (l.KLu is { } klu)
        {
            Length(issues, nameof(EffectiveLengths.KLu), klu);
        }

        if (l.KLv is { } klv)
        {
            Length(issues, nameof(EffectiveLengths.KLv), klv);
        }

        issues.AddRange(member.Material.Validate());
        var o = member.Options;
        Guard.Positive(issues, nameof(DesignOptions.CompressionExponent), o.CompressionExponent, "");
        Guard.Positive(issues, nameof(DesignOptions.CompressionSlendernessLimit), o.CompressionSlendernessLimit, "");
        Guard.Positive(issues, nameof(DesignOptions.TensionSlendernessLimit), o.TensionSlendernessLimit, "");
        ValidateConnectors(issues, member);
        ValidateConnection(issues, member);
        return issues;
    }

    private static void Length(List<ValidationIssue> issues, string field, double value) =>
        Guard.InRange(issues, field, value, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, "mm");

    private static void Factor(List<ValidationIssue> issues, string field, double value) =>
        Guard.InRange(issues, field, value, PlausibleRange.MinK, PlausibleRange.MaxK, "");

    /// <summary>True when <see cref="Validate"/> finds nothing (for forms).</summary>
    public bool IsValidMember(DesignMember member) => Validate(member).Count == 0;

    /// <inheritdoc />
    public MemberDesignResult CheckMember(DesignMember member, MemberForces forces, bool withRecord = true)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(forces);
        var issues = new List<ValidationIssue>(Validate(member));
        Guard.InRange(issues, nameof(MemberForces.Tension), forces.Tension, 0, PlausibleRange.MaxForceN, "N");
        Guard.InRange(issues, nameof(MemberForces.Compression), forces.Compression, 0, PlausibleRange.MaxForceN, "N");
        Guard.ThrowIfAny(issues);

        var s = member.Section;
        var m = member.Material;
        var l = member.Lengths;
        var o = member.Options;
        var record = withRecord ? new CalcRecord($"Member {member.Mark}: {s.Designation}, {m.Grade}, to {Sans10162References.Code}") : null;
        record?.Note($"Standard: {EditionText}; module version {ModuleVersion}.");
        record?.Note($"Lengths: Lx = {Display.S(l.Lx)} mm ({l.LxSource}), Ly = {Display.S(l.Ly)} mm ({l.LySource}), Lz = {Display.S(l.Lz)} mm ({l.LzSource}); Kx = {Display.S(l.Kx)}, Ky = {Display.S(l.Ky)}, Kz = {Display.S(l.Kz)}.");
        var checks = new List<CheckResult>(10);

        // Slenderness.
        if (forces.Compression > 0 || forces.Tension <= 0)
        {
            var r = Sub(withRecord, "Slenderness, compression (SANS 10162-1 cl. 10.4.2.1)");
            if (forces.Compression <= 0)
            {
                r?.Note("No design force: the compression slenderness limit is applied (conservative).");
            }

            checks.Add(Slenderness.CheckCompression(s, l, o.CompressionSlendernessLimit, r));
            Append(record, r);
        }

        if (forces.Tension > 0)
        {
            var r = Sub(withRecord, "Slenderness, tension (SANS 10162-1 cl. 10.4.2.2)");
            checks.Add(Slenderness.CheckTension(s, l, o.TensionSlendernessLimit, r));
            Append(record, r);
        }

        // Classification.
        var rc = Sub(withRecord, "Classification in axial compression (SANS 10162-1 cl. 11, Table 4)");
        var cls = Classification.Classify(s, m.Fy, rc);
        checks.Add(Classification.Check(cls, rc));
        Append(record, rc);

        // Tension.
        if (forces.Tension > 0)
        {
            var rt = Sub(withRecord, "Tensile resistance (SANS 10162-1 cl. 13.2, 12.3, 13.11)");
            rt?.Note($"Tf = {Display.S(forces.Tension / 1000)} kN{(forces.TensionCombination is null ? "" : " (" + forces.TensionCombination + ")")}.");
            checks.AddRange(Tension.Check(s, m, member.Connection, forces.Tension, rt));
            Append(record, rt);
        }

        // Compression.
        if (forces.Compression > 0)
        {
            CheckCompression(member, forces, cls, checks, record, withRecord);
        }

        return Summarise(member, checks, record);
    }

    private static void CheckCompression(DesignMember member, MemberForces forces, SectionClassification cls, List<CheckResult> checks,
        CalcRecord? record, bool withRecord)
    {
        var s = member.Section;
        var m = member.Material;
        var l = member.Lengths;
        var o = member.Options;
        const string name = "Compression: member buckling";
        var rcomp = Sub(withRecord, "Compressive resistance (SANS 10162-1 cl. 13.3)");
        rcomp?.Note($"Cf = {Display.S(forces.Compression / 1000)} kN{(forces.CompressionCombination is null ? "" : " (" + forces.CompressionCombination + ")")}.");
        if (!cls.EffectiveAreaInScope)
        {
            rcomp?.Note("Class 4 element without an effective area rule: compressive resistance out of scope.");
            checks.Add(new CheckResult(name, forces.Compression, 0, 0, CheckStatus.OutOfScope, "N", Sans10162References.CompressionResistance, rcomp));
            Append(record, rcomp);
            return;
        }

        if (cls.Class == 4)
        {
            rcomp?.Note($"Class 4: Cr uses the effective area Ae = {Display.S(cls.EffectiveArea)} mm² in place of A = {Display.S(s.Area)} mm² (CSA S16-14 13.3.5 method; confirm the SANS clause).");
        }

        var builtUp = s.Family == SectionFamily.DoubleAngle && s.Component is not null;
        double? rhoY = null;
        ConnectorSpacing? layout = null;
        if (builtUp)
        {
            var rb = Sub(withRecord, "Built-up member: interconnectors (SANS 10162-1 cl. 19; CSA S16-14 19.1.4)");
            layout = BuiltUp.Layout(s, l, member.Connectors, rb);
            checks.Add(BuiltUp.CheckSpacing(layout, rb));
            Append(record, rb);
            rhoY = BuiltUp.SlendernessAboutSymmetryAxis(s, l, layout, member.Connectors?.UseModifiedSlenderness ?? true, rcomp);
        }

        var res = Compression.Resistance(s, m, l, o.CompressionExponent, cls.EffectiveArea, rhoY, rcomp);
        var cr = res.Cr;
        if (builtUp && layout is not null)
        {
            var rk = Sub(withRecord, "Built-up member: one component between connectors (detailed check)");
            var comp = BuiltUp.ComponentResistance(s.Component!, m, layout.Spacing, o.CompressionExponent, rk);
            var components = Math.Max(1, (int)Math.Round(s.Area / s.Component!.Area));
            var crComp = components * comp.Cr;
            rk?.Add("n·Cr,i", $"Resistance of {components} components buckling between connectors", "n Cr,i",
                $"{components} × {Display.S(comp.Cr / 1000)}", crComp / 1000, "kN", Sans10162References.BuiltUp);
            Append(record, rk);
            var governs = crComp < cr;
            rcomp?.Add("Cr,gov", "Governing resistance: the lower of the whole member and the components between connectors", "min(Cr, n Cr,i)",
                $"min({Display.S(cr / 1000)}, {Display.S(crComp / 1000)})", Math.Min(cr, crComp) / 1000, "kN", Sans10162References.BuiltUp);
            rcomp?.Note(governs
                ? "Flexural-torsional buckling of one component between connectors governs over buckling of the whole member: reduce the connector spacing to raise it."
                : "Buckling of the whole member governs over buckling of one component between connectors.");
            cr = Math.Min(cr, crComp);
        }

        checks.Add(Compression.Check(forces.Compression, cr, o, name, rcomp));
        Append(record, rcomp);

        if (o.EccentricAngleMethod)
        {
            var re = Sub(withRecord, "Single angle connected through one leg (AISC 360-16 E5 option)");
            checks.Add(EccentricAngle.Check(s, m, l, o, cls.EffectiveArea, forces.Compression, re));
            Append(record, re);
        }
    }

    private MemberDesignResult Summarise(DesignMember member, List<CheckResult> checks, CalcRecord? record)
    {
        var utilization = 0.0;
        var governing = "";
        var anyFail = false;
        var anyOut = false;
        foreach (var c in checks)
        {
            if (c.Status == CheckStatus.OutOfScope)
            {
                anyOut = true;
                continue;
            }

            if (c.Status is CheckStatus.Pass or CheckStatus.Fail)
            {
                anyFail |= c.Status == CheckStatus.Fail;
                if (c.Utilization > utilization || governing.Length == 0)
                {
                    utilization = c.Utilization;
                    governing = c.Name;
                }
            }
        }

        var status = anyFail || utilization > 1 ? CheckStatus.Fail : anyOut ? CheckStatus.OutOfScope : CheckStatus.Pass;
        record?.Add("U", $"Largest utilization: {governing}", "max(demand / resistance)", Display.S(utilization), utilization, "", Sans10162References.Code);
        if (anyOut)
        {
            record?.Note("At least one check is out of scope: the member is not fully verified.");
        }

        return new MemberDesignResult(member.Mark, member.Section.Designation, Code, Version, checks, utilization, governing, status, record);
    }

    private static CalcRecord? Sub(bool withRecord, string title) => withRecord ? new CalcRecord(title) : null;

    private static void Append(CalcRecord? record, CalcRecord? sub)
    {
        if (record is not null && sub is not null)
        {
            record.Append(sub);
        }
    }

    private static void ValidateSection(List<ValidationIssue> issues, SectionProperties s)
    {
        Guard.Positive(issues, "Section.Area", s.Area, "mm²");
        Guard.Positive(issues, "Section.Ix", s.Ix, "mm⁴");
        Guard.Positive(issues, "Section.Iy", s.Iy, "mm⁴");
        Guard.Positive(issues, "Section.Iu", s.Iu, "mm⁴");
        Guard.Positive(issues, "Section.Iv", s.Iv, "mm⁴");
        Guard.Positive(issues, "Section.J", s.J, "mm⁴");
        Guard.NonNegative(issues, "Section.Cw", s.Cw, "mm⁶");
        foreach (var (field, v) in new[] { ("Section.X0", s.X0), ("Section.Y0", s.Y0), ("Section.U0", s.U0), ("Section.V0", s.V0) })
        {
            if (!double.IsFinite(v))
            {
                issues.Add(new ValidationIssue(field, "must be a finite number"));
            }
        }

        foreach (var e in s.Elements)
        {
            if (!(e.Width > 0) || !(e.Thickness > 0) || !double.IsFinite(e.Width) || !double.IsFinite(e.Thickness))
            {
                issues.Add(new ValidationIssue("Section.Elements", $"element '{e.Name}' needs a width and thickness greater than 0 mm"));
            }
        }

        if (s.Symmetry == SymmetryKind.Singly && s.Family != SectionFamily.Angle && s.X0 != 0)
        {
            issues.Add(new ValidationIssue("Section.X0", $"a singly symmetric section has its axis of symmetry on y-y, so the shear centre lies on it: x0 must be 0 mm (got {F(s.X0)} mm)"));
        }

        if (s.Family == SectionFamily.DoubleAngle && s.Component is null)
        {
            issues.Add(new ValidationIssue("Section.Component", "a double angle needs the properties of one angle (component)"));
        }
    }

    private static void ValidateConnectors(List<ValidationIssue> issues, DesignMember member)
    {
        if (member.Connectors is not { } c)
        {
            return;
        }

        var length = member.Lengths.Lx;
        if (c.IntermediateCount is { } n && n < 0)
        {
            issues.Add(new ValidationIssue("Connectors.IntermediateCount", $"must not be negative (got {n})"));
        }

        if (c.IntermediateCount is not null && c.Spacing is not null)
        {
            issues.Add(new ValidationIssue("Connectors.Spacing", "give either the number of intermediate connectors or a spacing, not both"));
        }

        if (c.Spacing is { } a)
        {
            if (!double.IsFinite(a) || a <= 0)
            {
                issues.Add(new ValidationIssue("Connectors.Spacing", $"must be greater than 0 mm (got {F(a)} mm)"));
            }
            else if (a < PlausibleRange.MinLengthMm)
            {
                // A positive spacing far below any real connector pitch would make the component slenderness round to 0.
                issues.Add(new ValidationIssue("Connectors.Spacing", $"must be at least {F(PlausibleRange.MinLengthMm)} mm (got {F(a)} mm)"));
            }
            else if (double.IsFinite(length) && length > 0 && a > length)
            {
                issues.Add(new ValidationIssue("Connectors.Spacing", $"spacing a = {F(a)} mm must not exceed the member length L = {F(length)} mm"));
            }
        }
    }

    private static void ValidateConnection(List<ValidationIssue> issues, DesignMember member)
    {
        if (member.Connection is not { } c)
        {
            return;
        }

        var s = member.Section;
        var component = s.Component ?? s;
        if (c.Kind == ConnectionKind.Bolted)
        {
            if (c.HolesInCrossSection < 0)
            {
                issues.Add(new ValidationIssue("Connection.HolesInCrossSection", $"must not be negative (got {c.HolesInCrossSection})"));
            }

            if (c.HolesInCrossSection > 0)
            {
                Guard.Positive(issues, "Connection.HoleAllowance", c.HoleAllowance, "mm");
                var legs = component.Elements.Where(e => e.Kind == ElementKind.AngleLeg).Select(e => e.Width).DefaultIfEmpty(0).Max();
                var width = c.HolesInCrossSection * c.HoleAllowance;
                if (legs > 0 && double.IsFinite(width) && width >= legs)
                {
                    issues.Add(new ValidationIssue("Connection.HoleAllowance",
                        $"{c.HolesInCrossSection} holes × {F(c.HoleAllowance)} mm = {F(width)} mm must be less than the leg width {F(legs)} mm"));
                }
                else if (double.IsFinite(width) && c.HoleAllowance > 0)
                {
                    var components = s.Component is null ? 1 : Math.Max(1, (int)Math.Round(s.Area / s.Component.Area));
                    var an = s.Area - components * width * component.GoverningThickness;
                    if (!(an > 0))
                    {
                        issues.Add(new ValidationIssue("Connection.HoleAllowance", $"the holes remove the whole area: net area An = {F(an)} mm² must be greater than 0"));
                    }
                }
            }

            if (!c.AllElementsConnected && c.TransverseBoltLines < 1)
            {
                issues.Add(new ValidationIssue("Connection.TransverseBoltLines", $"at least 1 line of bolts is needed (got {c.TransverseBoltLines})"));
            }
        }
        else
        {
            Guard.Positive(issues, "Connection.WeldLength", c.WeldLength, "mm");
            Guard.Positive(issues, "Connection.ConnectedWidth", c.ConnectedWidth, "mm");
        }

        if (c.BlockShear is { } p)
        {
            Guard.Positive(issues, "Connection.BlockShear.NetTensionArea", p.NetTensionArea, "mm²");
            Guard.Positive(issues, "Connection.BlockShear.GrossShearArea", p.GrossShearArea, "mm²");
            if (!double.IsFinite(p.Ut) || p.Ut <= 0 || p.Ut > 1)
            {
                issues.Add(new ValidationIssue("Connection.BlockShear.Ut", $"Ut must lie in (0, 1] (got {F(p.Ut)})"));
            }
        }
    }

    private static string F(double v) => v.ToString(CultureInfo.InvariantCulture);
}
