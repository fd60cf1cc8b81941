using System.Numerics;
using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// The sign-expansion rule for blue-red stalks: read from the ground up, each edge before the
/// first change of colour counts ±1, and from the change on the k-th edge counts ±2^-k (blue +,
/// red −). Putting a stalk under a number x is the ordinal sum stalk:x, whose sign expansion is
/// the stalk's followed by x's; so one pass over a chain of edges and a few operations on x
/// value the whole chain, however big the dyadic gets (see <see cref="Under"/>).
/// </summary>
public static class SignExpansion
{
    /// <summary>The value of a blue-red stalk, colours from the ground up.</summary>
    public static Dyadic Stalk(IEnumerable<EdgeColour> bottomUp) =>
        Under(bottomUp.Select(c => c == EdgeColour.Green
            ? throw new ArgumentException("a sign expansion has only blue and red edges")
            : (sbyte)c.Sign()).ToArray(), Dyadic.Zero);

    /// <summary>
    /// The number a chain of edges (signs +1 blue, −1 red, from the bottom up) is worth when it
    /// carries a blue-red part of value <paramref name="carried"/>: the ordinal sum chain:carried,
    /// whose sign expansion is the chain's followed by x's. When the chain changes colour, its
    /// last L signs sit in the halving part, so x's expansion lands at positions L+1, L+2, … and
    /// adds 2^-L·φ(x), where φ(x) = Σ e_i 2^-i over x's own expansion. A chain of one colour σ
    /// either runs on into x (x of sign σ: the chain adds σ·k) or changes colour where x begins
    /// (σ·k + φ(x)). So x is never written out sign by sign: a few word operations per chain.
    /// </summary>
    public static Dyadic Under(ReadOnlySpan<sbyte> bottomUp, Dyadic carried)
    {
        if (bottomUp.Length == 0) return carried;
        int sigma = bottomUp[0];
        int first = 1;
        while (first < bottomUp.Length && bottomUp[first] == sigma) first++;
        int after = bottomUp.Length - first;
        if (after == 0)
        {
            var run = Dyadic.FromInteger((long)sigma * bottomUp.Length);
            return carried.Sign == sigma ? run + carried : run + Phi(carried);
        }
        var runs = new List<(int Sign, long Length)>();
        foreach (sbyte s in bottomUp) Append(runs, s, 1);
        return Evaluate(runs) + Phi(carried).Shift(after);
    }

    /// <summary>
    /// φ(x) = Σ e_i 2^-i over the sign expansion e of x, every sign counting a half of the one
    /// before: for x = n + f ≥ 0 (n = ⌊x⌋) that is 1 − 2^-n·(1 − f/2), and φ(−x) = −φ(x). (n plus
    /// signs give 1 − 2^-n; a fraction f adds one more plus, a minus, then its bits: f/2 − 1 at
    /// scale 2^-(n+1).)
    /// </summary>
    public static Dyadic Phi(Dyadic x)
    {
        if (x.IsZero) return Dyadic.Zero;
        var a = x.Abs();
        var n = a.Numerator >> a.Exponent;
        var f = a - Dyadic.FromInteger(n);
        var value = Dyadic.One - (Dyadic.One - f.Shift(1)).Shift(checked((int)n));
        return x.Sign > 0 ? value : -value;
    }

    /// <summary>The sign expansion of x as runs of equal signs, from the ground up.</summary>
    public static IReadOnlyList<(int Sign, long Length)> Of(Dyadic x)
    {
        var runs = new List<(int Sign, long Length)>();
        AppendExpansion(runs, x);
        return runs;
    }

    private static void Append(List<(int Sign, long Length)> runs, int sign, long length)
    {
        if (length == 0) return;
        if (runs.Count > 0 && runs[^1].Sign == sign) runs[^1] = (sign, runs[^1].Length + length);
        else runs.Add((sign, length));
    }

    private static void AppendExpansion(List<(int Sign, long Length)> runs, Dyadic x)
    {
        if (x.IsZero) return;
        int sigma = x.Sign;
        var a = x.Abs();
        var whole = a.Floor();
        var fraction = a - Dyadic.FromInteger(whole);
        long n = (long)whole;
        if (fraction.IsZero)
        {
            Append(runs, sigma, n);
            return;
        }
        // x = σ(n + f), f = N/2^t with N odd: n + 1 signs σ, one −σ, then the bits of f after its
        // first, each 1 as σ and each 0 as −σ (the last bit, always 1, is the −σ already written).
        Append(runs, sigma, n + 1);
        Append(runs, -sigma, 1);
        int t = fraction.Exponent;
        var bits = fraction.Numerator.ToByteArray(isUnsigned: true, isBigEndian: false);
        for (int i = 1; i <= t - 1; i++)
        {
            int position = t - i;
            // The byte array stops at the numerator's highest one bit: positions above it are zeros.
            bool bit = (position >> 3) < bits.Length && (bits[position >> 3] >> (position & 7) & 1) == 1;
            Append(runs, bit ? sigma : -sigma, 1);
        }
    }

    /// <summary>
    /// 1:x, a blue edge carrying x, by arithmetic: x + 1 when x ≥ 0, else (x + j)/2^(j−1) with j
    /// the least positive integer such that x + j &gt; 1 — the rule for trees in Winning Ways (from memory), kept
    /// as an independent second route to the same numbers.
    /// </summary>
    public static Dyadic BlueUnder(Dyadic x)
    {
        if (x.Sign >= 0) return x + Dyadic.One;
        var j = (-x).Floor() + 2;
        return (x + Dyadic.FromInteger(j)).Shift(checked((int)(j - 1)));
    }

    /// <summary>−1:x, a red edge carrying x: the mirror image of <see cref="BlueUnder"/>.</summary>
    public static Dyadic RedUnder(Dyadic x) => -BlueUnder(-x);

    private static Dyadic Evaluate(List<(int Sign, long Length)> runs)
    {
        if (runs.Count == 0) return Dyadic.Zero;
        var whole = Dyadic.FromInteger(runs[0].Sign * runs[0].Length);
        long rest = 0;
        for (int i = 1; i < runs.Count; i++) rest += runs[i].Length;
        if (rest == 0) return whole;
        // The k-th sign after the first change is worth ±2^-k. With L signs, the sum is N / 2^L where
        // N = P − Q, P the bits of the + signs and Q of the − signs; as P + Q = 2^L − 1, N = 2P − 2^L + 1.
        if (rest <= 60)
        {
            long n = 0;
            for (int i = 1; i < runs.Count; i++)
                for (long j = 0; j < runs[i].Length; j++) n = 2 * n + runs[i].Sign;
            return whole + Dyadic.Create(n, (int)rest);
        }
        int length = checked((int)rest);
        var bytes = new byte[length / 8 + 2];
        int k = 0; // signs read so far after the first run
        for (int i = 1; i < runs.Count; i++)
        {
            var (sign, len) = runs[i];
            if (sign > 0)
            {
                // Sign number k+1 .. k+len sit at bits length-k-1 down to length-k-len.
                for (long j = 0; j < len; j++)
                {
                    int bit = length - (k + (int)j) - 1;
                    bytes[bit >> 3] |= (byte)(1 << (bit & 7));
                }
            }
            k += (int)len;
        }
        var plus = new BigInteger(bytes, isUnsigned: true, isBigEndian: false);
        var numeratorN = 2 * plus - (BigInteger.One << length) + 1;
        return whole + Dyadic.FromInteger(numeratorN).Shift(length);
    }
}
