using System.Net;
using TrussWeb.Api.Tests.Support;

namespace TrussWeb.Api.Tests;

/// <summary>Sections, grades and standards over HTTP.</summary>
public sealed class SectionContractTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    [Fact]
    public async Task Sections_filter_by_kind_designation_and_size()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Checker, TrussWeb.Services.Contracts.ApiTokenScopes.Read)).Token);
        var all = await (await client.GetAsync("/api/v1/sections")).JsonAsync();
        var angles = await (await client.GetAsync("/api/v1/sections?kind=Angle")).JsonAsync();
        Assert.True(all.GetArrayLength() > angles.GetArrayLength() && angles.GetArrayLength() > 10);
        Assert.All(angles.EnumerateArray(), s => Assert.Equal("Angle", s.GetProperty("family").GetString()));
        var l70 = await (await client.GetAsync("/api/v1/sections?kind=Angle&designation=L70x70")).JsonAsync();
        Assert.All(l70.EnumerateArray(), s => Assert.Contains("L70x70", s.GetProperty("designation").GetString(), StringComparison.Ordinal));
        Assert.NotEmpty(l70.EnumerateArray());
        var sized = await (await client.GetAsync("/api/v1/sections?kind=CircularHollow&minSizeMm=100&maxSizeMm=150")).JsonAsync();
        Assert.NotEmpty(sized.EnumerateArray());
        Assert.All(sized.EnumerateArray(), s => Assert.InRange(s.GetProperty("outsideDiameterMm").GetDouble(), 100, 150));
    }

    [Fact]
    public async Task One_section_has_its_dimensions_and_computed_properties()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Checker)).Token);
        var response = await client.GetAsync("/api/v1/sections/L70x70x6");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var section = await response.JsonAsync();
        // Source: seed-data/sections/angles-en10056.csv, row L70x70x6 (70, 70, 6).
        Assert.Equal(70, section.GetProperty("dimensions").GetProperty("d").GetDouble());
        Assert.Equal(6, section.GetProperty("dimensions").GetProperty("t").GetDouble());
        var area = section.GetProperty("properties").EnumerateArray().First(p => p.GetProperty("symbol").GetString() == "A").GetProperty("value").GetDouble();
        // Common practice: a 70x70x6 angle is about (70 + 70 − 6) × 6 = 804 mm² plus its fillet, less its toe roundings (EN 10056-1 lists 813 mm², from memory).
        Assert.InRange(area, 800, 830);
        await (await client.GetAsync("/api/v1/sections/L1x1x1")).ProblemAsync(404);
    }

    [Fact]
    public async Task Grades_and_standards_are_listed()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Checker)).Token);
        var grades = await (await client.GetAsync("/api/v1/grades")).JsonAsync();
        Assert.Contains(grades.EnumerateArray(), g => g.GetProperty("name").GetString() == "S355JR");
        var standards = await (await client.GetAsync("/api/v1/standards")).JsonAsync();
        Assert.Contains(standards.EnumerateArray(), s => s.GetProperty("code").GetString() == "SANS 10162-1");
    }
}
