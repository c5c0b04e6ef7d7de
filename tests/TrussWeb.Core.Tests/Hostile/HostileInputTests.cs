using FsCheck;
using FsCheck.Fluent;
using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Validation;
using static TrussWeb.Core.Tests.Hostile.HostileValues;

namespace TrussWeb.Core.Tests.Hostile;

/// <summary>
/// Random and hostile values thrown at every Core entry point: the only allowed outcomes are a
/// validation result whose every issue names a field, or a result whose numbers are all finite.
/// Never an unexpected exception, a NaN or an infinity.
/// </summary>
public class HostileInputTests
{
    private static readonly Config Many = Config.QuickThrowOnFailure.WithMaxTest(2000);

    [Fact]
    public void Angle_sections_either_name_the_bad_field_or_give_finite_properties()
    {
        var gen = from d in Number() from b in Number() from t in Number() from r1 in Number() from r2 in Number()
                  select new AngleDimensions(d, b, t, r1, r2);
        Prop.ForAll(gen.ToArbitrary(), dims =>
        {
            if (Angle.TryCompute(dims, out var p, out var issues))
            {
                Assert.True(AllFinite(p!.Area, p.Ix, p.Iy, p.Ixy, p.Iu, p.Iv, p.Alpha, p.J, p.Cw, p.X0, p.Y0, p.U0, p.V0, p.R0, p.H, p.MassPerMetre));
            }
            else
            {
                AssertNamed(issues);
            }
        }).Check(Many);
    }

    [Fact]
    public void Hollow_sections_either_name_the_bad_field_or_give_finite_properties()
    {
        var chs = from d in Number() from t in Number() select new CircularHollowDimensions(d, t);
        Prop.ForAll(chs.ToArbitrary(), dims =>
        {
            var issues = dims.Validate();
            if (issues.Count > 0)
            {
                AssertNamed(issues);
                return;
            }

            var p = dims.Compute();
            Assert.True(AllFinite(p.Area, p.Ix, p.Iy, p.J, p.R0, p.MassPerMetre));
        }).Check(Many);

        var rhs = from h in Number() from b in Number() from t in Number() select new RectangularHollowDimensions(h, b, t);
        Prop.ForAll(rhs.ToArbitrary(), dims =>
        {
            var issues = dims.Validate();
            if (issues.Count > 0)
            {
                AssertNamed(issues);
                return;
            }

            var p = dims.Compute();
            Assert.True(AllFinite(p.Area, p.Ix, p.Iy, p.J, p.R0, p.MassPerMetre));
        }).Check(Many);
    }

    [Fact]
    public void Member_checks_either_name_the_bad_field_or_give_finite_results()
    {
        var section = Angle.Compute(new AngleDimensions(100, 75, 8, 10, 5), "L100x75x8");
        var standard = new Sans10162Standard();
        var gen = from lx in MostlyOrdinary() from ly in MostlyOrdinary() from k in MostlyOrdinary()
                  from fy in MostlyOrdinary() from fu in MostlyOrdinary() from e in MostlyOrdinary()
                  from tension in Number() from compression in Number()
                  select (lx, ly, k, fy, fu, e, tension, compression);
        Prop.ForAll(gen.ToArbitrary(), v =>
        {
            var member = new DesignMember
            {
                Mark = "M1",
                Section = section,
                Material = new Material("test", v.fy, v.fu, v.e * 20, v.e * 8),
                Lengths = new EffectiveLengths { Lx = v.lx, Ly = v.ly, Lz = v.ly, Kx = v.k / 1000, Ky = 1, Kz = 1 },
            };
            try
            {
                var r = standard.CheckMember(member, new MemberForces(v.tension, v.compression));
                Assert.True(double.IsFinite(r.Utilization), $"utilization {r.Utilization}");
                Assert.All(r.Checks, c => Assert.True(double.IsFinite(c.Demand) && double.IsFinite(c.Resistance) && double.IsFinite(c.Utilization), c.Name));
                Assert.All(r.Record!.Steps, s => Assert.True(double.IsFinite(s.Value), $"step {s.Symbol} = {s.Value}"));
            }
            catch (InputValidationException ex)
            {
                AssertNamed(ex.Issues);
            }
        }).Check(Many);
    }

