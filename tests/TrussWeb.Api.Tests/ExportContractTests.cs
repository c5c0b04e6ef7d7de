using System.Net;
using System.Text.Json;
using DocumentFormat.OpenXml.Packaging;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Api.Tests.Support;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Api.Tests;

/// <summary>
/// Exports over HTTP with the real export runner (demo project, SQLite file): start (202 and Location), poll the
/// status, download a file that opens as what it claims to be; a read token may follow and download but not start;
/// the final set is refused to a non-lead (403) and to the lead while members are not approved (409).
/// </summary>
public sealed class ExportContractTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    private static readonly TimeSpan Patience = TimeSpan.FromMinutes(3);

    private async Task<HttpClient> ClientAsync(string email, string scope = ApiTokenScopes.ReadWrite) =>
        app.WithToken((await app.CreateTokenAsync(email, scope)).Token);

    private static string Body(string kind, string format) => $$"""{"kind":"{{kind}}","format":"{{format}}"}""";

    /// <summary>Starts an export, checks the 202 and its Location, and polls the Location until the job has ended.</summary>
    private static async Task<JsonElement> StartAndWaitAsync(HttpClient client, Guid projectId, string kind, string format)
    {
        var start = await client.PostRawAsync($"/api/v1/projects/{projectId}/exports", Body(kind, format));
        var started = await start.JsonAsync();
        Assert.True(start.StatusCode == HttpStatusCode.Accepted, started.GetRawText());
        var jobId = started.GetProperty("jobId").GetGuid();
        Assert.Equal($"/api/v1/exports/{jobId}", start.Headers.Location!.OriginalString);
        Assert.Equal(kind, started.GetProperty("kind").GetString());
        Assert.Equal(format, started.GetProperty("format").GetString());
        Assert.False(started.GetProperty("finalSet").GetBoolean());

        var deadline = DateTime.UtcNow + Patience;
        while (true)
        {
            var status = await client.GetAsync(start.Headers.Location);
            Assert.Equal(HttpStatusCode.OK, status.StatusCode);
            var job = await status.JsonAsync();
            Assert.InRange(job.GetProperty("done").GetInt32(), 0, Math.Max(0, job.GetProperty("total").GetInt32()));
            if (job.GetProperty("isFinished").GetBoolean())
            {
                return job;
            }

            Assert.True(DateTime.UtcNow < deadline, $"the export did not finish within {Patience}: {job.GetRawText()}");
            await Task.Delay(200);
        }
    }

    private static async Task<byte[]> DownloadAsync(HttpClient client, JsonElement job, string contentType, string extension)
    {
        Assert.Equal("Succeeded", job.GetProperty("status").GetString());
        var response = await client.GetAsync($"/api/v1/exports/{job.GetProperty("jobId").GetGuid()}/file");
        var bytes = await response.Content.ReadAsByteArrayAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(contentType, response.Content.Headers.ContentType!.MediaType);
        var name = response.Content.Headers.ContentDisposition!.FileNameStar ?? response.Content.Headers.ContentDisposition.FileName!.Trim('"');
        Assert.Equal(job.GetProperty("fileName").GetString(), name);
        Assert.EndsWith("." + extension, name, StringComparison.Ordinal);
        Assert.Equal(job.GetProperty("sizeBytes").GetInt64(), bytes.LongLength);
        var sha = System.Security.Cryptography.SHA256.HashData(bytes);
        Assert.Equal(job.GetProperty("sha256").GetString(), Convert.ToHexStringLower(sha));
        Assert.Equal("sha-256=:" + Convert.ToBase64String(sha) + ":", response.Headers.GetValues("Repr-Digest").Single());
        return bytes;
    }

    [Fact]
    public async Task The_calculation_book_is_started_polled_and_downloaded_as_a_pdf_that_opens()
    {
        var client = await ClientAsync(Demo.Designer);
        var (projectId, _) = await Demo.DemoProjectAsync(client);
        var job = await StartAndWaitAsync(client, projectId, "CalculationBook", "Pdf");
        Assert.True(job.GetProperty("total").GetInt32() > 1, job.GetRawText());
        Assert.Equal(job.GetProperty("total").GetInt32(), job.GetProperty("done").GetInt32());

        var bytes = await DownloadAsync(client, job, "application/pdf", "pdf");
        using var pdf = UglyToad.PdfPig.PdfDocument.Open(bytes);
        Assert.True(pdf.NumberOfPages > 1);
        var first = string.Join(" ", pdf.GetPage(1).GetWords().Select(w => w.Text));
        Assert.Contains(DemoSeeder.ProjectName, first, StringComparison.Ordinal);
        Assert.Matches(@"_calculation-book_\d{8}T\d{6}Z\.pdf$", job.GetProperty("fileName").GetString()!);
    }

    [Fact]
    public async Task The_member_summary_downloads_as_xlsx_and_csv_that_open()
    {
        var client = await ClientAsync(Demo.Designer);
        var (projectId, _) = await Demo.DemoProjectAsync(client);

        var xlsxJob = await StartAndWaitAsync(client, projectId, "MemberSummary", "Xlsx");
        var xlsx = await DownloadAsync(client, xlsxJob, "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", "xlsx");
        using (var stream = new MemoryStream(xlsx))
        using (var doc = SpreadsheetDocument.Open(stream, false))
        {
            Assert.Contains(DemoSeeder.ProjectName, doc.WorkbookPart!.WorksheetParts.Single().Worksheet.InnerText, StringComparison.Ordinal);
        }

        var csvJob = await StartAndWaitAsync(client, projectId, "MemberSummary", "Csv");
        var csv = System.Text.Encoding.UTF8.GetString(await DownloadAsync(client, csvJob, "text/csv", "csv"));
        Assert.Contains(DemoSeeder.ProjectName, csv, StringComparison.Ordinal);
        Assert.True(csv.Split('\n').Count(l => l.Contains(',', StringComparison.Ordinal)) > 5, csv);

        // Both jobs are listed for the project, newest first.
        var list = await (await client.GetAsync($"/api/v1/projects/{projectId}/exports")).JsonAsync();
        var ids = list.EnumerateArray().Select(j => j.GetProperty("jobId").GetGuid()).ToList();
        Assert.True(ids.IndexOf(csvJob.GetProperty("jobId").GetGuid()) is >= 0 and var c && c < ids.IndexOf(xlsxJob.GetProperty("jobId").GetGuid()), string.Join(", ", ids));
    }

    [Fact]
    public async Task A_read_token_may_not_start_an_export_but_may_follow_and_download_one()
    {
        var writer = await ClientAsync(Demo.Designer);
        var reader = await ClientAsync(Demo.Designer, ApiTokenScopes.Read);
        var (projectId, _) = await Demo.DemoProjectAsync(reader);

        await (await reader.PostRawAsync($"/api/v1/projects/{projectId}/exports", Body("MemberSummary", "Csv"))).ProblemAsync(403);
        await (await reader.PostRawAsync($"/api/v1/projects/{projectId}/exports/final-set", Body("CalculationBook", "Pdf"))).ProblemAsync(403);
        var before = (await (await reader.GetAsync($"/api/v1/projects/{projectId}/exports")).JsonAsync()).GetArrayLength();

        var job = await StartAndWaitAsync(writer, projectId, "MemberSummary", "Csv");
        Assert.Equal(before + 1, (await (await reader.GetAsync($"/api/v1/projects/{projectId}/exports")).JsonAsync()).GetArrayLength());
        var status = await (await reader.GetAsync($"/api/v1/exports/{job.GetProperty("jobId").GetGuid()}")).JsonAsync();
        Assert.Equal("Succeeded", status.GetProperty("status").GetString());
        await DownloadAsync(reader, status, "text/csv", "csv");
    }

    [Fact]
    public async Task The_final_set_is_refused_to_a_designer_and_to_the_lead_while_members_are_not_approved()
    {
        var lead = await ClientAsync(Demo.Lead);
        var designer = await ClientAsync(Demo.Designer);
        var (projectId, _) = await Demo.DemoProjectAsync(lead);
        var issue = await (await lead.GetAsync($"/api/v1/projects/{projectId}/issue-status")).JsonAsync();
        Assert.False(issue.GetProperty("canIssueFinal").GetBoolean(), "the demo project starts with members not approved");
        var auditBefore = (await (await lead.GetAsync($"/api/v1/projects/{projectId}/audit")).JsonAsync()).GetArrayLength();

        await (await designer.PostRawAsync($"/api/v1/projects/{projectId}/exports/final-set", Body("CalculationBook", "Pdf"))).ProblemAsync(403);
        var problem = await (await lead.PostRawAsync($"/api/v1/projects/{projectId}/exports/final-set", Body("CalculationBook", "Pdf"))).ProblemAsync(409);
        Assert.Contains("approved", problem.GetProperty("detail").GetString(), StringComparison.OrdinalIgnoreCase);
        Assert.False(problem.GetProperty("issueStatus").GetProperty("canIssueFinal").GetBoolean());

        // Nothing was queued and nothing was recorded as issued.
        var jobs = await (await lead.GetAsync($"/api/v1/projects/{projectId}/exports")).JsonAsync();
        Assert.DoesNotContain(jobs.EnumerateArray(), j => j.GetProperty("finalSet").GetBoolean());
        var audit = await (await lead.GetAsync($"/api/v1/projects/{projectId}/audit")).JsonAsync();
        Assert.DoesNotContain(audit.EnumerateArray(), a => a.GetRawText().Contains("ReviewFinalSetIssued", StringComparison.Ordinal));
        Assert.True(audit.GetArrayLength() >= auditBefore);
    }

    [Fact]
    public async Task Bad_bodies_unknown_jobs_and_other_projects_get_problems()
    {
        var client = await ClientAsync(Demo.Designer);
        var (projectId, _) = await Demo.DemoProjectAsync(client);
        var url = $"/api/v1/projects/{projectId}/exports";

        var book = await (await client.PostRawAsync(url, Body("CalculationBook", "Csv"))).ProblemAsync(400);
        Assert.Contains("Format", book.Fields());
        Assert.Contains("PDF only", book.GetProperty("detail").GetString(), StringComparison.Ordinal);
        Assert.Contains("$.kind", (await (await client.PostRawAsync(url, Body("Brochure", "Pdf"))).ProblemAsync(400)).Fields());
        Assert.Contains("$.format", (await (await client.PostRawAsync(url, """{"kind":"MemberSummary"}""")).ProblemAsync(400)).Fields());
        Assert.Contains("$.kind", (await (await client.PostRawAsync(url, """{"kind":0,"format":"Pdf"}""")).ProblemAsync(400)).Fields());

        await (await client.PostRawAsync($"/api/v1/projects/{Guid.NewGuid()}/exports", Body("MemberSummary", "Pdf"))).ProblemAsync(404);
        await (await client.GetAsync($"/api/v1/projects/{Guid.NewGuid()}/exports")).ProblemAsync(404);
        await (await client.GetAsync($"/api/v1/exports/{Guid.NewGuid()}")).ProblemAsync(404);
        await (await client.GetAsync($"/api/v1/exports/{Guid.NewGuid()}/file")).ProblemAsync(404);
    }
}

