namespace TrussWeb.Core.Records;

/// <summary>
/// The ordered steps of one check (or of a whole member design), plus free-text notes that state
/// assumptions ("larger of in-plane and out-of-plane lengths used for both principal axes").
/// Checks take a <c>CalcRecord?</c>: pass <c>null</c> on hot paths (sizing), and the
/// <c>record?.Add(...)</c> calls skip building their strings altogether.
/// </summary>
public sealed class CalcRecord
{
    private readonly List<CalcStep> _steps = [];
    private readonly List<string> _notes = [];

    public CalcRecord(string title) => Title = title;

    /// <summary>Heading of the record, e.g. "Compression resistance (SANS 10162-1 cl. 13.3)".</summary>
    public string Title { get; }

    public IReadOnlyList<CalcStep> Steps => _steps;

    public IReadOnlyList<string> Notes => _notes;

    public CalcRecord Add(CalcStep step)
    {
        ArgumentNullException.ThrowIfNull(step);
        _steps.Add(step);
        return this;
    }

    public CalcRecord Add(string symbol, string description, string expression, string substituted,
        double value, string unit, string reference)
        => Add(new CalcStep(symbol, description, expression, substituted, value, unit, reference));

    public CalcRecord Note(string note)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(note);
        _notes.Add(note);
        return this;
    }

    /// <summary>Appends every step and note of <paramref name="other"/> (used to build a member's record from its checks).</summary>
    public CalcRecord Append(CalcRecord other)
    {
        ArgumentNullException.ThrowIfNull(other);
        _steps.AddRange(other._steps);
        _notes.AddRange(other._notes);
        return this;
    }

    /// <summary>The last step with this symbol, or null.</summary>
    public CalcStep? Find(string symbol)
    {
        for (var i = _steps.Count - 1; i >= 0; i--)
        {
            if (_steps[i].Symbol == symbol)
            {
                return _steps[i];
            }
        }

        return null;
    }
}
