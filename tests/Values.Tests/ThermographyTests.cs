namespace Bramble.Values.Tests;

/// <summary>Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994: worked thermography values, derived from the definitions in Winning Ways ch. 6 and Berlekamp &amp; Wolfe, Mathematical Go (1994) pp. 50–51.</summary>
public class ThermographyTests
{
    private readonly GameStore _store = new();
    private static Dyadic D(string s) => Dyadic.Parse(s);

    [Theory]
    // game, temperature, mean, left stop, right stop — Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994 table (derived from the definitions).
    [InlineData("{4|0}", "2", "2", "4", "0")]
    [InlineData("{1|0}", "1/2", "1/2", "1", "0")]
    [InlineData("{2||1|0}", "3/4", "5/4", "2", "1")]
    [InlineData("{3||2|1}", "3/4", "9/4", "3", "2")]
    [InlineData("{3||2|0}", "1", "2", "3", "2")]
    [InlineData("{8||4|0}", "3", "5", "8", "4")]
    [InlineData("{{4|2}|{-2|-4}}", "3", "0", "2", "-2")]
    [InlineData("{{6|2}|-1}", "5/2", "3/2", "2", "-1")]
    public void TemperatureMeanAndStops(string game, string temperature, string mean, string leftStop, string rightStop)
    {
        var g = _store.Parse(game);
        Assert.Equal(D(temperature), _store.Temperature(g));
        Assert.Equal(D(mean), _store.Mean(g));
        Assert.Equal(D(leftStop), _store.LeftStop(g));
        Assert.Equal(D(rightStop), _store.RightStop(g));
    }

    [Theory]
    // walls at sample temperatures: Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994, "walls for 0 ≤ t ≤ temperature" column (derived from the definitions).
    [InlineData("{4|0}", "1", "3", "1")]
    [InlineData("{2||1|0}", "1/4", "7/4", "1")]
    [InlineData("{2||1|0}", "5/8", "11/8", "9/8")]
    [InlineData("{3||2|0}", "1/2", "5/2", "2")]
    [InlineData("{8||4|0}", "1", "7", "4")]
    [InlineData("{8||4|0}", "5/2", "11/2", "9/2")]
    [InlineData("{{4|2}|{-2|-4}}", "1/2", "2", "-2")]
    [InlineData("{{4|2}|{-2|-4}}", "2", "1", "-1")]
    [InlineData("{{6|2}|-1}", "1", "2", "0")]
    [InlineData("{{6|2}|-1}", "9/4", "7/4", "5/4")]
    public void WallsFollowTheTable(string game, string t, string left, string right)
    {
        var th = _store.Thermograph(_store.Parse(game));
        Assert.Equal(D(left), th.LeftWallAt(D(t)));
        Assert.Equal(D(right), th.RightWallAt(D(t)));
    }

    [Fact]
    public void AboveTheTemperatureTheWallsAreTheMast()
    {
        var th = _store.Thermograph(_store.Parse("{8||4|0}"));
        // mast at the mean 5 above temperature 3 (Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994, derived from the definitions)
        Assert.Equal(D("5"), th.LeftWallAt(D("7")));
        Assert.Equal(D("5"), th.RightWallAt(D("100")));
    }

    [Theory]
    // sub-zero convention (Siegel 2013; Berlekamp 1996) as Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994 fixes it for this project.
    [InlineData("3", "-1")]
    [InlineData("-2", "-1")]
    [InlineData("0", "-1")]
    [InlineData("1/2", "-1/2")]
    [InlineData("-3/8", "-1/8")]
    [InlineData("↑", "0")]
    [InlineData("*", "0")]
    [InlineData("{0|↑*}", "0")]
    public void SubZeroTemperatures(string game, string temperature) =>
        Assert.Equal(D(temperature), _store.Temperature(_store.Parse(game)));

