using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Trusses;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Trusses;

public class MemberResultsTableTests : TrussWebTestContext
{
    private static MemberDesignRow Row(string mark, double u, string status, double tensionN, double compressionN) =>
        new(Guid.NewGuid(), mark, "TopChord", "2L 75x75x6", "S355JR", 1875.4,
            new ForcesView(tensionN, tensionN > 0 ? "ULS 2" : null, compressionN, compressionN > 0 ? "ULS 1" : null),
            new LengthsView(1875.4, 3750, 3750, 1, 1, 1, null, null, "node to node", "purlins", "purlins"),
            u, "Compression 13.3", "ULS 1", status, "Draft", "fp");

    [Fact]
    public void Each_member_is_a_row_with_its_forces_in_kN_status_and_a_link_to_its_page()
    {
        var rows = new[] { Row("T1", 0.82, "Pass", 0, 123456), Row("B3", 1.07, "Fail", 98700, 0) };

        var cut = Render<MemberResultsTable>(p => p.Add(x => x.Rows, rows));

        var links = cut.FindAll("[data-testid=member-link]");
        Assert.Equal(2, links.Count);
        var t1 = links.Single(l => l.TextContent.Trim() == "T1");
        Assert.Equal($"/members/{rows[0].MemberId}", t1.GetAttribute("href"));
        var t1Row = t1.Closest("tr")!.TextContent;
        Assert.Contains("123", t1Row);
        Assert.Contains("ULS 1", t1Row);
        Assert.Contains("Compression 13.3", t1Row);
        Assert.Contains("Not submitted", t1Row); // the stored initial "Draft" reads as not submitted (docs/dev/review.md)
        var b3Row = links.Single(l => l.TextContent.Trim() == "B3").Closest("tr")!.TextContent;
        Assert.Contains("98.7", b3Row);
        Assert.Contains("ULS 2", b3Row);
        Assert.Contains("1.07", b3Row);
        Assert.Contains("Fail", b3Row);
    }
}
