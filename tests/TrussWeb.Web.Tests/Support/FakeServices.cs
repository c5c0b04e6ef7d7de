using TrussWeb.Core.Design;
using TrussWeb.Core.Sections;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Support.MemberPageFakes;

/// <summary>Builds service views from real Core results (the sized test truss), as the services would store them.</summary>
public static class ServiceViews
{
    public static readonly Guid TrussId = Guid.Parse("5f1c1c40-0000-4000-8000-000000000001");

    /// <summary>A single-angle diagonal of the sized truss (so the drawing and curve can be shown).</summary>
    public static MemberOutcome Diagonal => TestData.SizedTruss.Design.Members.First(m => m.Group == "Diagonals" && m.Design.Record is not null);

    public static Guid IdOf(MemberOutcome m) => new(System.Security.Cryptography.MD5.HashData(System.Text.Encoding.UTF8.GetBytes(m.Mark)));

    public static MemberDesignDetail Detail(MemberOutcome m, long version = 3, MemberOverrides? overrides = null)
    {
        var d = m.Design;
        var l = m.Lengths;
        var row = new MemberDesignRow(IdOf(m), m.Mark, m.Group, d.Designation, "S355JR", m.Length,
            new ForcesView(Math.Abs(m.Envelope.MaxTension), m.Envelope.TensionCombination, Math.Abs(m.Envelope.MaxCompression), m.Envelope.CompressionCombination),
            new LengthsView(l.Lx, l.Ly, l.Lz, l.Kx, l.Ky, l.Kz, l.KLu, l.KLv, l.LxSource, l.LySource, l.LzSource),
            d.Utilization, d.GoverningCheck, m.GoverningCombination, d.Status.ToString(), "Draft", "fp-test");
        var checks = d.Checks.Select(c => new CheckView(c.Name, c.Demand, c.Resistance, c.Utilization, c.Status.ToString(), c.Unit, c.Reference)).ToList();
        var steps = d.Record!.Steps.Select(s => new StepView("", s.Symbol, s.Description, s.Expression, s.Substituted, s.Value, s.Unit, s.Reference)).ToList();
        return new MemberDesignDetail(row, overrides ?? Empty, version, checks, steps, d.Record.Notes, "{}", "test", d.StandardCode, d.StandardVersion, new DateTime(2026, 11, 30, 8, 0, 0, DateTimeKind.Utc));
    }

    public static readonly MemberOverrides Empty = new(null, null, null, null, null, null, null, null, null, null, null, false);

    public static TrussDetail Truss(MemberOutcome m, bool canEdit = true) => new(
        TrussId, Guid.NewGuid(), 1, "Test truss", "Generated", null, 24_000, 6_000, null, 300, 0.1, null, "SANS 10162-1", "S355JR", [],
        [new MemberView(IdOf(m), 3, m.Mark, Guid.NewGuid(), "N1", Guid.NewGuid(), "N2", Guid.NewGuid(), m.Group, m.Design.Designation, null, m.Length, Empty, "Draft", m.Design.Status.ToString(), m.Design.Utilization, "fp-test")],
        [], new ActionsView(null, 0, 0, 0, 0, []), [], new TrussDesignStatus("Pass", 0.9, 1000, "fp", null, []), "Designer", canEdit);

    public static GradeView S355 => new(Guid.Parse("5f1c1c40-0000-4000-8000-0000000000aa"), 1, TestData.S355.Name, TestData.S355.Standard,
        TestData.S355.Bands.Select(b => new ThicknessBandView(b.MaxThickness, b.Fy)).ToList(), TestData.S355.Fu, TestData.S355.E, TestData.S355.G);
}

public sealed class FakeDesignService : IDesignService
{
    public MemberDesignDetail? Stored { get; set; }

    /// <summary>What UpdateMemberDesignAsync answers; default: Ok with the stored detail carrying the new overrides.</summary>
    public Func<MemberDesignInput, ServiceResult<MemberDesignDetail>>? OnUpdate { get; set; }

    public List<MemberDesignInput> Updates { get; } = [];

    public Task<ServiceResult<MemberDesignDetail>> GetMemberDesignAsync(Guid trussId, Guid memberId, CancellationToken cancellationToken = default) =>
        Task.FromResult(Stored is { } s && s.Row.MemberId == memberId ? ServiceResult<MemberDesignDetail>.Ok(s) : ServiceResult<MemberDesignDetail>.NotFound("The member does not exist in this truss."));

