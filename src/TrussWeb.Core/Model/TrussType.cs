namespace TrussWeb.Core.Model;

/// <summary>Truss layouts the <see cref="TrussGenerator"/> can build.</summary>
public enum TrussType
{
    /// <summary>Duo-pitch, verticals and diagonals running down towards mid-span from the top chord.</summary>
    PitchedHowe,

    /// <summary>Duo-pitch, verticals and diagonals running up towards the apex from the bottom chord.</summary>
    PitchedPratt,

    /// <summary>Duo-pitch W web pattern: classic Fink with 4 top-chord panels; a W zigzag for more.</summary>
    Fink,

    /// <summary>Parallel chords, verticals and diagonals running down towards mid-span from the top chord.</summary>
    ParallelPratt,

    /// <summary>Parallel chords, verticals and diagonals running up towards mid-span from the bottom chord.</summary>
    ParallelHowe,

    /// <summary>Parallel chords, diagonals only; top-chord nodes at the bottom panel mid-points.</summary>
    ParallelWarren,

    /// <summary>Single slope rising from left to right, verticals and diagonals.</summary>
    MonoPitch,
}