/// <summary>
/// How the download maps job states the real runner passes through too quickly to catch (queued, running, failed,
/// cancelled): an export service that reports fixed jobs, and would even hand out a file for any of them.
/// </summary>
public sealed class ExportDownloadStateTests(ExportDownloadStateTests.StubbedApp app) : IClassFixture<ExportDownloadStateTests.StubbedApp>
{
    public sealed class StubbedApp() : ApiAppFactory(new SqliteTestDatabase())
    {
        protected override void ConfigureWebHost(IWebHostBuilder builder)
        {
            base.ConfigureWebHost(builder);
            builder.ConfigureTestServices(s => s.AddScoped<IExportService, StubExports>());
        }
    }

    public static TheoryData<string, int> States => new()
    {
        { "Queued", 409 },
        { "Running", 409 },
        { "Failed", 404 },
        { "Cancelled", 404 },
    };

    [Theory]
    [MemberData(nameof(States))]
    public async Task A_job_that_has_not_succeeded_offers_no_file(string state, int expected)
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer, ApiTokenScopes.Read)).Token);
        var id = StubExports.IdFor(Enum.Parse<ExportJobStatus>(state));

        var status = await (await client.GetAsync($"/api/v1/exports/{id}")).JsonAsync();
        Assert.Equal(state, status.GetProperty("status").GetString());
        Assert.False(status.GetProperty("hasFile").GetBoolean());

        var response = await client.GetAsync($"/api/v1/exports/{id}/file");
        var problem = await response.ProblemAsync(expected);
        Assert.NotEqual("application/pdf", response.Content.Headers.ContentType?.MediaType);
        if (state == "Failed")
        {
            Assert.Contains(StubExports.FailureMessage, problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task A_succeeded_job_downloads_its_file()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer, ApiTokenScopes.Read)).Token);
        var response = await client.GetAsync($"/api/v1/exports/{StubExports.IdFor(ExportJobStatus.Succeeded)}/file");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("%PDF-stub", await response.Content.ReadAsStringAsync());
    }

    private sealed class StubExports : IExportService
    {
        public const string FailureMessage = "The calculation book could not be laid out (stub).";

        public static Guid IdFor(ExportJobStatus status) => new($"00000000-0000-0000-0000-00000000000{(int)status}");

        private static ExportJobView Job(Guid id)
        {
            var status = (ExportJobStatus)int.Parse(id.ToString()[^1..], System.Globalization.CultureInfo.InvariantCulture);
            var ok = status == ExportJobStatus.Succeeded;
            return new ExportJobView(id, Guid.Empty, ExportKind.CalculationBook, ExportFormat.Pdf, false, "u", "Stub", DateTime.UtcNow, status,
                status == ExportJobStatus.Running ? 3 : 0, 10, status.ToString(), status == ExportJobStatus.Failed ? FailureMessage : null,
                ok ? "stub.pdf" : null, ok ? "application/pdf" : null, ok ? 9 : null, ok ? Sha("%PDF-stub") : null, null, DateTime.UtcNow.AddHours(1));
        }

        private static string Sha(string text) => Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.ASCII.GetBytes(text)));

        public Task<ServiceResult<ExportJobView>> GetJobAsync(Guid jobId, CancellationToken cancellationToken = default) =>
            Task.FromResult(jobId.ToString().StartsWith("00000000-0000-0000-0000-00000000000", StringComparison.Ordinal) && jobId.ToString()[^1] is >= '0' and <= '4'
                ? ServiceResult<ExportJobView>.Ok(Job(jobId))
                : ServiceResult<ExportJobView>.NotFound("no such job"));

        /// <summary>Hands out bytes for every job, so only the endpoint stands between a failed job and a file.</summary>
        public Task<ServiceResult<ExportFile>> OpenFileAsync(Guid jobId, CancellationToken cancellationToken = default) =>
            Task.FromResult(ServiceResult<ExportFile>.Ok(new ExportFile(new MemoryStream("%PDF-stub"u8.ToArray()), "stub.pdf", "application/pdf", 9, Sha("%PDF-stub"))));

        public Task<ServiceResult<ExportReadiness>> GetReadinessAsync(Guid projectId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

        public Task<ServiceResult<ExportJobView>> StartAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default) => throw new NotSupportedException();

        public Task<ServiceResult<ExportJobView>> StartFinalSetAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default) => throw new NotSupportedException();

        public Task<ServiceResult<IReadOnlyList<ExportJobView>>> ListJobsAsync(Guid projectId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

        public Task<ServiceResult<ExportJobView>> CancelAsync(Guid jobId, CancellationToken cancellationToken = default) => throw new NotSupportedException();
    }
}
