namespace TrussWeb.Core.Analysis;

/// <summary>
/// LDLᵀ factorisation of a symmetric banded matrix, written here because MathNet.Numerics 5.0.0 has
/// dense factorisations and sparse storage but no sparse or banded direct solver (2026-12-01).
/// Storage: row i holds columns i−b … i (b = half-bandwidth) of the lower triangle.
/// No pivoting: the truss stiffness matrix is symmetric positive semi-definite, and a pivot that is
/// zero or negative relative to the row's original diagonal means that degree of freedom has no
/// stiffness (a mechanism). Such DOFs are recorded in <see cref="ZeroPivots"/>, taken as fixed
/// (row and column removed) and the factorisation continues, so that every mechanism is found in one
/// pass and no NaN is produced.
/// Cost: n·b² to factor, n·b per solve; factor once, solve many load vectors.
/// </summary>
public sealed class BandedLdlt
{
    /// <summary>
    /// A pivot below this fraction of the row's original diagonal is taken as zero. 2026-12-01: round-off
    /// in a stable truss leaves pivots near 1 relative; a true mechanism leaves ~1e-16. 1e-9 flags
    /// members within about 3e-5 rad of collinear with no other support (practically a mechanism too).
    /// </summary>
    public const double RelativePivotTolerance = 1e-9;

    private readonly int _n;
    private readonly int _b;
    private readonly double[][] _l;
    private readonly double[] _d;
    private readonly bool[] _fixed;
    private readonly List<int> _zeroPivots = [];

    /// <summary>Starts an empty n × n matrix of half-bandwidth b.</summary>
    public BandedLdlt(int size, int halfBandwidth)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(size);
        ArgumentOutOfRangeException.ThrowIfNegative(halfBandwidth);
        _n = size;
        _b = Math.Min(halfBandwidth, Math.Max(0, size - 1));
        _l = new double[size][];
        for (var i = 0; i < size; i++)
        {
            _l[i] = new double[_b + 1];
        }

        _d = new double[size];
        _fixed = new bool[size];
    }

    public int Size => _n;

    public int HalfBandwidth => _b;

    /// <summary>True once <see cref="Factorize"/> has run.</summary>
    public bool IsFactorized { get; private set; }

    /// <summary>DOFs (in this matrix's numbering) whose pivot was zero: no stiffness.</summary>
    public IReadOnlyList<int> ZeroPivots => _zeroPivots;

    /// <summary>Adds <paramref name="value"/> to entry (i, j) and its mirror; |i − j| must be within the band.</summary>
    public void Add(int i, int j, double value)
    {
        if (i < j)
        {
            (i, j) = (j, i);
        }

        var offset = j - i + _b;
        if (offset < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(j), $"entry ({i}, {j}) lies outside the half-bandwidth {_b}");
        }

        _l[i][offset] += value;
    }

    /// <summary>Marks a DOF as prescribed zero (a support); its row and column are left out.</summary>
    public void Fix(int i) => _fixed[i] = true;

    /// <summary>Entry (i, j) as assembled (before factorisation).</summary>
    public double Get(int i, int j)
    {
        if (i < j)
        {
            (i, j) = (j, i);
        }

        var offset = j - i + _b;
        return offset < 0 ? 0 : _l[i][offset];
    }

    /// <summary>Factors in place: A = L D Lᵀ over the free DOFs.</summary>
    public void Factorize()
    {
        if (IsFactorized)
        {
            throw new InvalidOperationException("already factorised");
        }

        var b = _b;
        for (var i = 0; i < _n; i++)
        {
            var row = _l[i];
            var diag = row[b];
            if (_fixed[i])
            {
                Array.Clear(row);
                _d[i] = 1;
                continue;
            }

            var jmin = Math.Max(0, i - b);

            // row[k - i + b] holds L(i,k) once computed; first overwrite with L(i,k)·D(k) partial sums.
            for (var j = jmin; j < i; j++)
            {
                var oj = j - i + b;
                if (_fixed[j])
                {
                    row[oj] = 0;
                    continue;
                }

                var rowJ = _l[j];
                var s = row[oj];
                var kmin = Math.Max(jmin, j - b);
                for (var k = kmin; k < j; k++)
                {
                    s -= row[k - i + b] * _d[k] * rowJ[k - j + b];
                }

                row[oj] = s / _d[j];
            }

            var dsum = diag;
            for (var k = jmin; k < i; k++)
            {
                var lik = row[k - i + b];
                dsum -= lik * lik * _d[k];
            }

            if (!(diag > 0) || !(dsum > RelativePivotTolerance * diag))
            {
                _zeroPivots.Add(i);
                _fixed[i] = true;
                Array.Clear(row);
                _d[i] = 1;
            }
            else
            {
                _d[i] = dsum;
            }
        }

        IsFactorized = true;
    }

    /// <summary>Solves A x = rhs for one load vector (fixed DOFs return 0). The factorisation is reused.</summary>
    public double[] Solve(ReadOnlySpan<double> rhs)
    {
        if (!IsFactorized)
        {
            throw new InvalidOperationException("call Factorize first");
        }

        if (rhs.Length != _n)
        {
            throw new ArgumentException($"right-hand side has {rhs.Length} entries, expected {_n}", nameof(rhs));
        }

        var b = _b;
        var x = new double[_n];
        for (var i = 0; i < _n; i++)
        {
            if (_fixed[i])
            {
                continue;
            }

            var row = _l[i];
            var s = rhs[i];
            for (var k = Math.Max(0, i - b); k < i; k++)
            {
                s -= row[k - i + b] * x[k];
            }

            x[i] = s;
        }

        for (var i = 0; i < _n; i++)
        {
            x[i] = _fixed[i] ? 0 : x[i] / _d[i];
        }

        for (var i = _n - 1; i >= 0; i--)
        {
            if (_fixed[i])
            {
                x[i] = 0;
                continue;
            }

            var s = x[i];
            var mmax = Math.Min(_n - 1, i + b);
            for (var m = i + 1; m <= mmax; m++)
            {
                s -= _l[m][i - m + b] * x[m];
            }

            x[i] = s;
        }

        return x;
    }
}
