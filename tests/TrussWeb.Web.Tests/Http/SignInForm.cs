using System.Net;
using System.Text.RegularExpressions;

namespace TrussWeb.Web.Tests.Http;

/// <summary>Drives the real sign-in form: GET the page, read the antiforgery token, POST the fields.</summary>
public static partial class SignInForm
{
    public static async Task<HttpResponseMessage> PostAsync(HttpClient client, string email, string password, string? returnUrl = null)
    {
        var url = "/account/signin" + (returnUrl is null ? string.Empty : "?returnUrl=" + Uri.EscapeDataString(returnUrl));
        var page = await client.GetStringAsync(url);
        var token = Token().Match(page);
        Assert.True(token.Success, "the sign-in page has no antiforgery token");
        var form = new FormUrlEncodedContent(new Dictionary<string, string>
        {
            ["__RequestVerificationToken"] = WebUtility.HtmlDecode(token.Groups[1].Value),
            ["_handler"] = "signin",
            ["Input.Email"] = email,
            ["Input.Password"] = password,
        });
        return await client.PostAsync(url, form);
    }

    /// <summary>Token of the first antiforgery field on a page.</summary>
    public static string TokenOf(string html)
    {
        var token = Token().Match(html);
        Assert.True(token.Success, "no antiforgery token on the page");
        return WebUtility.HtmlDecode(token.Groups[1].Value);
    }

    [GeneratedRegex("name=\"__RequestVerificationToken\"[^>]*value=\"([^\"]+)\"")]
    private static partial Regex Token();
}
