using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Tests;

public abstract partial class ServiceBehaviourTests
{
    [Fact]
    public async Task The_project_lead_manages_membership_and_the_last_lead_cannot_be_removed()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var lead = As(Lead);

        var members = Ok(await lead.Projects.GetMembersAsync(project.Id));
        Assert.Equal([Roles.Checker, Roles.Designer, Roles.ProjectLead], members.Select(m => m.Role).Order(StringComparer.Ordinal));
        Assert.Contains(Ok(await lead.Projects.ListCandidateMembersAsync(project.Id)), u => u.UserId == Outsider.UserId);
        Assert.Equal(ResultKind.Forbidden, (await As(Designer).Projects.AddMemberAsync(project.Id, new AddProjectMemberInput(Outsider.UserId!, Roles.Designer))).Kind);

        var added = Ok(await lead.Projects.AddMemberAsync(project.Id, new AddProjectMemberInput("olu.outsider@example.test", Roles.Designer)));
        Ok(await As(Outsider).Trusses.GetAsync(truss.Id));
        var duplicate = await lead.Projects.AddMemberAsync(project.Id, new AddProjectMemberInput(Outsider.UserId!, Roles.Checker));
        Assert.Contains(duplicate.Errors, e => e.Field == nameof(AddProjectMemberInput.UserIdOrEmail));
        var badRole = await lead.Projects.AddMemberAsync(project.Id, new AddProjectMemberInput(Admin.UserId!, "Owner"));
        Assert.Contains(badRole.Errors, e => e.Field == nameof(AddProjectMemberInput.Role));

        Ok(await lead.Projects.RemoveMemberAsync(project.Id, new RowRef(added.MembershipId, added.Version)));
        Assert.Equal(ResultKind.NotFound, (await As(Outsider).Projects.GetAsync(project.Id)).Kind);
        var leadRow = members.Single(m => m.Role == Roles.ProjectLead);
        var last = await lead.Projects.RemoveMemberAsync(project.Id, new RowRef(leadRow.MembershipId, leadRow.Version));
        Assert.Equal(ResultKind.Invalid, last.Kind);
        Assert.Equal(3, Ok(await lead.Projects.GetMembersAsync(project.Id)).Count);
    }

    [Fact]
    public async Task An_administrator_adds_and_edits_grades_validated_by_core()
    {
        var admin = As(Admin);

        var bad = await admin.Catalogue.SaveGradeAsync(new GradeInput(null, 0, "S420 test", "invented", [new ThicknessBandView(16, 420)], 400, 200000, 77000));
        Assert.Equal(ResultKind.Invalid, bad.Kind);
        Assert.Contains(bad.Errors, e => e.Field == nameof(GradeInput.FuMPa));

        var grade = Ok(await admin.Catalogue.SaveGradeAsync(new GradeInput(null, 0, "S420 test", "invented", [new ThicknessBandView(16, 420), new ThicknessBandView(40, 400)], 520, 200000, 77000)));
        var edited = Ok(await admin.Catalogue.SaveGradeAsync(new GradeInput(grade.Id, grade.Version, grade.Name, grade.Standard, grade.Bands, 540, 200000, 77000)));
        Assert.Equal(540, edited.FuMPa);
        Assert.Equal(grade.Version + 1, edited.Version);

        var stale = await admin.Catalogue.SaveGradeAsync(new GradeInput(grade.Id, grade.Version, grade.Name, grade.Standard, grade.Bands, 560, 200000, 77000));
        Assert.Equal(ResultKind.Conflict, stale.Kind);
        Assert.Equal(ResultKind.Forbidden, (await As(Lead).Catalogue.SaveGradeAsync(new GradeInput(null, 0, "X", "Y", [new ThicknessBandView(16, 300)], 400, 200000, 77000))).Kind);
        Assert.Contains(Ok(await As(Checker).Catalogue.ListGradesAsync()), g => g.Name == "S420 test" && g.FuMPa == 540);
    }
}
