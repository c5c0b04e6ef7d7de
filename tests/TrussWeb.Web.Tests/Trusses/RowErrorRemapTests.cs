using TrussWeb.Web.Components.Trusses;

namespace TrussWeb.Web.Tests.Trusses;

public class RowErrorRemapTests
{
    [Theory]
    [InlineData("Rows[0].XMm", "Rows[4].XMm")]
    [InlineData("Rows[1].Limits.MinThicknessMm", "Rows[7].Limits.MinThicknessMm")]
    [InlineData("WindCases[1].Id", "WindCases[7].Id")]
    [InlineData("Rows[5].XMm", "Rows[5].XMm")]
    [InlineData("CoveringKPa", "CoveringKPa")]
    public void Field_of_a_sent_row_is_moved_to_the_row_on_screen(string sent, string shown) =>
        Assert.Equal(shown, TableEditorBase.Remap(sent, [4, 7]));
}