    public Task<ServiceResult<MemberDesignDetail>> UpdateMemberDesignAsync(Guid trussId, Guid memberId, MemberDesignInput input, CancellationToken cancellationToken = default)
    {
        Updates.Add(input);
        var result = OnUpdate?.Invoke(input) ?? ServiceResult<MemberDesignDetail>.Ok(Stored! with { Overrides = input.Overrides, MemberVersion = input.Version + 1 });
        if (result.IsOk)
        {
            Stored = result.Value;
        }

        return Task.FromResult(result);
    }

    public Task<ServiceResult<TrussDesignView>> DesignTrussAsync(Guid trussId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<TrussDesignView>> GetTrussDesignAsync(Guid trussId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<SizingProposal>> ProposeSizingAsync(Guid trussId, IProgress<SizingProgress>? progress = null, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<TrussDesignView>> AcceptSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<Done>> DiscardSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default) => throw new NotSupportedException();
}

/// <summary>Catalogue service over the seed-data catalogue (filters as the real service documents them).</summary>
public sealed class FakeCatalogueService : ICatalogueService
{
    public List<GradeView> Grades { get; } = [ServiceViews.S355];

    public Func<GradeInput, ServiceResult<GradeView>>? OnSaveGrade { get; set; }

    public List<GradeInput> SavedGrades { get; } = [];

    public Func<string, string, ServiceResult<CatalogueImportSummary>>? OnImport { get; set; }

    public List<(string File, string Text)> Imports { get; } = [];

    public Task<ServiceResult<IReadOnlyList<SectionListItem>>> ListSectionsAsync(SectionFilter filter, CancellationToken cancellationToken = default)
    {
        var items = TestData.Catalogue.Entries
            .Where(e => filter.Family is null || e.Family == filter.Family)
            .Where(e => string.IsNullOrWhiteSpace(filter.Search) || e.Designation.Contains(filter.Search.Trim(), StringComparison.OrdinalIgnoreCase))
            .Select(Item)
            .Where(i => Size(i) >= (filter.MinSizeMm ?? 0) && Size(i) <= (filter.MaxSizeMm ?? double.MaxValue))
            .ToList();
        return Task.FromResult(ServiceResult<IReadOnlyList<SectionListItem>>.Ok(items));
    }

    public static double Size(SectionListItem i) => new[] { i.DepthMm, i.WidthMm, i.OutsideDiameterMm }.Max() ?? 0;

    private static SectionListItem Item(SectionCatalogueEntry e)
    {
        var (depth, width, t, d) = e.Dimensions switch
        {
            AngleDimensions a => ((double?)a.LongLeg, (double?)a.ShortLeg, (double?)a.Thickness, (double?)null),
            CircularHollowDimensions c => (null, null, c.Thickness, c.Diameter),
            RectangularHollowDimensions r => (r.Depth, r.Width, r.Thickness, null),
            _ => ((double?)null, (double?)null, (double?)null, (double?)null),
        };
        return new SectionListItem(Guid.NewGuid(), e.Family, e.Designation, depth, width, t, d, e.Properties.MassPerMetre, e.File, true);
    }

    public Task<ServiceResult<SectionDetail>> GetSectionAsync(string designation, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<IReadOnlyList<GradeView>>> ListGradesAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<GradeView>>.Ok(Grades.ToList()));

    public Task<ServiceResult<IReadOnlyList<StandardView>>> ListStandardsAsync(CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<CatalogueImportSummary>> ImportCatalogueAsync(string fileName, string csvText, CancellationToken cancellationToken = default)
    {
        Imports.Add((fileName, csvText));
        return Task.FromResult(OnImport?.Invoke(fileName, csvText) ?? ServiceResult<CatalogueImportSummary>.Ok(new CatalogueImportSummary(fileName, 1, 0, 0)));
    }

    public Task<ServiceResult<GradeView>> SaveGradeAsync(GradeInput input, CancellationToken cancellationToken = default)
    {
        SavedGrades.Add(input);
        return Task.FromResult(OnSaveGrade?.Invoke(input) ?? ServiceResult<GradeView>.Ok(new GradeView(input.Id ?? Guid.NewGuid(), input.Version + 1, input.Name, input.Standard, input.Bands, input.FuMPa, input.EMPa, input.GMPa)));
    }
}

public sealed class FakeTrussService : ITrussService
{
    public TrussDetail? Detail { get; set; }

    public Task<ServiceResult<TrussDetail>> GetAsync(Guid trussId, CancellationToken cancellationToken = default) =>
        Task.FromResult(Detail is { } d && d.Id == trussId ? ServiceResult<TrussDetail>.Ok(d) : ServiceResult<TrussDetail>.NotFound("The truss does not exist or you may not see it."));

    public Task<ServiceResult<TrussDetail>> CreateFromGeneratorAsync(Guid projectId, TrussGeneratorInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveSettingsAsync(Guid trussId, TrussSettingsInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveNodesAsync(Guid trussId, NodeTableInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveMembersAsync(Guid trussId, MemberTableInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveSupportsAsync(Guid trussId, IReadOnlyList<SupportRow> rows, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveRestraintsAsync(Guid trussId, IReadOnlyList<RestraintRow> rows, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveGroupsAsync(Guid trussId, GroupTableInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveActionsAsync(Guid trussId, ActionsInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> SaveCombinationsAsync(Guid trussId, CombinationTableInput input, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    public Task<ServiceResult<TrussDetail>> ResetCombinationsAsync(Guid trussId, Core.Loads.CombinationStandard preset, IReadOnlyList<RowRef> loaded, CancellationToken cancellationToken = default) => throw new NotSupportedException();
}

public sealed class FakeUserAdminService : IUserAdminService
{
    public List<UserView> Users { get; } = [new("u1", "designer@example.test", "Dee Signer", ["Designer"], false, null)];

    public Func<CreateUserInput, ServiceResult<UserView>>? OnCreate { get; set; }

    public Task<ServiceResult<IReadOnlyList<UserView>>> ListUsersAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<UserView>>.Ok(Users.ToList()));

    public Task<ServiceResult<UserView>> CreateUserAsync(CreateUserInput input, CancellationToken cancellationToken = default)
    {
        var result = OnCreate?.Invoke(input) ?? ServiceResult<UserView>.Ok(new UserView(Guid.NewGuid().ToString(), input.Email, input.DisplayName, input.Roles, false, null));
        if (result.IsOk)
        {
            Users.Add(result.Value!);
        }

        return Task.FromResult(result);
    }

    public Task<ServiceResult<UserView>> SetRolesAsync(string userId, IReadOnlyList<string> roles, CancellationToken cancellationToken = default) => Change(userId, u => u with { Roles = roles });

    public Task<ServiceResult<UserView>> ResetPasswordAsync(string userId, string newPassword, CancellationToken cancellationToken = default) => Change(userId, u => u);

    public Task<ServiceResult<UserView>> SetLockedAsync(string userId, bool locked, CancellationToken cancellationToken = default) => Change(userId, u => u with { IsLockedOut = locked });

    public SystemInfoView SystemInfo { get; set; } = new("Microsoft.EntityFrameworkCore.Sqlite", "20261201000000_Test", 0, "0.1.0.0", "SANS 10162-1", "1.0.0");

    public Task<ServiceResult<SystemInfoView>> GetSystemInfoAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<SystemInfoView>.Ok(SystemInfo));

    private Task<ServiceResult<UserView>> Change(string id, Func<UserView, UserView> change)
    {
        var i = Users.FindIndex(u => u.Id == id);
        if (i < 0)
        {
            return Task.FromResult(ServiceResult<UserView>.NotFound("No such user."));
        }

        Users[i] = change(Users[i]);
        return Task.FromResult(ServiceResult<UserView>.Ok(Users[i]));
    }
}

/// <summary>A service the test does not expect to be called: every call fails the test.</summary>
public class UnusedService : System.Reflection.DispatchProxy
{
    public static T Create<T>() where T : class => Create<T, UnusedService>();

    protected override object? Invoke(System.Reflection.MethodInfo? targetMethod, object?[]? args) =>
        throw new InvalidOperationException($"{targetMethod?.DeclaringType?.Name}.{targetMethod?.Name} was not expected in this test.");
}
