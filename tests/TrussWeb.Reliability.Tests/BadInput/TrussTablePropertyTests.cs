using FsCheck;
using FsCheck.Fluent;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Reliability.Tests.BadInput;

/// <summary>
/// Random and hostile values in the truss tables (nodes, members) and a member's design overrides, through
/// the services as the demo designer (the services validate, then Core's TrussModelValidator checks the
/// model): Ok or Invalid only, never an exception; every refusal names its field with its row; a refused
/// save changes nothing; after any save no NaN or infinity is stored or returned.
/// </summary>
public sealed class TrussTablePropertyTests(DemoStore store) : IClassFixture<DemoStore>
{
    private static readonly Config Runs = Config.QuickThrowOnFailure.WithMaxTest(60);

    [Fact]
    public void Node_table_edits_with_hostile_values_are_refused_by_field_or_saved_finite()
    {
        var gen = from index in Gen.Choose(0, 100) from label in Hostile.Text() from x in Hostile.Number() from y in Hostile.Number() from purlin in Gen.Elements(true, false)
                  select (index, label, x, y, purlin);
        Prop.ForAll(gen.ToArbitrary(), edit =>
        {
            var before = Detail();
            var node = before.Nodes[edit.index % before.Nodes.Count];
            var row = new NodeRow(node.Id, node.Version, edit.label, edit.x, edit.y, edit.purlin);
            var result = Call<ITrussService, TrussDetail>(t => t.SaveNodesAsync(store.TrussId, new NodeTableInput([row], [])));
            AssertOutcome(result, "Rows[0]", "Rows");
            var after = Detail();
            if (!result.IsOk)
            {
                Assert.Equal(Snapshot(before.Nodes), Snapshot(after.Nodes));
            }

            AssertFinite(after);
        }).Check(Runs);
    }

    [Fact]
    public void Member_table_edits_with_hostile_values_are_refused_by_field_or_saved_finite()
    {
        var gen = from index in Gen.Choose(0, 100) from mark in Hostile.Text() from start in Hostile.Text() from end in Hostile.Text() from grp in Hostile.Text()
                  from keepNodes in Gen.Elements(true, false)
                  select (index, mark, start, end, grp, keepNodes);
        Prop.ForAll(gen.ToArbitrary(), edit =>
        {
            var before = Detail();
            var member = before.Members[edit.index % before.Members.Count];
            var row = edit.keepNodes
                ? new MemberRow(member.Id, member.Version, edit.mark, member.StartNode, member.EndNode, edit.grp)
                : new MemberRow(member.Id, member.Version, edit.mark, edit.start, edit.end, member.Group);
            var result = Call<ITrussService, TrussDetail>(t => t.SaveMembersAsync(store.TrussId, new MemberTableInput([row], [])));
            AssertOutcome(result, "Rows[0]", "Rows");
            var after = Detail();
            Assert.Equal(before.Members.Count, after.Members.Count);
            if (!result.IsOk)
            {
                Assert.Equal(before.Members.Select(m => (m.Id, m.Version, m.Mark, m.StartNode, m.EndNode, m.Group)),
                    after.Members.Select(m => (m.Id, m.Version, m.Mark, m.StartNode, m.EndNode, m.Group)));
            }

            AssertFinite(after);
        }).Check(Runs);
    }

    [Fact]
    public void Member_overrides_with_hostile_values_are_refused_by_field_or_designed_finite()
    {
        var gen = from index in Gen.Choose(0, 100) from kx in Hostile.Override() from ky in Hostile.Override() from lx in Hostile.Override()
                  from klu in Hostile.Override() from spacing in Hostile.Override()
                  select (index, kx, ky, lx, klu, spacing);
        string[] fields = [nameof(MemberOverrides.Kx), nameof(MemberOverrides.Ky), nameof(MemberOverrides.Kz), nameof(MemberOverrides.LengthXMm),
            nameof(MemberOverrides.LengthYMm), nameof(MemberOverrides.LengthZMm), nameof(MemberOverrides.KLuMm), nameof(MemberOverrides.KLvMm),
            nameof(MemberOverrides.ConnectorSpacingMm), nameof(MemberOverrides.ConnectorCount), nameof(MemberOverrides.SectionOverride)];
        Prop.ForAll(gen.ToArbitrary(), edit =>
        {
            var before = Detail();
            var member = before.Members[edit.index % before.Members.Count];
            var overrides = member.Overrides with { Kx = edit.kx, Ky = edit.ky, LengthXMm = edit.lx, KLuMm = edit.klu, ConnectorSpacingMm = edit.spacing };
            var result = Call<IDesignService, MemberDesignDetail>(d => d.UpdateMemberDesignAsync(store.TrussId, member.Id, new MemberDesignInput(overrides, member.Version)));
            Assert.True(result.Kind is ResultKind.Ok or ResultKind.Invalid, $"{result.Kind}: {result.Message}");
            var after = Detail();
            if (result.IsOk)
            {
                Assert.True(double.IsFinite(result.Value!.Row.Utilization), $"utilization {result.Value.Row.Utilization}");
                Assert.All(result.Value.Checks, c => Assert.True(double.IsFinite(c.Demand) && double.IsFinite(c.Resistance) && double.IsFinite(c.Utilization), c.Name));
                Assert.All(result.Value.Steps, s => Assert.True(double.IsFinite(s.Value), $"{s.Symbol} = {s.Value}"));
            }
            else
            {
                Assert.NotEmpty(result.Errors);
                Assert.All(result.Errors, e =>
                {
                    Assert.Contains(e.Field, fields);
                    Assert.False(string.IsNullOrWhiteSpace(e.Message));
                });
                var same = after.Members.Single(m => m.Id == member.Id);
                Assert.Equal((member.Version, member.Overrides), (same.Version, same.Overrides));
            }

            AssertFinite(after);
        }).Check(Runs);
    }

