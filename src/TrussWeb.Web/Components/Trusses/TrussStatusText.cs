using TrussWeb.Core.Records;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Maps the status words the services return ("Pass", "Fail", "OutOfScope", "NotDesigned") to Core's status.</summary>
public static class TrussStatusText
{
    /// <summary>The Core status, or null when there is no design ("NotDesigned" or unknown).</summary>
    public static CheckStatus? ToStatus(string? status) =>
        status is not null && Enum.TryParse<CheckStatus>(status, ignoreCase: true, out var s) ? s : null;

    public static string Words(string? status) => status switch
    {
        "Pass" => "Pass",
        "Fail" => "Fail",
        "OutOfScope" => "Out of scope",
        _ => "Not designed",
    };
}
