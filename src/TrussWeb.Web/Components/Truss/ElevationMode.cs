namespace TrussWeb.Web.Components.Truss;

/// <summary>What the truss elevation shows on its members.</summary>
public enum ElevationMode
{
    /// <summary>Members coloured by group, labelled with their marks.</summary>
    Geometry,

    /// <summary>Axial force of one combination, or the envelope: tension and compression by colour and by a T/C label with kN.</summary>
    AxialForce,

    /// <summary>Design utilization of each member on a colour scale, with its value.</summary>
    Utilization,
}
