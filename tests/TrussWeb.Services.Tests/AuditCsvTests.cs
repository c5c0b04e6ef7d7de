using System.Text;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Tests;

public sealed class AuditCsvTests
{
    [Fact]
    public void Fields_with_commas_quotes_or_line_breaks_are_quoted_and_rows_end_with_crlf()
    {
        var entry = new AuditEntryView(7, new DateTime(2026, 5, 4, 7, 15, 0, 250, DateTimeKind.Utc), "u1", "Dineo, D.", "TrussMember", "m1", "ReviewReturn",
            "ReviewState", "AwaitingCheck", "Returned", "Check \"Ky\"\nat the apex", null);

        var text = Encoding.UTF8.GetString(AuditCsv.Write([entry]));

        Assert.Equal(
            "Id,UtcTime,UserId,UserName,EntityType,EntityId,Action,Field,OldValue,NewValue,Comment,Fingerprint\r\n" +
            "7,2026-05-04T07:15:00.250Z,u1,\"Dineo, D.\",TrussMember,m1,ReviewReturn,ReviewState,AwaitingCheck,Returned,\"Check \"\"Ky\"\"\nat the apex\",\r\n",
            text);
    }

    [Fact]
    public void The_file_has_no_byte_order_mark_and_writes_invariant_numbers_and_utc_times()
    {
        var bytes = AuditCsv.Write([new AuditEntryView(1234567, new DateTime(2026, 12, 1, 23, 5, 9, DateTimeKind.Utc), null, null, "Project", "p", "Created",
            null, null, null, null, null)]);

        Assert.NotEqual(0xEF, bytes[0]);
        Assert.EndsWith("\r\n1234567,2026-12-01T23:05:09.000Z,,,Project,p,Created,,,,,\r\n", Encoding.UTF8.GetString(bytes), StringComparison.Ordinal);
    }
}
