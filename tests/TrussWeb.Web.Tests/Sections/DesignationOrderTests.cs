using TrussWeb.Web.Components.Sections;

namespace TrussWeb.Web.Tests.Sections;

public class DesignationOrderTests
{
    [Fact]
    public void Numbers_in_designations_compare_by_value()
    {
        string[] shuffled = ["L100x100x8", "L40x40x4", "CHS 114.3x3.6", "L45x45x4.5", "CHS 21.3x2", "L100x100x10", "L40x40x5"];

        var ordered = shuffled.Order(DesignationOrder.Instance).ToArray();

        Assert.Equal(["CHS 21.3x2", "CHS 114.3x3.6", "L40x40x4", "L40x40x5", "L45x45x4.5", "L100x100x8", "L100x100x10"], ordered);
    }
}
