using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class Sans10162StandardTests
{
    private static readonly Sans10162Standard Standard = new();

    [Fact]
    public void Standard_names_its_code_and_version()
    {
        Assert.Equal("SANS 10162-1", Standard.Code);
        Assert.Equal("1.0.0", Standard.Version);
        Assert.Contains("SANS 10162-1", Standard.Edition, StringComparison.Ordinal);
    }

    public static TheoryData<string, string, string> InvalidMembers => new()
    {
        { "length zero", "Lx", "must be greater than 0 mm (got 0 mm)" },
        { "length NaN", "Ly", "must be a finite number (got NaN)" },
        { "K zero", "Kx", "must be greater than 0" },
        { "fy zero", "Fy", "must be greater than 0 MPa (got 0 MPa)" },
        { "fu below fy", "Fu", "fu = 300 MPa must not be less than fy = 350 MPa" },
        { "spacing zero", "Connectors.Spacing", "must be greater than 0 mm (got 0 mm)" },
        // The smallest positive double: positive, yet KL/r of the component rounds to 0 (found by the truss-table property test).
        { "spacing below 1 mm", "Connectors.Spacing", "must be at least 1 mm (got 5E-324 mm)" },
        { "spacing too long", "Connectors.Spacing", "spacing a = 3500 mm must not exceed the member length L = 3000 mm" },
        { "holes too large", "Connection.HoleAllowance", "2 holes × 50 mm = 100 mm must be less than the leg width 88.9 mm" },
        { "block shear Ut", "Connection.BlockShear.Ut", "Ut must lie in (0, 1] (got 1.5)" },
        { "weld length", "Connection.WeldLength", "must be greater than 0 mm (got 0 mm)" },
        { "negative count", "Connectors.IntermediateCount", "must not be negative (got -1)" },
        { "exponent", "CompressionExponent", "must be greater than 0" },
        { "shear centre off the symmetry axis", "Section.X0", "x0 must be 0 mm (got 3 mm)" },
        { "no component", "Section.Component", "a double angle needs the properties of one angle" },
    };

    [Theory]
    [MemberData(nameof(InvalidMembers))]
    public void Each_invalid_input_gives_an_issue_naming_the_field_and_limit(string @case, string field, string message)
    {
        var member = Invalid(@case);
        var issues = Standard.Validate(member);
        Assert.Contains(issues, i => i.Field == field && i.Message.Contains(message, StringComparison.Ordinal));
        var ex = Assert.Throws<InputValidationException>(() => Standard.CheckMember(member, new MemberForces(10e3, 10e3)));
        Assert.Contains(ex.Issues, i => i.Field == field);
        Assert.False(Standard.IsValidMember(member));
    }

    [Fact]
    public void Valid_members_have_no_issues()
    {
        Assert.Empty(Standard.Validate(MemberBuilder.Ac40().Build()));
        Assert.Empty(Standard.Validate(new MemberBuilder().Build()));
    }

    [Fact]
    public void Negative_force_is_rejected()
    {
        var ex = Assert.Throws<InputValidationException>(() => Standard.CheckMember(new MemberBuilder().Build(), new MemberForces(-1, 0)));
        Assert.Contains(ex.Issues, i => i.Field == "Tension");
    }

    [Fact]
    public void Record_holds_the_compression_steps_with_values_matching_the_result()
    {
        var member = new MemberBuilder().Length(2000).Build();
        var result = Standard.CheckMember(member, new MemberForces(0, 100e3));
        var r = result.Record!;
        var direct = Compression.Resistance(member.Section, member.Material, member.Lengths, 1.34, member.Section.Area, null, null);
        foreach (var symbol in new[] { "Feu", "Fev", "Fez", "Fe", "λ", "Cr", "KLv/rv", "(KL/r)max" })
        {
            Assert.NotNull(r.Find(symbol));
        }

        AssertClose.Relative(direct.Fe1, r.Find("Feu")!.Value, 1e-12, "Feu");
        AssertClose.Relative(direct.Fe2, r.Find("Fev")!.Value, 1e-12, "Fev");
        AssertClose.Relative(direct.Fez, r.Find("Fez")!.Value, 1e-12, "Fez");
        AssertClose.Relative(direct.Fe, r.Find("Fe")!.Value, 1e-12, "Fe");
        AssertClose.Relative(direct.Lambda, r.Find("λ")!.Value, 1e-12, "λ");
        AssertClose.Relative(direct.Cr / 1000, r.Find("Cr")!.Value, 1e-12, "Cr (kN)");
        // Substituted values are the displayed inputs (4 s.f.).
        Assert.Contains(Display.S(direct.Fe2), r.Find("Fe")!.Substituted, StringComparison.Ordinal);
        Assert.Contains(Display.S(direct.Lambda), r.Find("Cr")!.Substituted, StringComparison.Ordinal);
        Assert.Equal("Compression: member buckling", result.GoverningCheck);
        AssertClose.Relative(100e3 / direct.Cr, result.Utilization, 1e-12, "utilization");
    }

    [Fact]
    public void Double_angle_record_holds_Fex_Fey_Fez_Feyz_Fe_lambda_Cr()
    {
        var r = Standard.CheckMember(MemberBuilder.Ac40().Build(), new MemberForces(0, 100e3)).Record!;
        foreach (var symbol in new[] { "Fex", "Fey", "Fez", "H", "Feyz", "Fe", "λ", "Cr", "ρe", "a_max" })
        {
            Assert.NotNull(r.Find(symbol));
        }

        // λ in the record is √(Fy/Fe) of the Fe in the record.
        AssertClose.Relative(Math.Sqrt(300 / r.Find("Fe")!.Value), r.Find("λ")!.Value, 1e-12, "λ");
    }

    [Theory]
    [InlineData(0, 100e3)]
    [InlineData(300e3, 0)]
    [InlineData(300e3, 100e3)]
    [InlineData(0, 0)]
    public void Without_record_the_numbers_are_the_same_and_the_record_is_null(double tension, double compression)
    {
        var members = new[]
        {
            new MemberBuilder().Connection(new TensionConnection { Kind = ConnectionKind.Bolted, HolesInCrossSection = 1, HoleAllowance = 22, TransverseBoltLines = 3 })
                .Options(new DesignOptions { EccentricAngleMethod = true, FirstWebMemberFactor = true }).Build(),
            MemberBuilder.Ac40().Build(),
        };
        foreach (var member in members)
        {
            var forces = new MemberForces(tension, compression);
            var full = Standard.CheckMember(member, forces);
            var fast = Standard.CheckMember(member, forces, withRecord: false);
            Assert.Null(fast.Record);
            Assert.NotNull(full.Record);
            Assert.Equal(full.Utilization, fast.Utilization);
            Assert.Equal(full.GoverningCheck, fast.GoverningCheck);
            Assert.Equal(full.Status, fast.Status);
            Assert.Equal(full.Checks.Select(c => c.Resistance), fast.Checks.Select(c => c.Resistance));
            Assert.All(fast.Checks, c => Assert.Null(c.Record));
            Assert.All(full.Checks, c => Assert.True(double.IsFinite(c.Utilization) && double.IsFinite(c.Resistance)));
        }
    }

    [Fact]
    public void Utilization_exceeds_one_when_force_exceeds_resistance()
    {
        // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14: Cr = 139 kN; 150 kN fails.
        var result = Standard.CheckMember(MemberBuilder.Ac40().Connectors(new ConnectorLayout { IntermediateCount = 1 }).Build(), new MemberForces(0, 150e3));
        Assert.Equal(CheckStatus.Fail, result.Status);
        AssertClose.Relative(150.0 / 139.4, result.Utilization, 0.01, "utilization");
    }

    [Fact]
    public void Tension_member_without_connection_is_checked_for_gross_yield_and_notes_the_gap()
    {
        var result = Standard.CheckMember(new MemberBuilder().Build(), new MemberForces(100e3, 0));
        Assert.Contains(result.Checks, c => c.Name == "Tension: gross section yield");
        Assert.DoesNotContain(result.Checks, c => c.Name == "Tension: effective net section fracture");
        Assert.Contains(result.Record!.Notes, n => n.Contains("NOT checked", StringComparison.Ordinal));
    }

    [Fact]
    public void Out_of_scope_check_makes_the_member_out_of_scope_not_pass()
    {
        var member = new MemberBuilder().Connection(new TensionConnection { Kind = ConnectionKind.Welded, WeldLength = 50, ConnectedWidth = 100 }).Build();
        var result = Standard.CheckMember(member, new MemberForces(10e3, 0));
        Assert.Equal(CheckStatus.OutOfScope, result.Status);
    }

    [Fact]
    public void Member_record_appends_every_check_in_order()
    {
        var result = Standard.CheckMember(MemberBuilder.Ac40().Build(), new MemberForces(0, 100e3));
        var steps = result.Record!.Steps.Select(s => s.Symbol).ToList();
        Assert.True(steps.IndexOf("(KL/r)max") < steps.IndexOf("a_max"));
        Assert.True(steps.IndexOf("a_max") < steps.IndexOf("Fex"));
        Assert.Equal("U", steps[^1]);
    }

    private static DesignMember Invalid(string @case)
    {
        var ac40 = MemberBuilder.Ac40();
        return @case switch
        {
            "length zero" => ac40.Lengths(new EffectiveLengths { Lx = 0, Ly = 3000, Lz = 3000 }).Build(),
            "length NaN" => ac40.Lengths(new EffectiveLengths { Lx = 3000, Ly = double.NaN, Lz = 3000 }).Build(),
            "K zero" => ac40.Lengths(new EffectiveLengths { Lx = 3000, Ly = 3000, Lz = 3000, Kx = 0 }).Build(),
            "fy zero" => ac40.Steel(0, 450).Build(),
            "fu below fy" => ac40.Steel(350, 300).Build(),
            "spacing zero" => ac40.Connectors(new ConnectorLayout { Spacing = 0 }).Build(),
            "spacing below 1 mm" => ac40.Connectors(new ConnectorLayout { Spacing = double.Epsilon }).Build(),
            "spacing too long" => ac40.Connectors(new ConnectorLayout { Spacing = 3500 }).Build(),
            "holes too large" => ac40.Connection(new TensionConnection { Kind = ConnectionKind.Bolted, HolesInCrossSection = 2, HoleAllowance = 50, TransverseBoltLines = 2 }).Build(),
            "block shear Ut" => ac40.Connection(new TensionConnection
            {
                Kind = ConnectionKind.Bolted, HolesInCrossSection = 1, HoleAllowance = 22, TransverseBoltLines = 2,
                BlockShear = new BlockShearPath(500, 1000, 1.5),
            }).Build(),
            "weld length" => ac40.Connection(new TensionConnection { Kind = ConnectionKind.Welded, WeldLength = 0, ConnectedWidth = 60 }).Build(),
            "negative count" => ac40.Connectors(new ConnectorLayout { IntermediateCount = -1 }).Build(),
            "exponent" => ac40.Options(new DesignOptions { CompressionExponent = 0 }).Build(),
            "shear centre off the symmetry axis" => ac40.Section(SectionBuilder.Ac40DoubleAngle() with { X0 = 3 }).Build(),
            "no component" => ac40.Section(SectionBuilder.Ac40DoubleAngle() with { Component = null }).Build(),
            _ => throw new ArgumentOutOfRangeException(nameof(@case), @case, "unknown case"),
        };
    }

    [Fact]
    public void Random_inputs_either_fail_validation_or_give_finite_numbers()
    {
        // Seeded sweep (2026-12-01): lengths, K, strengths and forces drawn from ordinary, zero, negative and
        // non-finite values. A result must never hold NaN or infinity; invalid input must throw InputValidationException.
        var rng = new Random(42);
        double[] odd = [0, -1, double.NaN, double.PositiveInfinity, 1e-9, 1e9];
        double Pick(double lo, double hi) => rng.Next(6) == 0 ? odd[rng.Next(odd.Length)] : lo + rng.NextDouble() * (hi - lo);
        var thrown = 0;
        for (var i = 0; i < 2000; i++)
        {
            var lengths = new EffectiveLengths { Lx = Pick(100, 8000), Ly = Pick(100, 8000), Lz = Pick(100, 8000), Kx = Pick(0.5, 2) };
            var builder = rng.Next(2) == 0 ? MemberBuilder.Ac40() : new MemberBuilder();
            var member = builder.Lengths(lengths).Steel(Pick(200, 450), 500).Build();
            var forces = new MemberForces(Math.Abs(Pick(0, 1e6)), Math.Abs(Pick(0, 1e6)));
            try
            {
                var r = Standard.CheckMember(member, forces, withRecord: i % 2 == 0);
                Assert.True(double.IsFinite(r.Utilization), $"case {i}: utilization {r.Utilization}");
                Assert.All(r.Checks, c => Assert.True(double.IsFinite(c.Resistance) && double.IsFinite(c.Utilization) && double.IsFinite(c.Demand), $"case {i}: {c.Name}"));
            }
            catch (InputValidationException ex)
            {
                Assert.NotEmpty(ex.Issues);
                thrown++;
            }
        }

        Assert.InRange(thrown, 1, 1999);
    }

    [Fact]
    public void Class_4_member_uses_the_effective_area_in_its_compressive_resistance_and_says_so()
    {
        // [C] legs 100 × 6 mm at Fy 355 are class 4 (b/t 16.7 > 10.6); Ae = A − 435.7 mm² (see ClassificationTests).
        var section = SectionBuilder.L4x4x1_2() with
        {
            Elements = [new TrussWeb.Core.Sections.PlateElement("leg", TrussWeb.Core.Sections.ElementKind.AngleLeg, 100, 6, 2, 94)],
        };
        var member = new MemberBuilder().Section(section).Steel(355, 470).Length(1500).Build();
        var result = Standard.CheckMember(member, new MemberForces(0, 50e3));
        var ae = section.Area - 435.727;
        var expected = Compression.Resistance(section, member.Material, member.Lengths, 1.34, ae, null, null).Cr;
        var check = result.Checks.Single(c => c.Name == "Compression: member buckling");
        AssertClose.Relative(expected, check.Resistance, 1e-5, "Cr with Ae");
        AssertClose.Relative(ae, result.Record!.Find("Ae")!.Value, 1e-5, "Ae");
        Assert.Contains(result.Record.Notes, n => n.StartsWith("Class 4: Cr uses the effective area", StringComparison.Ordinal));
    }
}
