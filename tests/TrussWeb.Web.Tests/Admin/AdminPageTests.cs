using AngleSharp.Dom;
using Microsoft.AspNetCore.Components.Forms;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Admin;
using TrussWeb.Web.Tests.Support;

using TrussWeb.Web.Tests.Support.MemberPageFakes;

namespace TrussWeb.Web.Tests.Admin;

public class AdminPageTests : TrussWebTestContext
{
    private readonly FakeCatalogueService _catalogue = new();
    private readonly FakeUserAdminService _users = new();

    public AdminPageTests()
    {
        Services.AddSingleton<ICatalogueService>(_catalogue);
        Services.AddSingleton<IUserAdminService>(_users);
        Render<MudBlazor.MudPopoverProvider>();
    }

    private static IElement Input<T>(IRenderedComponent<T> cut, string testId, int index = 0) where T : Microsoft.AspNetCore.Components.IComponent
    {
        var element = cut.FindAll($"[data-testid={testId}]")[index];
        return element.TagName == "INPUT" ? element : element.QuerySelector("input")!;
    }

    [Fact]
    public void A_grade_with_fu_below_fy_is_refused_with_the_message_at_fu()
    {
        var cut = Render<GradeAdminPanel>();
        Input(cut, "grade-name").Change("Test grade");
        Input(cut, "grade-fu").Change("300");
        Input(cut, "band-thickness").Change("16");
        Input(cut, "band-fy").Change("355");

        cut.Find("[data-testid=grade-save]").Click();

        cut.WaitForAssertion(() => Assert.Contains("must not be less than fy = 355 MPa", cut.Find("[data-testid=grade-form]").TextContent, StringComparison.Ordinal));
        Assert.Empty(_catalogue.SavedGrades);
    }

    [Fact]
    public void Thickness_bands_out_of_order_and_zero_fy_are_named_under_the_bands()
    {
        var cut = Render<GradeAdminPanel>();
        Input(cut, "grade-name").Change("Test grade");
        Input(cut, "grade-fu").Change("470");
        Input(cut, "band-thickness").Change("40");
        Input(cut, "band-fy").Change("0");
        cut.Find("[data-testid=band-add]").Click();
        Input(cut, "band-thickness", 1).Change("16");
        Input(cut, "band-fy", 1).Change("345");

        cut.Find("[data-testid=grade-save]").Click();

        cut.WaitForAssertion(() =>
        {
            var text = cut.Find("[data-testid=error-Bands]").TextContent;
            Assert.Contains("must ascend (got 16 mm after 40 mm)", text, StringComparison.Ordinal);
            Assert.Contains("fy", text, StringComparison.Ordinal);
        });
        Assert.Empty(_catalogue.SavedGrades);
    }

    [Fact]
    public void A_valid_grade_is_sent_to_the_service()
    {
        var cut = Render<GradeAdminPanel>();
        Input(cut, "grade-name").Change("S275 test");
        Input(cut, "grade-fu").Change("410");
        Input(cut, "band-thickness").Change("16");
        Input(cut, "band-fy").Change("275");

        cut.Find("[data-testid=grade-save]").Click();

        cut.WaitForAssertion(() => Assert.Equal(275, _catalogue.SavedGrades.Single().Bands.Single().FyMPa));
        Assert.Empty(cut.FindAll("[data-testid=error-Bands]"));
    }

    [Fact]
    public async Task Import_errors_are_listed_with_file_line_and_field()
    {
        _catalogue.OnImport = (file, _) => ServiceResult<CatalogueImportSummary>.Invalid([
            new FieldError("t", "thickness must be greater than 0 mm (got 0)", file, 3),
            new FieldError("b", "leg must be at least 20 mm (got 5)", file, 7)]);
        var cut = Render<CatalogueImportPanel>();

        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromText("family,designation\nAngle,L0\n", "angles-extra.csv"));
        await Task.CompletedTask;

        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=import-error]").Count));
        Assert.Equal(["3", "7"], Texts(cut, "[data-testid=import-error-line]"));
        Assert.Equal(["t", "b"], Texts(cut, "[data-testid=import-error-field]"));
        Assert.Contains("angles-extra.csv", cut.Find("[data-testid=import-errors]").TextContent, StringComparison.Ordinal);
        Assert.Contains("Nothing was imported", cut.Find("[data-testid=import-message]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_over_the_size_limit_is_refused_before_the_service_is_called()
    {
        var cut = Render<CatalogueImportPanel>();

        cut.FindComponent<InputFile>().UploadFiles(InputFileContent.CreateFromBinary(new byte[CatalogueImportPanel.MaxBytes + 1], "huge.csv"));

        cut.WaitForAssertion(() => Assert.Contains("larger than the limit of 2048 KB", cut.Find("[data-testid=import-message]").TextContent, StringComparison.Ordinal));
        Assert.Empty(_catalogue.Imports);
    }

    [Fact]
    public void Creating_a_user_shows_the_service_field_messages()
    {
        _users.OnCreate = _ => ServiceResult<UserView>.Invalid([new FieldError("Email", "give a valid e-mail address"), new FieldError("Password", "at least 12 characters")]);
        var cut = Render<UserAdminPanel>();

        cut.Find("[data-testid=new-create]").Click();

        cut.WaitForAssertion(() => Assert.Contains("give a valid e-mail address", cut.Find("[data-testid=user-create]").TextContent, StringComparison.Ordinal));
        Assert.Contains("at least 12 characters", cut.Find("[data-testid=user-create]").TextContent, StringComparison.Ordinal);
        Assert.Single(cut.FindAll("[data-testid=user-row]"));
    }
}
