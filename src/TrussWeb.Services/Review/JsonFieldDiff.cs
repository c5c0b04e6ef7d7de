using System.Text.Json.Nodes;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Review;

/// <summary>
/// Compares two stored JSON documents leaf by leaf (paths like <c>inputs.section.designation</c>,
/// <c>results.checks[2].utilization</c>). Values are the stored JSON text, so numbers keep their stored
/// round-trip form; nothing is recalculated or rounded.
/// </summary>
internal static class JsonFieldDiff
{
    public static IEnumerable<FieldChange> Compare(string prefix, string? atApproval, string? now, IReadOnlyCollection<string>? skip = null)
    {
        var before = Flatten(prefix, atApproval, skip);
        var after = Flatten(prefix, now, skip);
        foreach (var key in before.Keys.Union(after.Keys).Order(StringComparer.Ordinal).OrderBy(k => Order(before, after, k)))
        {
            var a = before.GetValueOrDefault(key);
            var b = after.GetValueOrDefault(key);
            if (!string.Equals(a, b, StringComparison.Ordinal))
            {
                yield return new FieldChange(key, a, b);
            }
        }
    }

    /// <summary>Keeps the document's own order (approved first, then fields only present now).</summary>
    private static int Order(Dictionary<string, string?> before, Dictionary<string, string?> after, string key)
    {
        var i = before.Keys.ToList().IndexOf(key);
        return i >= 0 ? i : before.Count + after.Keys.ToList().IndexOf(key);
    }

    private static Dictionary<string, string?> Flatten(string prefix, string? json, IReadOnlyCollection<string>? skip)
    {
        var result = new Dictionary<string, string?>(StringComparer.Ordinal);
        if (string.IsNullOrWhiteSpace(json))
        {
            return result;
        }

        Walk(prefix, JsonNode.Parse(json), result, skip ?? [], top: true);
        return result;
    }

    private static void Walk(string path, JsonNode? node, Dictionary<string, string?> into, IReadOnlyCollection<string> skip, bool top)
    {
        switch (node)
        {
            case JsonObject o:
                foreach (var (name, child) in o)
                {
                    if (top && skip.Contains(name))
                    {
                        continue;
                    }

                    Walk($"{path}.{name}", child, into, skip, top: false);
                }

                break;
            case JsonArray a:
                if (a.Count == 0)
                {
                    into[path] = "[]";
                }

                for (var i = 0; i < a.Count; i++)
                {
                    Walk($"{path}[{i}]", a[i], into, skip, top: false);
                }

                break;
            case JsonValue v when v.TryGetValue<string>(out var s):
                into[path] = s;
                break;
            case null:
                into[path] = null;
                break;
            default:
                into[path] = node.ToJsonString();
                break;
        }
    }
}
