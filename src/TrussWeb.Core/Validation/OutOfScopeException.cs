namespace TrussWeb.Core.Validation;

/// <summary>The input is valid but outside what the method covers (e.g. a section family a clause does not address).</summary>
public sealed class OutOfScopeException(string message) : Exception(message);
