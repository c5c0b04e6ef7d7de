using TrussWeb.Web.Security;

namespace TrussWeb.Web.Tests.Http;

public class ReturnUrlsTests
{
    [Theory]
    [InlineData("/projects", "/projects")]
    [InlineData("/trusses/1?tab=nodes", "/trusses/1?tab=nodes")]
    [InlineData(null, "/")]
    [InlineData("", "/")]
    [InlineData("projects", "/")]
    [InlineData("https://elsewhere.example/", "/")]
    [InlineData("//elsewhere.example/", "/")]
    [InlineData("/\\elsewhere.example", "/")]
    [InlineData("/account/signin?returnUrl=%2F", "/")]
    [InlineData("/account/signout", "/")]
    public void Only_local_paths_are_followed(string? url, string expected) => Assert.Equal(expected, ReturnUrls.Safe(url));
}
