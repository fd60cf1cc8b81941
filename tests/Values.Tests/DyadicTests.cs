using System.Numerics;

namespace Bramble.Values.Tests;

public class DyadicTests
{
    [Theory]
    [InlineData("3/8", "3/8")]
    [InlineData("-5/4", "-5/4")]
    [InlineData("6/8", "3/4")]
    [InlineData("4/2", "2")]
    [InlineData("0", "0")]
    [InlineData("-0/4", "0")]
    public void ParsesAndFormatsNormalised(string text, string expected) => Assert.Equal(expected, Dyadic.Parse(text).ToString());

    [Theory]
    [InlineData("1/3")]
    [InlineData("x")]
    [InlineData("1/")]
    [InlineData("1/0")]
    public void RejectsNonDyadicText(string text) => Assert.False(Dyadic.TryParse(text, out _));

    [Fact]
    public void LongArithmeticOverflowsIntoBigInteger()
    {
        var big = Dyadic.FromInteger(long.MaxValue);
        var sum = big + big;
        Assert.Equal((BigInteger)long.MaxValue * 2, sum.Numerator);
        Assert.Equal(big, sum - big);
        var tiny = Dyadic.PowerOfHalf(200);
        Assert.Equal(200, tiny.Exponent);
        Assert.Equal(Dyadic.PowerOfHalf(199), tiny + tiny);
    }

    [Fact]
    public void RandomArithmeticAgreesWithBigIntegerFractions()
    {
        var rng = new Random(7);
        for (int i = 0; i < 2000; i++)
        {
            long a = rng.NextInt64(-1L << 40, 1L << 40), b = rng.NextInt64(-1L << 40, 1L << 40);
            int ea = rng.Next(0, 70), eb = rng.Next(0, 70);
            var x = Dyadic.Create(a, ea);
            var y = Dyadic.Create(b, eb);
            // (a/2^ea) + (b/2^eb) over the common denominator 2^(ea+eb) [common practice]
            var num = (BigInteger)a * (BigInteger.One << eb) + (BigInteger)b * (BigInteger.One << ea);
            var expected = Reduce(num, ea + eb);
            Assert.Equal(expected, x + y);
            Assert.Equal(Reduce((BigInteger)a * b, ea + eb), x * y);
            Assert.Equal((x - y).Sign, x.CompareTo(y));
        }
    }

    private static Dyadic Reduce(BigInteger num, int exp) => Dyadic.FromInteger(num).Shift(exp);

    [Theory]
    [InlineData(null, null, "0")]
    [InlineData("0", null, "1")]
    [InlineData(null, "0", "-1")]
    [InlineData("0", "1", "1/2")]
    [InlineData("1/2", "1", "3/4")]
    [InlineData("-1/2", "3", "0")]
    [InlineData("1", "3", "2")]
    [InlineData("5/4", "3/2", "11/8")]
    [InlineData("1", "5/4", "9/8")]
    public void SimplestNumberBetween(string? lo, string? hi, string expected)
    {
        // The simplest-number rule (Conway, On Numbers and Games, 1976): the number with the earliest birthday in the interval.
        var result = Dyadic.Simplest(lo is null ? null : Dyadic.Parse(lo), hi is null ? null : Dyadic.Parse(hi));
        Assert.Equal(expected, result.ToString());
    }

    [Fact]
    public void FloorAndCeilingOfNegatives()
    {
        Assert.Equal(-2, (int)Dyadic.Parse("-3/2").Floor());
        Assert.Equal(-1, (int)Dyadic.Parse("-3/2").Ceiling());
        Assert.Equal(1, (int)Dyadic.Parse("3/2").Floor());
        Assert.Equal(2, (int)Dyadic.Parse("3/2").Ceiling());
    }
}