    [Fact]
    public void CoolingFourOverZero()
    {
        var g = _store.Parse("{4|0}");
        // Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994 cooling: {4|0} cooled by 1 is {3|1}, by 2 is 2*, by more than 2 is 2 (derived from the definitions).
        Assert.Equal(_store.Parse("{3|1}"), _store.Cool(g, D("1")));
        Assert.Equal(_store.Parse("2*"), _store.Cool(g, D("2")));
        Assert.Equal(_store.Parse("2"), _store.Cool(g, D("5/2")));
        Assert.Equal(_store.Parse("2"), _store.Cool(g, D("7")));
    }

    [Fact]
    public void HeatingUndoesCoolingOnSwitches()
    {
        // Heating by t inverts cooling by t on {a|b} below its temperature (Winning Ways ch. 6; derived from the definitions).
        var g = _store.Parse("{7|-3}");
        Assert.Equal(g, _store.Heat(_store.Cool(g, D("2")), D("2")));
        Assert.Equal(_store.Parse("{1|-1}"), _store.Heat(_store.Parse("*"), D("1")));
    }

    [Fact]
    public void StopsOfASumOfSwitches()
    {
        var sum = _store.Add(_store.Parse("{10|2}"), _store.Parse("{5|-5}"));
        // Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994 sums (derived from the definitions): Left stop 7, Right stop 5; means add.
        Assert.Equal(D("7"), _store.LeftStop(sum));
        Assert.Equal(D("5"), _store.RightStop(sum));
        Assert.Equal(_store.Mean(_store.Parse("{10|2}")) + _store.Mean(_store.Parse("{5|-5}")), _store.Mean(sum));
    }

    [Fact]
    public void MeansAddOnRandomSums()
    {
        // Mean value theorem: mean(G + H) = mean(G) + mean(H) (Winning Ways ch. 6) [from memory, a standard theorem].
        var rng = new Random(11);
        for (int i = 0; i < 150; i++)
        {
            var g = RandomHot(rng);
            var h = RandomHot(rng);
            Assert.Equal(_store.Mean(g) + _store.Mean(h), _store.Mean(_store.Add(g, h)));
        }
    }

    [Fact]
    public void TwoStepSwitchClosedForm()
    {
        // Winning Ways ch. 6; Berlekamp & Wolfe, Mathematical Go, 1994 closed form for {a||b|c} (derived from the definitions).
        var rng = new Random(3);
        for (int i = 0; i < 300; i++)
        {
            int c = rng.Next(-8, 8), b = c + rng.Next(1, 8), a = b + rng.Next(1, 10);
            var g = _store.Parse($"{{{a}||{b}|{c}}}");
            Dyadic A = a, B = b, C = c;
            Dyadic t, m;
            if (A - B <= (B - C).Shift(1)) { t = A - B; m = B; }
            else { var mid = (B + C).Shift(1); t = (A - mid).Shift(1); m = (A + mid).Shift(1); }
            Assert.Equal(t, _store.Temperature(g));
            Assert.Equal(m, _store.Mean(g));
        }
    }

    [Fact]
    public void CoolingByTheTemperatureGivesAnInfinitesimalShiftOfTheMean()
    {
        // Above its temperature a game cools to its mean; at the temperature it is the mean plus an infinitesimal (definition of cooling).
        var rng = new Random(5);
        for (int i = 0; i < 100; i++)
        {
            var g = RandomHot(rng);
            if (_store.IsNumber(g)) continue;
            var t = _store.Temperature(g);
            var cooled = _store.Cool(g, t);
            var offset = _store.Add(cooled, _store.Number(-_store.Mean(g)));
            Assert.True(_store.IsInfinitesimal(offset));
            Assert.Equal(_store.Number(_store.Mean(g)), _store.Cool(g, t + Dyadic.Half));
        }
    }

    private Game RandomHot(Random rng)
    {
        int d = rng.Next(-5, 5), c = d + rng.Next(0, 6), b = c + rng.Next(0, 6), a = b + rng.Next(0, 6);
        return rng.Next(3) switch
        {
            0 => _store.Parse($"{{{a}|{d}}}"),
            1 => _store.Parse($"{{{a}||{b}|{c}}}"),
            _ => _store.Parse($"{{{a}|{b}||{c}|{d}}}"),
        };
    }
}
