namespace TrussWeb.Web.Security;

/// <summary>Sign-in paths and the return-URL rule: only paths inside this site are followed.</summary>
public static class ReturnUrls
{
    public const string SignInPath = "/account/signin";

    public const string SignOutPath = "/account/signout";

    public const string DeniedPath = "/account/denied";

    /// <summary>
    /// The URL when it is a local path ("/x", not "//host" or "/\host", no scheme), else "/".
    /// The sign-in and sign-out pages themselves are never returned to.
    /// </summary>
    public static string Safe(string? url)
    {
        if (string.IsNullOrWhiteSpace(url) || url[0] != '/')
        {
            return "/";
        }

        if (url.Length > 1 && (url[1] == '/' || url[1] == '\\'))
        {
            return "/";
        }

        if (url.Any(char.IsControl))
        {
            return "/";
        }

        var path = url.Split('?', '#')[0];
        if (path.StartsWith(SignInPath, StringComparison.OrdinalIgnoreCase) || path.StartsWith(SignOutPath, StringComparison.OrdinalIgnoreCase))
        {
            return "/";
        }

        return url;
    }
}
