using TrussWeb.Core.Design;
using TrussWeb.Core.Standards.Sans10162;

namespace TrussWeb.Services.Design;

/// <summary>The design standards a project can use, by code.</summary>
internal static class Standards
{
    public static IReadOnlyList<IDesignStandard> All { get; } = [new Sans10162Standard()];

    public static IDesignStandard? Find(string? code) =>
        All.FirstOrDefault(s => string.Equals(s.Code, code?.Trim(), StringComparison.OrdinalIgnoreCase));
}
