using TrussWeb.Core.Design;

namespace TrussWeb.Core.Sizing;

/// <summary>One member of a group to be sized: its mark, lengths, envelope forces and details (everything but the section and material).</summary>
public sealed record GroupMemberDemand(
    string Mark,
    EffectiveLengths Lengths,
    MemberForces Forces,
    TensionConnection? Connection = null,
    ConnectorLayout? Connectors = null,
    DesignOptions? Options = null);
