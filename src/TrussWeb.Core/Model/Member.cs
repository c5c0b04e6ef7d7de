namespace TrussWeb.Core.Model;

/// <summary>A pin-ended bar between two nodes, carrying axial force only.</summary>
/// <param name="Id">Unique member id, used as its mark on drawings and reports, e.g. "TC1", "D3".</param>
/// <param name="StartNode">Id of the start node.</param>
/// <param name="EndNode">Id of the end node.</param>
/// <param name="Group">Name of the <see cref="MemberGroup"/> it belongs to (gives its role: chord or web).</param>
public sealed record Member(string Id, string StartNode, string EndNode, string Group);
