namespace TrussWeb.Core.Validation;

/// <summary>An iteration (root bracketing, sizing rounds) did not settle within its cap.</summary>
public sealed class NonConvergenceException(string message) : Exception(message);