    [Fact]
    public void Generators_either_name_the_bad_field_or_give_a_valid_truss()
    {
        var gen = from type in Gen.Elements(Enum.GetValues<TrussType>())
                  from span in MostlyOrdinary() from pitch in Number() from heel in Number()
                  from panels in Gen.Choose(-2, 40) from spacing in MostlyOrdinary()
                  select new TrussParameters
                  {
                      Type = type, Span = span * 3, PitchDegrees = pitch / 1000, HeelDepth = heel, PanelCount = panels, TrussSpacing = spacing,
                  };
        Prop.ForAll(gen.ToArbitrary(), p =>
        {
            var issues = p.Validate();
            if (issues.Count > 0)
            {
                AssertNamed(issues);
                Assert.Throws<InputValidationException>(() => TrussGenerator.Generate(p));
                return;
            }

            try
            {
                var model = TrussGenerator.Generate(p);
                Assert.Empty(TrussModelValidator.Validate(model));
                Assert.All(model.Nodes, n => Assert.True(AllFinite(n.X, n.Y)));
            }
            catch (InputValidationException ex)
            {
                // Parameters valid one by one but degenerate together (e.g. a pitch of 1e-12°).
                AssertNamed(ex.Issues);
                Assert.All(ex.Issues, i => Assert.Equal("Geometry", i.Field));
            }
        }).Check(Config.QuickThrowOnFailure.WithMaxTest(500));
    }

    [Fact]
    public void Analysis_of_hostile_tables_and_loads_names_the_problem_or_gives_finite_forces()
    {
        var gen = from x1 in Number() from y1 in Number() from x2 in Number() from y2 in Number()
                  from fx in Number() from fy in Number() from area in MostlyOrdinary()
                  select (x1, y1, x2, y2, fx, fy, area);
        Prop.ForAll(gen.ToArbitrary(), v =>
        {
            // A three-node truss whose apex and loads are hostile.
            var model = new TrussModel
            {
                Nodes = [new Node("A", 0, 0), new Node("B", v.x1, v.y1), new Node("C", v.x2, v.y2)],
                Members = [new Member("AB", "A", "B", "TopChord"), new Member("BC", "B", "C", "TopChord"), new Member("AC", "A", "C", "BottomChord")],
                Supports = [new Core.Model.Support("A", SupportKind.Pin), new Core.Model.Support("C", SupportKind.RollerX)],
                Span = 6000,
                TrussSpacing = 6000,
            };
            var cases = new List<LoadCase> { new("P", "point", LoadKind.Other, [new NodalLoad("B", v.fx, v.fy)]) };
            var combos = new List<LoadCombination> { new("1.0P", LimitState.Uls, new Dictionary<LoadKind, double> { [LoadKind.Other] = 1.0 }) };
            if (TrussSolver.TryAnalyse(model, cases, combos, AnalysisOptions.UniformArea(v.area), out var result, out var issues))
            {
                Assert.All(result!.Combinations[0].MemberForces.Values, f => Assert.True(double.IsFinite(f), $"force {f}"));
                Assert.All(result.Envelopes, e => Assert.True(AllFinite(e.MaxTension, e.MaxCompression)));
            }
            else
            {
                AssertNamed(issues);
            }
        }).Check(Many);
    }

    [Fact]
    public void Catalogue_import_of_garbage_reports_lines_and_fields_and_never_throws()
    {
        var cell = Gen.OneOf(
            Gen.Elements("", " ", "abc", "NaN", "Infinity", "-5", "0", "1e400", "12,5", "\"", "\"\"", "L100x100x10", "100", "8", "12", "6"),
            Gen.Choose(-1000, 100_000).Select(i => (i / 10.0).ToString(System.Globalization.CultureInfo.InvariantCulture)));
        var line = from n in Gen.Choose(0, 8) from cells in Gen.ListOf(cell, n) select string.Join(",", cells);
        var file = from n in Gen.Choose(0, 12) from lines in Gen.ListOf(line, n) select "designation,d,b,t,r1,r2\n" + string.Join("\n", lines);
        Prop.ForAll(file.ToArbitrary(), text =>
        {
            var result = SectionCatalogue.LoadFromText("import.csv", text);
            Assert.All(result.Errors, e =>
            {
                Assert.Equal("import.csv", e.File);
                Assert.True(e.Line >= 1);
                Assert.False(string.IsNullOrWhiteSpace(e.Message));
            });
            Assert.All(result.Entries, entry => Assert.True(AllFinite(entry.Properties.Area, entry.Properties.Iv, entry.Properties.J)));
        }).Check(Many);
    }

    private static void AssertNamed(IReadOnlyList<ValidationIssue> issues)
    {
        Assert.NotEmpty(issues);
        Assert.All(issues, i =>
        {
            Assert.False(string.IsNullOrWhiteSpace(i.Field), "an issue must name its field");
            Assert.False(string.IsNullOrWhiteSpace(i.Message), "an issue must say what is wrong");
        });
    }
}
