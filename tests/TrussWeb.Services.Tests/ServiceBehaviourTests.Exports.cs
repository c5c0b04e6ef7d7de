using System.Globalization;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Core;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Model;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Exports;
using TrussWeb.Services.Hosting;
using TrussWeb.Services.Tests.Support;
using UglyToad.PdfPig;
using UglyToad.PdfPig.DocumentLayoutAnalysis.TextExtractor;

namespace TrussWeb.Services.Tests;

public abstract partial class ServiceBehaviourTests
{
    private readonly List<string> exportFolders = [];

    /// <summary>A second provider over the same database whose export runner writes to a fresh temporary folder and is started.</summary>
    private async Task<(ServiceProvider Provider, ExportJobRunner Runner)> ExportHostAsync(IExportRenderer? renderer = null)
    {
        var folder = Path.Combine(Path.GetTempPath(), "trussweb-export-tests", Guid.NewGuid().ToString("N"));
        exportFolders.Add(folder);
        var provider = Database.BuildServices(Clock, Callers, services =>
        {
            services.AddSingleton(new ExportOptions { Folder = folder, Retention = TimeSpan.FromHours(24) });
            if (renderer is not null)
            {
                services.AddSingleton(renderer);
            }
        });
        var runner = provider.GetRequiredService<ExportJobRunner>();
        await runner.StartAsync(CancellationToken.None);
        return (provider, runner);
    }

    private IExportService Exports(FixedCaller caller, ServiceProvider provider)
    {
        Callers.Current = caller;
        var scope = provider.CreateAsyncScope();
        scopes.Add(scope);
        return scope.ServiceProvider.GetRequiredService<IExportService>();
    }

    private static async Task<ExportJobView> FinishedAsync(ExportJobRunner runner, IExportService exports, ExportJobView started)
    {
        await runner.WaitAsync(started.JobId, new CancellationTokenSource(TimeSpan.FromMinutes(2)).Token);
        return Ok(await exports.GetJobAsync(started.JobId));
    }

    private static async Task<byte[]> BytesAsync(IExportService exports, Guid jobId)
    {
        var file = Ok(await exports.OpenFileAsync(jobId));
        await using var content = file.Content;
        using var copy = new MemoryStream();
        await content.CopyToAsync(copy);
        return copy.ToArray();
    }

    private static List<string> PdfPages(byte[] pdf)
    {
        using var doc = PdfDocument.Open(pdf);
        return doc.GetPages().Select(p => Words(ContentOrderTextExtractor.GetText(p))).ToList();
    }

    private static string[] FilesIn(string folder) => Directory.Exists(folder) ? Directory.GetFiles(folder) : [];