    [Fact]
    public void A_connector_spacing_below_1_mm_is_refused_naming_the_field_and_nothing_is_saved()
    {
        // Regression: the property above once drew the smallest positive double (5E-324 mm) for the spacing of a
        // double angle; it passed "greater than 0", and the component's KL/r rounded to 0 inside Core.
        var before = Detail();
        foreach (var member in before.Members)
        {
            var overrides = member.Overrides with { ConnectorSpacingMm = double.Epsilon, ConnectorCount = null };
            var result = Call<IDesignService, MemberDesignDetail>(d => d.UpdateMemberDesignAsync(store.TrussId, member.Id, new MemberDesignInput(overrides, member.Version)));
            Assert.Equal(ResultKind.Invalid, result.Kind);
            var error = Assert.Single(result.Errors);
            Assert.Equal(nameof(MemberOverrides.ConnectorSpacingMm), error.Field);
            Assert.Contains("1 mm", error.Message, StringComparison.Ordinal);
        }

        var after = Detail();
        Assert.Equal(before.Members.Select(m => (m.Id, m.Version, m.Overrides)), after.Members.Select(m => (m.Id, m.Version, m.Overrides)));
    }

    private TrussDetail Detail()
    {
        var detail = Call<ITrussService, TrussDetail>(t => t.GetAsync(store.TrussId));
        Assert.True(detail.IsOk, detail.Message);
        return detail.Value!;
    }

    private ServiceResult<T> Call<TService, T>(Func<TService, Task<ServiceResult<T>>> call)
        where TService : notnull => store.AsAsync(Roles.Designer, call).GetAwaiter().GetResult();

    private static void AssertOutcome<T>(ServiceResult<T> result, params string[] fieldPrefixes)
    {
        Assert.True(result.Kind is ResultKind.Ok or ResultKind.Invalid, $"{result.Kind}: {result.Message}");
        if (!result.IsOk)
        {
            Assert.NotEmpty(result.Errors);
            Assert.All(result.Errors, e =>
            {
                Assert.False(string.IsNullOrWhiteSpace(e.Field), $"unnamed field: {e}");
                Assert.False(string.IsNullOrWhiteSpace(e.Message), $"no message: {e.Field}");
            });
            // Row checks name the row (Rows[0].XMm); Core's model checks name the table or the property (Nodes, Members, Stability) and the
            // node or member in the message. Never an exception's text.
            Assert.All(result.Errors, e => Assert.DoesNotContain("Exception", e.Message, StringComparison.Ordinal));
            Assert.All(result.Errors, e => Assert.DoesNotContain("   at ", e.Message, StringComparison.Ordinal));
        }
    }

    private static string Snapshot(IReadOnlyList<NodeView> nodes) =>
        string.Join("|", nodes.Select(n => FormattableString.Invariant($"{n.Id}:{n.Version}:{n.Label}:{n.XMm:R}:{n.YMm:R}:{n.IsPurlinPoint}")));

    private static void AssertFinite(TrussDetail detail)
    {
        Assert.All(detail.Nodes, n => Assert.True(double.IsFinite(n.XMm) && double.IsFinite(n.YMm), $"node {n.Label}"));
        Assert.All(detail.Members, m => Assert.True(double.IsFinite(m.LengthMm) && Hostile.Finite(m.Utilization), $"member {m.Mark}"));
        Assert.True(Hostile.Finite(detail.Design.MaxUtilization) && Hostile.Finite(detail.Design.MassKg), "design summary");
    }
}
