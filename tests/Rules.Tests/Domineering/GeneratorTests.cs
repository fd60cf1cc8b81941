using Bramble.Rules.Domineering;

namespace Bramble.Rules.Tests.Domineering;

public class GeneratorTests
{
    private readonly DomineeringRuleset _rules = new();

    [Theory]
    [InlineData("rectangles", 6)]
    [InlineData("regions", 9)]
    [InlineData("sums", 5)]
    public void GeneratorsAreReproducibleAndParse(string generator, int size)
    {
        var first = _rules.Generate(generator, 20, size, seed: 11);
        Assert.Equal(first, _rules.Generate(generator, 20, size, seed: 11));
        Assert.NotEqual(first, _rules.Generate(generator, 20, size, seed: 12));
        foreach (string text in first) Assert.NotNull(_rules.Parse(text));
    }

    [Fact]
    public void RectanglesStayWithinTheSize()
    {
        foreach (string text in _rules.Generate("rectangles", 50, 4, seed: 1))
        {
            var board = ((DomineeringPosition)_rules.Parse(text)).Board;
            Assert.InRange(board.Rows, 1, 4);
            Assert.InRange(board.Columns, 1, 4);
            Assert.Equal(board.Rows * board.Columns, board.EmptyCount);
        }
    }

    [Fact]
    public void RegionsAreOneConnectedRegionOfTheGivenSize()
    {
        foreach (string text in _rules.Generate("regions", 50, 12, seed: 2))
        {
            var position = _rules.Parse(text);
            Assert.Equal(12, position.Size);
            Assert.Single(position.Components());
        }
    }

    [Fact]
    public void SumsHaveTheGivenNumberOfRegions()
    {
        foreach (string text in _rules.Generate("sums", 30, 6, seed: 3))
        {
            var board = ((DomineeringPosition)_rules.Parse(text)).Board;
            Assert.Equal(6, board.Regions().Count);
        }
    }

    [Fact]
    public void UnknownGeneratorsAndSizesAreRefused()
    {
        Assert.Contains("known", Assert.Throws<ArgumentException>(() => _rules.Generate("spirals", 1, 3, 0)).Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => _rules.Generate("regions", 1, 1, 0));
    }
}