    private static string Words(string text) => string.Join(" ", text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));

    private async Task ApproveEveryMemberAsync(TrussDetail truss)
    {
        Ok(await As(Designer).Review.SubmitTrussAsync(truss.Id, Checker.UserId!, null));
        foreach (var m in truss.Members)
        {
            Ok(await As(Checker).Review.ApproveAsync(m.Id, null));
        }
    }

    [Fact]
    public async Task A_preliminary_calculation_book_prints_the_stored_results_the_approval_count_the_caution_and_page_x_of_y_on_every_page()
    {
        var (project, truss, _) = await ApprovedTc1Async();
        var (provider, runner) = await ExportHostAsync();
        var exports = Exports(Designer, provider);
        var seen = new List<ExportJobView>();
        using var subscription = provider.GetRequiredService<IExportEvents>().Subscribe(project.Id, v => { lock (seen) { seen.Add(v); } });

        var started = Ok(await exports.StartAsync(project.Id, ExportKind.CalculationBook, ExportFormat.Pdf));
        var job = await FinishedAsync(runner, exports, started);

        Assert.Equal(ExportJobStatus.Succeeded, job.Status);
        var pdf = await BytesAsync(exports, job.JobId);
        var pages = PdfPages(pdf);
        var n = truss.Members.Count;

        // The stored result of a compression member: its Cr step and utilization as the snapshot keeps them (3 s.f., Records/Display).
        MemberDesignDetail? member = null;
        foreach (var m in truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal))
        {
            var d = Ok(await As(Designer).Design.GetMemberDesignAsync(truss.Id, m.Id));
            if (d.Steps.Any(s => s.Symbol == "Cr") && d.Row.Forces.MaxCompressionN > 1000)
            {
                member = d;
                break;
            }
        }

        Assert.NotNull(member);
        var cr = member.Steps.Last(s => s.Symbol == "Cr");
        var text = string.Join(" ", pages);
        Assert.Contains($"{Display.Sig(cr.Value)} {cr.Unit}", text, StringComparison.Ordinal);
        Assert.Contains($"{member.Row.Mark} · {member.Row.Section} · U = {Display.Sig(member.Row.Utilization)}", text, StringComparison.Ordinal);
        var caution = Words(Caution.Text);
        for (var i = 0; i < pages.Count; i++)
        {
            Assert.Contains($"Page {i + 1} of {pages.Count}", pages[i], StringComparison.Ordinal);
            Assert.Contains(caution, pages[i], StringComparison.Ordinal);
            Assert.Contains($"NOT FOR CONSTRUCTION: {n - 1} of {n} members not approved", pages[i], StringComparison.Ordinal);
        }

        Assert.Contains("Produced by Dineo Designer", pages[0], StringComparison.Ordinal);
        Assert.Contains("Tamboti Storage Hall", pages[0], StringComparison.Ordinal);
        Assert.Contains("Umsinsi Traders (invented)", pages[0], StringComparison.Ordinal);
        Assert.Contains(Start.UtcDateTime.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture), pages[0], StringComparison.Ordinal);

        // The record: who, what, size and hash of the file; the name has code, revision, kind and UTC time; progress reached the end.
        Assert.Equal(("Dineo Designer", ExportKind.CalculationBook, ExportFormat.Pdf, false), (job.RequestedBy, job.Kind, job.Format, job.FinalSet));
        Assert.Equal("T-118_A_calculation-book_20260504T071500Z.pdf", job.FileName);
        Assert.Equal("application/pdf", job.ContentType);
        Assert.Equal(pdf.LongLength, job.SizeBytes);
        Assert.Equal(Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(pdf)), job.Sha256);
        Assert.Equal(job.Total, job.Done);
        lock (seen)
        {
            Assert.Contains(seen, v => v.Status == ExportJobStatus.Running && v.Done > 0 && v.Done < v.Total && v.Stage.Contains("TC1", StringComparison.Ordinal));
            Assert.Equal(ExportJobStatus.Succeeded, seen[^1].Status);
        }

        Assert.Equal([$"{job.JobId:N}.pdf"], FilesIn(runner.Options.Folder).Select(Path.GetFileName));
        var audit = Assert.Single(Ok(await As(Lead).Review.GetAuditAsync(project.Id, null)), a => a.Action == "ExportProduced");
        Assert.Equal((job.FileName, job.Sha256, "Dineo Designer"), (audit.NewValue, audit.Fingerprint, audit.UserName));
    }

    [Fact]
    public async Task The_member_summary_csv_and_xlsx_carry_the_same_stored_numbers_as_the_summary_pdf()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var design = Ok(await As(Checker).Design.GetTrussDesignAsync(truss.Id));
        var (provider, runner) = await ExportHostAsync();
        var exports = Exports(Checker, provider);

        var pdfJob = await FinishedAsync(runner, exports, Ok(await exports.StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Pdf)));
        var csvJob = await FinishedAsync(runner, exports, Ok(await exports.StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Csv)));
        var xlsxJob = await FinishedAsync(runner, exports, Ok(await exports.StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Xlsx)));
        var pdf = string.Join(" ", PdfPages(await BytesAsync(exports, pdfJob.JobId)));
        var csv = Csv(System.Text.Encoding.UTF8.GetString(await BytesAsync(exports, csvJob.JobId)));
        var xlsx = Xlsx(await BytesAsync(exports, xlsxJob.JobId));

        Assert.Equal("text/csv", csvJob.ContentType);
        Assert.EndsWith(".xlsx", xlsxJob.FileName, StringComparison.Ordinal);
        Assert.Equal($"0 of {design.Members.Count} members approved; preliminary", csv.Single(r => r.Count > 1 && r[0] == "Approval status")[1]);
        Assert.Equal(csv.Single(r => r.Count > 1 && r[0] == "Approval status")[1], xlsx.Single(r => r.Count > 1 && r[0] == "Approval status")[1]);
        Assert.Equal("Chris Checker", csv.Single(r => r.Count > 1 && r[0] == "Produced by")[1]);
        Assert.Equal(Caution.Text, xlsx.Single(r => r.Count > 1 && r[0] == "Caution")[1]);
        foreach (var row in design.Members)
        {
            var c = csv.Single(r => r.Count > 9 && r[0] == "RT1" && r[1] == row.Mark);
            var x = xlsx.Single(r => r.Count > 9 && r[0] == "RT1" && r[1] == row.Mark);
            // Column 9 is the utilization (ExportHeaderBlock.MemberColumns), unrounded in both files; the PDF prints it to 3 s.f.
            Assert.Equal(row.Utilization, double.Parse(c[9], CultureInfo.InvariantCulture));
            Assert.Equal(row.Utilization, double.Parse(x[9], CultureInfo.InvariantCulture));
            Assert.Equal(row.Forces.MaxCompressionN / 1000, double.Parse(c[7], CultureInfo.InvariantCulture), 9);
            Assert.Equal(c[3], x[3]);
            Assert.Contains($"{row.Mark} {row.Group} {row.Section}", pdf, StringComparison.Ordinal);
            Assert.Contains(Display.Sig(row.Utilization), pdf, StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task The_final_set_is_refused_while_a_member_is_not_approved_and_marked_final_on_every_page_once_all_are()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var (provider, runner) = await ExportHostAsync();

        var early = await Exports(Lead, provider).StartFinalSetAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Pdf);
        var readinessBefore = Ok(await Exports(Lead, provider).GetReadinessAsync(project.Id));
        Assert.Equal(ResultKind.Forbidden, early.Kind);
        Assert.Contains($"0 of {truss.Members.Count} members are approved", early.Message, StringComparison.Ordinal);
        Assert.Equal($"0 of {truss.Members.Count} members approved — files will be marked preliminary ({truss.Members.Count} not approved)", readinessBefore.MarkingText);
        Assert.NotNull(readinessBefore.FinalSetRefusal);
        Assert.Empty(Ok(await Exports(Lead, provider).ListJobsAsync(project.Id)));

        await ApproveEveryMemberAsync(truss);
        Assert.Equal("Only the project lead can issue the final set.", Ok(await Exports(Designer, provider).GetReadinessAsync(project.Id)).FinalSetRefusal);
        Assert.Null(Ok(await Exports(Lead, provider).GetReadinessAsync(project.Id)).FinalSetRefusal);
        var exports = Exports(Lead, provider);
        var job = await FinishedAsync(runner, exports, Ok(await exports.StartFinalSetAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Pdf)));

        Assert.Equal((ExportJobStatus.Succeeded, true), (job.Status, job.FinalSet));
        Assert.Contains("_final_", job.FileName, StringComparison.Ordinal);
        var pages = PdfPages(await BytesAsync(exports, job.JobId));
        Assert.All(pages, p =>
        {
            Assert.Contains($"All {truss.Members.Count} members approved; final issue", p, StringComparison.Ordinal);
            Assert.DoesNotContain("NOT FOR CONSTRUCTION", p, StringComparison.Ordinal);
        });
        var audit = Ok(await As(Lead).Review.GetAuditAsync(project.Id, null));
        Assert.Contains(audit, a => a.Action == "ReviewFinalSetIssued");
    }

    [Fact]
    public async Task An_export_whose_renderer_throws_ends_failed_with_its_message_and_leaves_no_file()
    {
        var (project, _) = await ProjectWithTrussAsync();
        var (provider, runner) = await ExportHostAsync(new ThrowingRenderer());
        var exports = Exports(Designer, provider);

        var job = await FinishedAsync(runner, exports, Ok(await exports.StartAsync(project.Id, ExportKind.CalculationBook, ExportFormat.Pdf)));
        var file = await exports.OpenFileAsync(job.JobId);

        Assert.Equal(ExportJobStatus.Failed, job.Status);
        Assert.Equal("The export failed: the page layout ran out of room (test renderer).", job.Error);
        Assert.DoesNotContain(" at ", job.Error, StringComparison.Ordinal);
        Assert.False(job.HasFile);
        Assert.Null(job.FileName);
        Assert.Equal(ResultKind.NotFound, file.Kind);
        Assert.Empty(FilesIn(runner.Options.Folder));
    }

    [Fact]
    public async Task A_cancelled_export_ends_cancelled_and_leaves_no_file()
    {
        var (project, _) = await ProjectWithTrussAsync();
        var renderer = new EndlessRenderer();
        var (provider, runner) = await ExportHostAsync(renderer);
        var exports = Exports(Designer, provider);
        var started = Ok(await exports.StartAsync(project.Id, ExportKind.CalculationBook, ExportFormat.Pdf));
        Assert.True(renderer.Rendering.Wait(TimeSpan.FromMinutes(1)), "the renderer never started");

        Assert.Equal(ResultKind.Forbidden, (await Exports(Checker, provider).CancelAsync(started.JobId)).Kind);
        Ok(await exports.CancelAsync(started.JobId));
        var job = await FinishedAsync(runner, exports, started);

        Assert.Equal((ExportJobStatus.Cancelled, "The export was cancelled."), (job.Status, job.Error));
        Assert.False(job.HasFile);
        Assert.Equal(ResultKind.NotFound, (await exports.OpenFileAsync(job.JobId)).Kind);
        Assert.Empty(FilesIn(runner.Options.Folder));
    }

    [Fact]
    public async Task A_member_without_a_stored_result_is_named_in_the_file_and_left_out()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var bc1 = truss.Members.First(m => m.Mark == "BC1");
        await using (var db = await ContextAsync())
        {
            await db.DesignSnapshots.Where(s => s.MemberId == bc1.Id).ExecuteDeleteAsync();
        }

        var (provider, runner) = await ExportHostAsync();
        var exports = Exports(Designer, provider);
        var job = await FinishedAsync(runner, exports, Ok(await exports.StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Csv)));
        var csv = Csv(System.Text.Encoding.UTF8.GetString(await BytesAsync(exports, job.JobId)));

        Assert.Equal(ExportJobStatus.Succeeded, job.Status);
        Assert.Equal("Truss RT1: no stored design result for member(s) BC1; they are not included.", csv.Single(r => r.Count > 1 && r[0] == "Note")[1]);
        Assert.DoesNotContain(csv, r => r.Count > 9 && r[0] == "RT1" && r[1] == "BC1");
        Assert.Contains(csv, r => r.Count > 9 && r[0] == "RT1" && r[1] == "TC1");
    }

    [Fact]
    public async Task Exports_are_refused_to_non_members_the_final_set_to_members_who_are_not_the_lead_and_a_book_is_pdf_only()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        await ApproveEveryMemberAsync(truss);
        var (provider, runner) = await ExportHostAsync();
        var job = Ok(await Exports(Designer, provider).StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Csv));
        await runner.WaitAsync(job.JobId);

        Assert.Equal(ResultKind.NotFound, (await Exports(Outsider, provider).StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Csv)).Kind);
        Assert.Equal(ResultKind.NotFound, (await Exports(Outsider, provider).GetJobAsync(job.JobId)).Kind);
        Assert.Equal(ResultKind.NotFound, (await Exports(Outsider, provider).OpenFileAsync(job.JobId)).Kind);
        Assert.Equal(ResultKind.NotFound, (await Exports(Outsider, provider).ListJobsAsync(project.Id)).Kind);
        Assert.Equal(ResultKind.Forbidden, (await Exports(new FixedCaller(null, "nobody"), provider).OpenFileAsync(job.JobId)).Kind);
        Assert.Equal(ResultKind.Forbidden, (await Exports(Designer, provider).StartFinalSetAsync(project.Id, ExportKind.CalculationBook, ExportFormat.Pdf)).Kind);
        Assert.Equal(ResultKind.Forbidden, (await Exports(Checker, provider).StartFinalSetAsync(project.Id, ExportKind.CalculationBook, ExportFormat.Pdf)).Kind);
        Assert.Equal(ResultKind.Forbidden, (await Exports(Checker, provider).CancelAsync(job.JobId)).Kind);
        var invalid = await Exports(Designer, provider).StartAsync(project.Id, ExportKind.CalculationBook, ExportFormat.Xlsx);
        Assert.Equal(ResultKind.Invalid, invalid.Kind);
        Assert.Equal("Format", invalid.Errors.Single().Field);
        Assert.True((await Exports(Checker, provider).OpenFileAsync(job.JobId)).IsOk, "any member of the project may download");
        Assert.DoesNotContain(Ok(await As(Lead).Review.GetAuditAsync(project.Id, null)), a => a.Action == "ReviewFinalSetIssued");
    }

    [Fact]
    public async Task Jobs_and_their_files_expire_after_the_retention_time()
    {
        var (project, _) = await ProjectWithTrussAsync();
        var (provider, runner) = await ExportHostAsync();
        var exports = Exports(Designer, provider);
        var job = await FinishedAsync(runner, exports, Ok(await exports.StartAsync(project.Id, ExportKind.MemberSummary, ExportFormat.Csv)));
        File.WriteAllText(Path.Combine(runner.Options.Folder, $"{Guid.NewGuid():N}.tmp"), "left by an earlier run");
        Assert.Equal(2, FilesIn(runner.Options.Folder).Length);

        runner.CleanUp();
        Assert.Single(FilesIn(runner.Options.Folder));
        Clock.Advance(TimeSpan.FromHours(24) + TimeSpan.FromMinutes(1));
        runner.CleanUp();

        Assert.Empty(FilesIn(runner.Options.Folder));
        Assert.Equal(ResultKind.NotFound, (await exports.GetJobAsync(job.JobId)).Kind);
        Assert.Empty(Ok(await exports.ListJobsAsync(project.Id)));
    }

    private static IReadOnlyList<IReadOnlyList<string>> Csv(string text) => Rfc4180Csv.Read(text);

    private static List<List<string>> Xlsx(byte[] bytes)
    {
        using var stream = new MemoryStream(bytes);
        using var doc = SpreadsheetDocument.Open(stream, false);
        var sheet = doc.WorkbookPart!.WorksheetParts.Single().Worksheet;
        return sheet.Descendants<Row>().Select(r => r.Elements<Cell>().Select(c => c.DataType?.Value == CellValues.InlineString
            ? c.InlineString?.InnerText ?? ""
            : c.CellValue?.Text ?? "").ToList()).ToList();
    }

    /// <summary>Reports progress until the job's cancellation stops it through the progress callback.</summary>
    private sealed class EndlessRenderer : IExportRenderer
    {
        public ManualResetEventSlim Rendering { get; } = new();

        public byte[] Render(ExportKind kind, ExportFormat format, ReportHeader header, IReadOnlyList<TrussReportData> trusses, IProgress<ReportProgress> progress)
        {
            Rendering.Set();
            for (var i = 0; i < 6000; i++)
            {
                progress.Report(new ReportProgress(1, 2, "still going"));
                Thread.Sleep(10);
            }

            throw new TimeoutException("the job was never cancelled");
        }
    }

    private sealed class ThrowingRenderer : IExportRenderer
    {
        public byte[] Render(ExportKind kind, ExportFormat format, ReportHeader header, IReadOnlyList<TrussReportData> trusses, IProgress<ReportProgress> progress)
        {
            progress.Report(new ReportProgress(1, 2, "first item"));
            throw new InvalidOperationException("the page layout ran out of room (test renderer).");
        }
    }
}
