using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Pictures.Tests;

public class AmazonsPictureTests
{
    private readonly IRuleset _rules = Rulesets.Get("amazons");

    [Fact]
    public void EverySquareIsNamedAndTheLastMoveIsDrawn()
    {
        var position = _rules.Parse("L.#/..R");
        var svg = PositionPicture.Draw(position);
        foreach (var cell in new[] { "a1", "b1", "c1", "a2", "b2", "c2" }) Assert.Contains($"data-cell=\"{cell}\"", svg);
        Assert.DoesNotContain("data-last", svg);
        var after = position.Play(Side.Left, position.ParseMove("a1-a2/a1"));
        Assert.Contains("data-last=\"a1-a2/a1\"", PositionPicture.Draw(after));
        // The terminal picture shows the board with the move notation.
        Assert.Contains("  1 L . # ", TextPicture.Draw(position));
    }
}
