namespace TrussWeb.Core.Records;

/// <summary>
/// One line of a calculation record: what was computed, how, with which values, and under which
/// provision. The code that computes <see cref="Value"/> writes the step at the same moment, so the
/// page, the PDF and the API all show the number that was actually used.
/// </summary>
/// <param name="Symbol">Symbol of the quantity, e.g. "Fex".</param>
/// <param name="Description">Words a checker reads, e.g. "Elastic buckling stress about x-x".</param>
/// <param name="Expression">The formula in symbols, e.g. "π²E / (KxLx/rx)²".</param>
/// <param name="Substituted">The formula with the values put in (display precision, see <see cref="Display"/>).</param>
/// <param name="Value">The unrounded result, in <paramref name="Unit"/>.</param>
/// <param name="Unit">Display unit of <paramref name="Value"/> ("MPa", "mm", "kN", "" for pure numbers).</param>
/// <param name="Reference">Standard and clause in number and words, e.g. "SANS 10162-1 cl. 13.3.2 (elastic buckling stress)".</param>
public sealed record CalcStep(
    string Symbol,
    string Description,
    string Expression,
    string Substituted,
    double Value,
    string Unit,
    string Reference);
