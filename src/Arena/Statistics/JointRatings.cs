namespace Bramble.Arena.Statistics;

/// <summary>
/// Ratings of all players fitted together by maximum likelihood under the logistic model of paired
/// comparisons (R. A. Bradley and M. E. Terry, "Rank analysis of incomplete block designs I",
/// Biometrika 39, 1952) on the Elo scale (A. Elo, <i>The Rating of Chessplayers</i>, 1978): player i
/// beats j with probability 1 / (1 + 10^(−(r_i − r_j)/400)). Every game counts, whoever it was
/// against, so a player who met only strong opponents is not rated as if it had met the field.
/// <list type="bullet">
/// <item>Anchor: the ratings average 0 (only differences are identified by the games).</item>
/// <item>Fit: Newton's method on the log-likelihood, the step solved with the pseudo-inverse of the
/// information matrix (its null space is the common shift the anchor removes).</item>
/// <item>Intervals: the sandwich (cluster-robust) covariance H⁺ B H⁺, H the observed information
/// and B the sum over clusters of the outer products of their score vectors (P. J. Huber, "The
/// behavior of maximum likelihood estimates under nonstandard conditions", 1967; clusters as in
/// K.-Y. Liang and S. L. Zeger, Biometrika 73, 1986). A seat-swapped pair is one cluster, so the
/// correlation between its two games — the position often decides both — is accounted for; with
/// independent games it equals the usual inverse-information covariance at the estimate. 95%
/// intervals are r ± 1.96 standard errors.</item>
/// <item>When some group of players won every game against the rest, no finite estimate exists
/// (E. Zermelo 1929; L. R. Ford 1957): the fit then adds, for every player, one virtual win and
/// one virtual loss against a virtual opponent rated 0, which keeps all ratings finite, and says
/// so (<see cref="Regularised"/>).</item>
/// </list>
/// </summary>
public sealed class JointRatings
{
    /// <summary>Elo points per natural-log unit of the odds: 400 / ln 10.</summary>
    public const double Scale = 400.0 / 2.302585092994046;

    private const double Z95 = 1.959963984540054;

    private JointRatings(double[] ratings, double[,] covariance, bool regularised, int iterations)
    {
        Ratings = ratings;
        Covariance = covariance;
        Regularised = regularised;
        Iterations = iterations;
    }

    /// <summary>Ratings in Elo points, averaging 0, by player index.</summary>
    public IReadOnlyList<double> Ratings { get; }

    /// <summary>Their covariance in Elo points², cluster-robust.</summary>
    public double[,] Covariance { get; }

    /// <summary>True when the virtual games were needed to keep the ratings finite.</summary>
    public bool Regularised { get; }

    public int Iterations { get; }

    public int Count => Ratings.Count;

    public double StandardError(int i) => Math.Sqrt(Math.Max(0, Covariance[i, i]));

    public (double Low, double High) Interval(int i) => (Ratings[i] - Z95 * StandardError(i), Ratings[i] + Z95 * StandardError(i));

    /// <summary>
    /// Likelihood of superiority: the probability, under the normal approximation of the estimate,
    /// that player i is truly stronger than j, Φ((r_i − r_j) / sd(r_i − r_j)) with the joint covariance.
    /// </summary>
    public double Superiority(int i, int j)
    {
        var variance = Covariance[i, i] + Covariance[j, j] - 2 * Covariance[i, j];
        var difference = Ratings[i] - Ratings[j];
        if (variance <= 1e-12) return difference > 0 ? 1 : difference < 0 ? 0 : 0.5;
        return NormalDistribution.Cdf(difference / Math.Sqrt(variance));
    }

