using MathNet.Numerics.LinearAlgebra;
using TrussWeb.Core.Analysis;

namespace TrussWeb.Core.Tests.Analysis;

public class BandedLdltTests
{
    [Theory]
    [InlineData(1, 30, 3)]
    [InlineData(2, 50, 7)]
    [InlineData(3, 12, 11)]
    public void Solves_like_a_dense_Cholesky_on_a_random_banded_SPD_matrix(int seed, int n, int band)
    {
        var rng = new Random(seed);
        var dense = Matrix<double>.Build.Dense(n, n);
        var ldlt = new BandedLdlt(n, band);
        for (var i = 0; i < n; i++)
        {
            for (var j = Math.Max(0, i - band); j < i; j++)
            {
                var v = rng.NextDouble() - 0.5;
                dense[i, j] = v;
                dense[j, i] = v;
                ldlt.Add(i, j, v);
            }

            // Diagonally dominant: symmetric positive definite.
            dense[i, i] = band + 1 + rng.NextDouble();
            ldlt.Add(i, i, dense[i, i]);
        }

        var b = Vector<double>.Build.Dense(n, _ => rng.NextDouble() - 0.5);
        var expected = dense.Cholesky().Solve(b);
        ldlt.Factorize();
        var x = ldlt.Solve(b.ToArray());

        // Reference: MathNet dense Cholesky; agreement to round-off.
        for (var i = 0; i < n; i++)
        {
            Support.AssertClose.Relative(expected[i], x[i], 1e-10, $"x{i}", absTol: 1e-12);
        }

        Assert.Empty(ldlt.ZeroPivots);
    }

    [Fact]
    public void Singular_row_is_reported_as_a_zero_pivot_and_solved_as_fixed()
    {
        // [[1, 1], [1, 1]] is singular: the second pivot is 1 − 1·1 = 0.
        var ldlt = new BandedLdlt(2, 1);
        ldlt.Add(0, 0, 1);
        ldlt.Add(1, 0, 1);
        ldlt.Add(1, 1, 1);
        ldlt.Factorize();
        Assert.Equal([1], ldlt.ZeroPivots);
        var x = ldlt.Solve([2.0, 2.0]);
        Assert.Equal([2.0, 0.0], x);
    }
}
