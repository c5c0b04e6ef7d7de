using System.Net;
using Microsoft.AspNetCore.Mvc.Testing;
using TrussWeb.Core;

namespace TrussWeb.Web.Tests.Pages;

public class AppSmokeTests : IClassFixture<WebApplicationFactory<Program>>
{
    private readonly WebApplicationFactory<Program> _factory;

    public AppSmokeTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Theory]
    [InlineData("/")]
    [InlineData("/sections")]
    public async Task Page_answers_200_with_the_caution_in_the_footer(string path)
    {
        using var client = _factory.CreateClient();

        using var response = await client.GetAsync(path);
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains(WebUtility.HtmlEncode(Caution.Text), html);
    }

    [Fact]
    public async Task Sections_page_is_prerendered_with_catalogue_rows()
    {
        using var client = _factory.CreateClient();

        var html = await client.GetStringAsync("/sections");

        Assert.Contains("data-testid=\"catalogue-row\"", html);
        Assert.Contains("L100x100x10", html);
    }
}