    /// <summary>Fits <paramref name="players"/> ratings to <paramref name="games"/> (indices below <paramref name="players"/>).</summary>
    public static JointRatings Fit(int players, IReadOnlyList<PairedGame> games)
    {
        if (players == 0) return new JointRatings([], new double[0, 0], false, 0);
        var regularised = !Connected(players, games);
        var theta = new double[players];
        var iterations = 0;
        for (; iterations < 100; iterations++)
        {
            var (gradient, information) = Derivatives(players, games, theta, regularised);
            var step = Multiply(Inverse(information, regularised), gradient);
            // Newton from 0 converges for this concave likelihood; the cap only guards the first
            // steps when one player won nearly everything.
            var largest = step.Max(Math.Abs);
            if (largest > 2) for (var i = 0; i < players; i++) step[i] *= 2 / largest;
            for (var i = 0; i < players; i++) theta[i] += step[i];
            if (!regularised) Centre(theta);
            if (largest < 1e-10) break;
        }
        var (_, h) = Derivatives(players, games, theta, regularised);
        var hPlus = Inverse(h, regularised);
        var meat = ClusterMeat(players, games, theta, regularised);
        var covariance = Multiply(Multiply(hPlus, meat), hPlus);
        if (regularised)
        {
            // The virtual opponent fixes the scale's origin; the ratings are still shown about their
            // mean, with the covariance of the centred ratings, P C P for P = I − J/n.
            Centre(theta);
            var centring = new double[players, players];
            for (var i = 0; i < players; i++)
                for (var j = 0; j < players; j++)
                    centring[i, j] = (i == j ? 1 : 0) - 1.0 / players;
            covariance = Multiply(Multiply(centring, covariance), centring);
        }
        var ratings = theta.Select(t => t * Scale).ToArray();
        var scaled = new double[players, players];
        for (var i = 0; i < players; i++)
            for (var j = 0; j < players; j++)
                scaled[i, j] = covariance[i, j] * Scale * Scale;
        return new JointRatings(ratings, scaled, regularised, iterations);
    }

    private static double Win(double difference) => 1.0 / (1.0 + Math.Exp(-difference));

    /// <summary>The log-likelihood's gradient and the observed information (minus its Hessian) at θ.</summary>
    private static (double[] Gradient, double[,] Information) Derivatives(int n, IReadOnlyList<PairedGame> games, double[] theta, bool regularised)
    {
        var gradient = new double[n];
        var information = new double[n, n];
        foreach (var g in games)
        {
            var p = Win(theta[g.A] - theta[g.B]);
            var residual = g.ScoreA - p;
            gradient[g.A] += residual;
            gradient[g.B] -= residual;
            var w = p * (1 - p);
            information[g.A, g.A] += w;
            information[g.B, g.B] += w;
            information[g.A, g.B] -= w;
            information[g.B, g.A] -= w;
        }
        if (regularised)
        {
            for (var i = 0; i < n; i++)
            {
                // One win and one loss against a virtual player rated 0.
                var p = Win(theta[i]);
                gradient[i] += 1 - 2 * p;
                information[i, i] += 2 * p * (1 - p);
            }
        }
        return (gradient, information);
    }

    /// <summary>B = Σ over clusters of s_c s_cᵀ, s_c the sum of the score vectors of the cluster's games.</summary>
    private static double[,] ClusterMeat(int n, IReadOnlyList<PairedGame> games, double[] theta, bool regularised)
    {
        var meat = new double[n, n];
        foreach (var cluster in games.GroupBy(g => g.Cluster))
        {
            var s = new double[n];
            foreach (var g in cluster)
            {
                var residual = g.ScoreA - Win(theta[g.A] - theta[g.B]);
                s[g.A] += residual;
                s[g.B] -= residual;
            }
            for (var i = 0; i < n; i++)
                for (var j = 0; j < n; j++)
                    meat[i, j] += s[i] * s[j];
        }
        if (regularised)
        {
            for (var i = 0; i < n; i++)
            {
                // The virtual games as independent samples, each of the two with its own residual.
                var p = Win(theta[i]);
                meat[i, i] += (1 - p) * (1 - p) + p * p;
            }
        }
        return meat;
    }

