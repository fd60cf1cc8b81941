using System.Numerics;

namespace Bramble.Values;

/// <summary>
/// An exact dyadic rational m / 2^k, kept normalised (m odd or k = 0). Small values live in a
/// <c>long</c> numerator; anything that would overflow moves to a <see cref="BigInteger"/>, so
/// the long fast path never silently wraps. Values of short games, their stops, means and
/// thermograph vertices are all dyadic, which is why no general fraction type is needed.
/// </summary>
public readonly struct Dyadic : IEquatable<Dyadic>, IComparable<Dyadic>
{
    // Layout: either _big is null and the numerator is _small, or _big holds it (and _small is
    // unused). _exp is the power of two in the denominator. Keeping the long case allocation-free
    // matters: Hackenbush and thermograph code create millions of these.
    private readonly long _small;
    private readonly BigInteger? _big;
    private readonly int _exp;

    private Dyadic(long small, int exp) { _small = small; _big = null; _exp = exp; }
    private Dyadic(BigInteger big, int exp) { _small = 0; _big = big; _exp = exp; }

    public static readonly Dyadic Zero = new(0L, 0);
    public static readonly Dyadic One = new(1L, 0);
    public static readonly Dyadic MinusOne = new(-1L, 0);
    public static readonly Dyadic Half = new(1L, 1);

    /// <summary>The power of two in the (normalised) denominator.</summary>
    public int Exponent => _exp;
    public BigInteger Numerator => _big ?? _small;
    public bool IsInteger => _exp == 0;
    public int Sign => _big is { } b ? b.Sign : Math.Sign(_small);
    public bool IsZero => Sign == 0;

    public static Dyadic FromInteger(long n) => new(n, 0);
    public static Dyadic FromInteger(BigInteger n) => Make(n, 0);
    public static implicit operator Dyadic(long n) => new(n, 0);
    public static implicit operator Dyadic(int n) => new(n, 0);

    /// <summary>m / 2^k for any integer m and k ≥ 0, normalised.</summary>
    public static Dyadic Create(long numerator, int exponent) => Make(numerator, exponent);

    /// <summary>2^-k.</summary>
    public static Dyadic PowerOfHalf(int k) => k < 62 ? new Dyadic(1L, 0).Shift(k) : Make(BigInteger.One, k);

    private static Dyadic Make(BigInteger m, int k)
    {
        if (k < 0) { m <<= -k; k = 0; }
        if (m.IsZero) return Zero;
        if (k > 0)
        {
            int tz = (int)BigInteger.TrailingZeroCount(BigInteger.Abs(m));
            int s = Math.Min(tz, k);
            if (s > 0) { m >>= s; k -= s; }
        }
        return m >= long.MinValue && m <= long.MaxValue ? new Dyadic((long)m, k) : new Dyadic(m, k);
    }

    private static Dyadic Make(long m, int k)
    {
        if (k < 0)
        {
            if (k > -62 && Math.Abs(m) < (1L << (62 + k))) return new Dyadic(m << -k, 0);
            return Make((BigInteger)m, k);
        }
        if (m == 0) return Zero;
        if (k > 0)
        {
            int s = Math.Min(BitOperations.TrailingZeroCount(m), k);
            m >>= s; k -= s;
        }
        return new Dyadic(m, k);
    }

    /// <summary>This value divided by 2^k (multiplied when k is negative).</summary>
    public Dyadic Shift(int k) => _big is { } b ? Make(b, _exp + k) : Make(_small, _exp + k);

    public static Dyadic operator +(Dyadic a, Dyadic b)
    {
        if (a._big is null && b._big is null)
        {
            int e = Math.Max(a._exp, b._exp);
            int da = e - a._exp, db = e - b._exp;
            if (da < 62 && db < 62)
            {
                long x = a._small, y = b._small;
                // Scale to a common denominator; any overflow falls through to BigInteger.
                if (Math.Abs(x) < (1L << (62 - da)) && Math.Abs(y) < (1L << (62 - db)))
                {
                    long sx = x << da, sy = y << db;
                    long s = sx + sy;
                    if (((sx ^ s) & (sy ^ s)) >= 0) return Make(s, e);
                }
            }
        }
        int ee = Math.Max(a._exp, b._exp);
        return Make((a.Numerator << (ee - a._exp)) + (b.Numerator << (ee - b._exp)), ee);
    }

    public static Dyadic operator -(Dyadic a) =>
        a._big is { } b ? Make(-b, a._exp) : a._small == long.MinValue ? Make(-(BigInteger)a._small, a._exp) : new Dyadic(-a._small, a._exp);

    public static Dyadic operator -(Dyadic a, Dyadic b) => a + (-b);

    public static Dyadic operator *(Dyadic a, Dyadic b)
    {
        if (a._big is null && b._big is null)
        {
            long p;
            try { p = checked(a._small * b._small); }
            catch (OverflowException) { return Make(a.Numerator * b.Numerator, a._exp + b._exp); }
            return Make(p, a._exp + b._exp);
        }
        return Make(a.Numerator * b.Numerator, a._exp + b._exp);
    }

    public int CompareTo(Dyadic other)
    {
        if (_big is null && other._big is null && _exp == other._exp) return _small.CompareTo(other._small);
        return (this - other).Sign;
    }

    public bool Equals(Dyadic other) =>
        _exp == other._exp && (_big is null && other._big is null ? _small == other._small : Numerator == other.Numerator);

    public override bool Equals(object? obj) => obj is Dyadic d && Equals(d);
    public override int GetHashCode() => _big is { } b ? HashCode.Combine(b, _exp) : HashCode.Combine(_small, _exp);

    public static bool operator ==(Dyadic a, Dyadic b) => a.Equals(b);
    public static bool operator !=(Dyadic a, Dyadic b) => !a.Equals(b);
    public static bool operator <(Dyadic a, Dyadic b) => a.CompareTo(b) < 0;
    public static bool operator >(Dyadic a, Dyadic b) => a.CompareTo(b) > 0;
    public static bool operator <=(Dyadic a, Dyadic b) => a.CompareTo(b) <= 0;
    public static bool operator >=(Dyadic a, Dyadic b) => a.CompareTo(b) >= 0;

    public static Dyadic Max(Dyadic a, Dyadic b) => a >= b ? a : b;
    public static Dyadic Min(Dyadic a, Dyadic b) => a <= b ? a : b;
    public Dyadic Abs() => Sign < 0 ? -this : this;

    /// <summary>The greatest integer ≤ this value.</summary>
    public BigInteger Floor()
    {
        if (_exp == 0) return Numerator;
        return BigInteger.Divide(Numerator - ((BigInteger.One << _exp) - 1) * (Sign < 0 ? 1 : 0), BigInteger.One << _exp);
    }

    /// <summary>The least integer ≥ this value.</summary>
    public BigInteger Ceiling() => -(-this).Floor();

    /// <summary>
    /// The simplest dyadic strictly between <paramref name="low"/> and <paramref name="high"/>
    /// (null bounds are open): the number with the smallest birthday, which is what
    /// <c>{a | b}</c> equals when a &lt; b are numbers.
    /// </summary>
    public static Dyadic Simplest(Dyadic? low, Dyadic? high)
    {
        if (low is { } l && high is { } h && l >= h) throw new ArgumentException("empty interval");
        // An integer in the interval: the one closest to zero.
        if (low is null && high is null) return Zero;
        if (low is null) { var h0 = high!.Value; return h0 > Zero ? Zero : FromInteger(h0.Ceiling() - 1); }
        if (high is null) { var l0 = low.Value; return l0 < Zero ? Zero : FromInteger(l0.Floor() + 1); }
        var lo = low.Value; var hi = high.Value;
        if (lo < Zero && hi > Zero) return Zero;
        BigInteger cand = lo >= Zero ? lo.Floor() + 1 : hi.Ceiling() - 1;
        var c = FromInteger(cand);
        if (c > lo && c < hi) return c;
        // No integer inside: the dyadic with the smallest denominator inside (unique).
        for (int k = 1; ; k++)
        {
            // Smallest m with m/2^k > lo.
            var scaled = lo.Shift(-k);
            BigInteger m = scaled.Floor() + 1;
            var d = Make(m, k);
            if (d < hi) return d;
        }
    }

    public override string ToString()
    {
        if (_exp == 0) return Numerator.ToString();
        return $"{Numerator}/{BigInteger.One << _exp}";
    }

    /// <summary>Parses <c>3</c>, <c>-2</c>, <c>3/8</c>, <c>-5/4</c>; the denominator must be a power of two.</summary>
    public static bool TryParse(ReadOnlySpan<char> text, out Dyadic value)
    {
        value = Zero;
        text = text.Trim();
        int slash = text.IndexOf('/');
        var numText = slash < 0 ? text : text[..slash];
        if (!BigInteger.TryParse(numText, System.Globalization.NumberStyles.AllowLeadingSign, null, out var num)) return false;
        if (slash < 0) { value = FromInteger(num); return true; }
        if (!BigInteger.TryParse(text[(slash + 1)..], System.Globalization.NumberStyles.None, null, out var den)) return false;
        if (den.Sign <= 0 || !den.IsPowerOfTwo) return false;
        value = Make(num, (int)(den.GetBitLength() - 1));
        return true;
    }

    public static Dyadic Parse(string text) =>
        TryParse(text, out var v) ? v : throw new FormatException($"'{text}' is not a dyadic rational such as 3, -2, 3/8 or -5/4");
}
