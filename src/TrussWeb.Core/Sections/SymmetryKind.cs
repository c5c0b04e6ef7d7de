namespace TrussWeb.Core.Sections;

/// <summary>Symmetry of a cross-section, which decides the elastic buckling formula (CSA S16 / SANS 10162-1 cl. 13.3.2).</summary>
public enum SymmetryKind
{
    /// <summary>Two axes of symmetry (CHS, SHS/RHS, equal-leg cruciform): shear centre at the centroid.</summary>
    Doubly,

    /// <summary>One axis of symmetry, y-y (double angle, tee, equal single angle about its principal axes).</summary>
    Singly,

    /// <summary>No axis of symmetry (unequal single angle): the full cubic.</summary>
    Asymmetric,
}
