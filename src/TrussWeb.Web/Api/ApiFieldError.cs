namespace TrussWeb.Web.Api;

/// <summary>One refused input in a problem: the field (JSON path or input property), what is wrong, and where known the value and the limit.</summary>
public sealed record ApiFieldError(string Field, string Message, string? Value = null, string? Limit = null);
