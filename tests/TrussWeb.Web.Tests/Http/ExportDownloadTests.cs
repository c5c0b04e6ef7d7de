using System.Net;
using DocumentFormat.OpenXml.Packaging;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Exports;
using TrussWeb.Services.Hosting;
using TrussWeb.Web.Security;

namespace TrussWeb.Web.Tests.Http;

/// <summary>The download endpoint of the real app (demo mode, temporary SQLite file, real export runner).</summary>
public class ExportDownloadTests : IClassFixture<DemoAppFactory>
{
    private readonly DemoAppFactory _factory;

    public ExportDownloadTests(DemoAppFactory factory) => _factory = factory;

    /// <summary>The demo designer starts an export of the demo project through the service, as the page does, and it finishes.</summary>
    private async Task<ExportJobView> ExportAsDemoDesignerAsync(ExportKind kind, ExportFormat format)
    {
        _ = _factory.CreateClient(); // starts the host (and its export runner)
        var designer = DemoSeeder.Users.Single(u => u.Role == Roles.Designer);
        using var scope = _factory.Services.CreateScope();
        var user = await scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>().FindByEmailAsync(designer.Email);
        var services = ServiceCollectionExtensions.ServicesFor(scope.ServiceProvider, new FixedCaller(user!.Id, user.DisplayName, Roles.Designer));
        var project = (await services.Projects.ListMyProjectsAsync()).Value!.Single(p => p.Name == DemoSeeder.ProjectName);
        var started = await services.Exports!.StartAsync(project.Id, kind, format);
        Assert.True(started.IsOk, started.Message);
        await _factory.Services.GetRequiredService<ExportJobRunner>().WaitAsync(started.Value!.JobId, new CancellationTokenSource(TimeSpan.FromMinutes(3)).Token);
        var job = (await services.Exports.GetJobAsync(started.Value.JobId)).Value!;
        Assert.Equal(ExportJobStatus.Succeeded, job.Status);
        return job;
    }

    private async Task<HttpClient> SignedInAsync(string email, string password)
    {
        var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, email, password);
        return client;
    }

    [Fact]
    public async Task Anonymous_is_sent_to_sign_in_and_a_user_outside_the_project_gets_not_found()
    {
        var job = await ExportAsDemoDesignerAsync(ExportKind.MemberSummary, ExportFormat.Csv);
        using var anonymous = _factory.CreateBrowser();
        using var anonymousResponse = await anonymous.GetAsync($"/exports/{job.JobId}/file");

        await _factory.CreateUserAsync("olu.outsider@example.test", "outsider-pass-1", Roles.Designer);
        using var outsider = await SignedInAsync("olu.outsider@example.test", "outsider-pass-1");
        using var outsiderResponse = await outsider.GetAsync($"/exports/{job.JobId}/file");
        using var unknown = await outsider.GetAsync($"/exports/{Guid.NewGuid()}/file");

        Assert.Equal(HttpStatusCode.Redirect, anonymousResponse.StatusCode);
        Assert.StartsWith(ReturnUrls.SignInPath, anonymousResponse.Headers.Location!.IsAbsoluteUri ? anonymousResponse.Headers.Location.AbsolutePath : anonymousResponse.Headers.Location.OriginalString,
            StringComparison.OrdinalIgnoreCase);
        Assert.Equal(HttpStatusCode.NotFound, outsiderResponse.StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, unknown.StatusCode);
    }

    [Fact]
    public async Task The_member_who_started_it_downloads_a_pdf_that_opens_with_its_name_and_type()
    {
        var job = await ExportAsDemoDesignerAsync(ExportKind.MemberSummary, ExportFormat.Pdf);
        var designer = DemoSeeder.Users.Single(u => u.Role == Roles.Designer);
        using var client = await SignedInAsync(designer.Email, designer.Password);

        using var response = await client.GetAsync($"/exports/{job.JobId}/file");
        var bytes = await response.Content.ReadAsByteArrayAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType!.MediaType);
        Assert.Equal(job.FileName, response.Content.Headers.ContentDisposition!.FileNameStar ?? response.Content.Headers.ContentDisposition.FileName?.Trim('"'));
        Assert.Matches(@"^[A-Za-z0-9.-]+_[A-Za-z0-9.-]+_member-summary_\d{8}T\d{6}Z\.pdf$", job.FileName);
        Assert.Equal(job.Sha256, Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(bytes)));
        using var pdf = UglyToad.PdfPig.PdfDocument.Open(bytes);
        Assert.True(pdf.NumberOfPages >= 1);
        Assert.Contains(DemoSeeder.ProjectName, string.Join(" ", pdf.GetPage(1).GetWords().Select(w => w.Text)), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Another_member_of_the_project_downloads_an_xlsx_that_opens()
    {
        var job = await ExportAsDemoDesignerAsync(ExportKind.MemberSummary, ExportFormat.Xlsx);
        var checker = DemoSeeder.Users.Single(u => u.Role == Roles.Checker);
        using var client = await SignedInAsync(checker.Email, checker.Password);

        using var response = await client.GetAsync($"/exports/{job.JobId}/file");
        var bytes = await response.Content.ReadAsByteArrayAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", response.Content.Headers.ContentType!.MediaType);
        using var stream = new MemoryStream(bytes);
        using var doc = SpreadsheetDocument.Open(stream, false);
        Assert.Equal("Summary", doc.WorkbookPart!.Workbook.Sheets!.Elements<DocumentFormat.OpenXml.Spreadsheet.Sheet>().Single().Name!.Value);
        Assert.Contains(DemoSeeder.ProjectName, doc.WorkbookPart.WorksheetParts.Single().Worksheet.InnerText, StringComparison.Ordinal);
    }
}