    /// <summary>
    /// True when the "beat" graph is strongly connected (every player beat, directly or through
    /// others, every other): then the maximum-likelihood estimate exists and is unique (Ford 1957).
    /// </summary>
    private static bool Connected(int n, IReadOnlyList<PairedGame> games)
    {
        var beat = new List<int>[n];
        var beatenBy = new List<int>[n];
        for (var i = 0; i < n; i++) { beat[i] = []; beatenBy[i] = []; }
        foreach (var g in games)
        {
            var (winner, loser) = g.ScoreA >= 1 ? (g.A, g.B) : g.ScoreA <= 0 ? (g.B, g.A) : (-1, -1);
            if (winner < 0)
            {
                beat[g.A].Add(g.B); beatenBy[g.B].Add(g.A);
                beat[g.B].Add(g.A); beatenBy[g.A].Add(g.B);
                continue;
            }
            beat[winner].Add(loser);
            beatenBy[loser].Add(winner);
        }
        return Reaches(beat, n) && Reaches(beatenBy, n);
    }

    private static bool Reaches(List<int>[] edges, int n)
    {
        var seen = new bool[n];
        var stack = new Stack<int>([0]);
        seen[0] = true;
        var count = 1;
        while (stack.Count > 0)
            foreach (var next in edges[stack.Pop()])
                if (!seen[next]) { seen[next] = true; count++; stack.Push(next); }
        return count == n;
    }

    private static void Centre(double[] theta)
    {
        var mean = theta.Average();
        for (var i = 0; i < theta.Length; i++) theta[i] -= mean;
    }

    /// <summary>
    /// The Moore–Penrose inverse of a symmetric matrix whose null space is spanned by the all-ones
    /// vector (an information matrix of paired comparisons on a connected design):
    /// H⁺ = (H + J/n)⁻¹ − J/n, J the all-ones matrix; with the virtual games H is invertible, and
    /// its plain inverse is taken.
    /// </summary>
    private static double[,] Inverse(double[,] h, bool invertible)
    {
        if (invertible) return Invert(h);
        var n = h.GetLength(0);
        var a = new double[n, n];
        for (var i = 0; i < n; i++)
            for (var j = 0; j < n; j++)
                a[i, j] = h[i, j] + 1.0 / n;
        var inverse = Invert(a);
        for (var i = 0; i < n; i++)
            for (var j = 0; j < n; j++)
                inverse[i, j] -= 1.0 / n;
        return inverse;
    }

    /// <summary>Gauss–Jordan elimination with partial pivoting (a handful of players: size is no concern).</summary>
    private static double[,] Invert(double[,] matrix)
    {
        var n = matrix.GetLength(0);
        var a = (double[,])matrix.Clone();
        var inverse = new double[n, n];
        for (var i = 0; i < n; i++) inverse[i, i] = 1;
        for (var column = 0; column < n; column++)
        {
            var pivot = column;
            for (var row = column + 1; row < n; row++)
                if (Math.Abs(a[row, column]) > Math.Abs(a[pivot, column])) pivot = row;
            if (Math.Abs(a[pivot, column]) < 1e-300) throw new InvalidOperationException("the information matrix is singular");
            Swap(a, column, pivot);
            Swap(inverse, column, pivot);
            var scale = 1.0 / a[column, column];
            for (var j = 0; j < n; j++) { a[column, j] *= scale; inverse[column, j] *= scale; }
            for (var row = 0; row < n; row++)
            {
                if (row == column || a[row, column] == 0) continue;
                var factor = a[row, column];
                for (var j = 0; j < n; j++) { a[row, j] -= factor * a[column, j]; inverse[row, j] -= factor * inverse[column, j]; }
            }
        }
        return inverse;
    }

    private static void Swap(double[,] m, int r1, int r2)
    {
        if (r1 == r2) return;
        for (var j = 0; j < m.GetLength(1); j++) (m[r1, j], m[r2, j]) = (m[r2, j], m[r1, j]);
    }

    private static double[] Multiply(double[,] m, double[] v)
    {
        var n = v.Length;
        var result = new double[n];
        for (var i = 0; i < n; i++)
            for (var j = 0; j < n; j++)
                result[i] += m[i, j] * v[j];
        return result;
    }

    private static double[,] Multiply(double[,] a, double[,] b)
    {
        var n = a.GetLength(0);
        var result = new double[n, n];
        for (var i = 0; i < n; i++)
            for (var k = 0; k < n; k++)
                for (var j = 0; j < n; j++)
                    result[i, j] += a[i, k] * b[k, j];
        return result;
    }
}
