using System.Reflection;
using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Components;

namespace TrussWeb.Web.Tests.Http;

/// <summary>Every @page route of the app, by reflection, with parameters filled with sample values.</summary>
public static partial class RouteCatalog
{
    public static IReadOnlyList<string> Templates() =>
        typeof(Program).Assembly.GetTypes()
            .Where(t => typeof(IComponent).IsAssignableFrom(t))
            .SelectMany(t => t.GetCustomAttributes<RouteAttribute>())
            .Select(r => r.Template)
            .Distinct(StringComparer.OrdinalIgnoreCase)
            .Order(StringComparer.Ordinal)
            .ToList();

    /// <summary>"/trusses/{id:guid}" → "/trusses/&lt;new guid&gt;"; int → 1; others → "sample"; optional/catch-all parameters dropped.</summary>
    public static string Sample(string template) =>
        Parameter().Replace(template, m =>
        {
            var body = m.Groups[1].Value;
            if (body.StartsWith('*') || body.EndsWith('?'))
            {
                return string.Empty;
            }

            return body.Contains(":guid", StringComparison.OrdinalIgnoreCase) ? Guid.NewGuid().ToString()
                : body.Contains(":int", StringComparison.OrdinalIgnoreCase) || body.Contains(":long", StringComparison.OrdinalIgnoreCase) ? "1"
                : "sample";
        });

    [GeneratedRegex(@"\{([^}]+)\}")]
    private static partial Regex Parameter();
}
