namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Interconnector layout of a built-up member (SANS 10162-1 cl. 19) as checked or proposed.
/// </summary>
/// <param name="MemberLength">Length along which the connectors are set out (node to node), mm.</param>
/// <param name="IntermediateCount">Number of intermediate connectors n; spaces = n + 1.</param>
/// <param name="Spacing">Connector spacing a used in the checks, mm.</param>
/// <param name="MaxSpacing">a_max = r_min (KL/r)governing, mm.</param>
/// <param name="GoverningSlenderness">(KL/r) of the whole member, the larger of x-x and y-y, dimensionless.</param>
/// <param name="ComponentRadius">r_min of one component (r_i), mm.</param>
/// <param name="Proposed">True when the layout was proposed by TrussWeb (no count or spacing given).</param>
public sealed record ConnectorSpacing(
    double MemberLength,
    int IntermediateCount,
    double Spacing,
    double MaxSpacing,
    double GoverningSlenderness,
    double ComponentRadius,
    bool Proposed)
{
    /// <summary>Component slenderness between connectors a/r_i, dimensionless.</summary>
    public double ComponentSlenderness => Spacing / ComponentRadius;
}
