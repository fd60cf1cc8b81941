using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Rules.Tests.Domineering;

/// <summary>Notation, moves, components and hashing of Domineering positions (docs/ (position notation)).</summary>
public class DomineeringPositionTests
{
    private readonly DomineeringRuleset _rules = new();

    [Fact]
    public void SizeNotationIsAnEmptyBoardOfThatManyRowsAndColumns()
    {
        var position = (DomineeringPosition)_rules.Parse("6x7");
        Assert.Equal(6, position.Board.Rows);
        Assert.Equal(7, position.Board.Columns);
        Assert.Equal(42, position.Size);
        Assert.Equal(string.Join("/", Enumerable.Repeat(".......", 6)), position.Text);
    }

    [Theory]
    [InlineData("..#./....")]
    [InlineData("#")]
    [InlineData("##.##/...../##.##")]
    public void RowNotationParsesBackToTheSameText(string text)
    {
        Assert.Equal(text, _rules.Parse(text).Text);
        Assert.Equal(text, _rules.Parse(_rules.Parse(text).Text).Text);
    }

    [Fact]
    public void NewlinesSeparateRowsAndBlanksAreIgnored()
    {
        Assert.Equal("..#./....", _rules.Parse("  ..#.\r\n. . . .\n").Text);
        Assert.Equal(_rules.Parse("2 X 3").Text, _rules.Parse("2x3").Text);
    }

    [Theory]
    [InlineData("..#./...", 8, "every row has 4 cells")]
    [InlineData("..#./.....", 9, "every row has 4 cells")]
    [InlineData("..x.", 2, "'.', '#' or '/'")]
    [InlineData("../", 3, "a row of")]
    [InlineData("..//..", 3, "a row of")]
    [InlineData("", 0, "a board such as")]
    [InlineData("3x27", 2, "between 1 and 26 columns")]
    [InlineData("0x4", 0, "between 1 and 64 rows")]
    [InlineData("3y4", 1, "'x'")]
    [InlineData("3x", 2, "a number of columns")]
    [InlineData("...........................", 26, "at most 26 columns")]
    public void BadBoardsAreRefusedWithTheColumnOfTheFault(string text, int column, string expected)
    {
        var error = Assert.Throws<PositionSyntaxException>(() => _rules.Parse(text));
        Assert.Equal(column, error.Column);
        Assert.Contains(expected, error.Expected);
        Assert.Contains("^", error.Pointer);
    }

    [Fact]
    public void LeftPlacesVerticalAndRightHorizontalDominoesNamedByTheirTopOrLeftCell()
    {
        var position = _rules.Parse("2x2");
        // docs/ (position notation): Left's domino covers c4 and c5, Right's covers c4 and d4.
        Assert.Equal(["a1", "b1"], position.Moves(Side.Left).Select(position.FormatMove));
        Assert.Equal(["a1", "a2"], position.Moves(Side.Right).Select(position.FormatMove));
        Assert.Equal("#./#.", position.Play(Side.Left, position.ParseMove("a1")).Text);
        Assert.Equal("##/..", position.Play(Side.Right, position.ParseMove("a1")).Text);
    }

    [Fact]
    public void MoveNamesAreColumnLetterThenRowFromOne()
    {
        var position = _rules.Parse("6x7");
        var move = position.ParseMove("c4");
        Assert.Equal(new Move(3 * 26 + 2), move);
        Assert.Equal("c4", position.FormatMove(move));
        Assert.Equal(move, position.ParseMove("C4"));
        Assert.Throws<IllegalMoveException>(() => position.ParseMove("4c"));
        Assert.Throws<IllegalMoveException>(() => position.ParseMove("c0"));
        Assert.Throws<IllegalMoveException>(() => position.ParseMove(""));
    }

    [Fact]
    public void IllegalMovesAreRefusedWithTheReason()
    {
        var position = _rules.Parse(".#/..");
        Assert.Contains("filled", Assert.Throws<IllegalMoveException>(() => position.Play(Side.Left, position.ParseMove("b1"))).Message);
        Assert.Contains("stick out", Assert.Throws<IllegalMoveException>(() => position.Play(Side.Left, position.ParseMove("a2"))).Message);
        Assert.Contains("stick out", Assert.Throws<IllegalMoveException>(() => position.Play(Side.Right, position.ParseMove("b2"))).Message);
        Assert.Contains("off the", Assert.Throws<IllegalMoveException>(() => position.Play(Side.Right, position.ParseMove("e9"))).Message);
    }

    [Fact]
    public void ComponentsKeepTheBoardAndTheMoveNames()
    {
        var position = _rules.Parse("..#../..#../#####/.#...");
        var components = position.Components();
        // Regions: the 2×2 on the left, the 2×2 on the right, and the 3-cell strip at the bottom (the lone a4 is dropped).
        Assert.Equal(3, components.Count);
        Assert.Equal("..###/..###/#####/#####", components[0].Text);
        Assert.Equal("###../###../#####/#####", components[1].Text);
        Assert.Equal("#####/#####/#####/##...", components[2].Text);
        foreach (var component in components)
        {
            foreach (var side in new[] { Side.Left, Side.Right })
                foreach (var move in component.Moves(side))
                    Assert.Contains(move, position.Moves(side));
        }
        var context = new ValueContext();
        // Common practice: a position is the sum of its components.
        Assert.Equal(_rules.Value(position, context), context.Store.Sum(components.Select(c => _rules.Value(c, context))));
        Assert.Empty(_rules.Parse(".#./#.#").Components());
        Assert.Single(_rules.Parse("3x3").Components());
    }

    [Fact]
    public void HashFollowsTheMovesAndMatchesAFreshParse()
    {
        var random = new Random(3);
        IPosition position = _rules.Parse("5x6");
        var seen = new HashSet<ulong> { position.Hash };
        var side = Side.Left;
        while (position.Moves(side).Count > 0)
        {
            var moves = position.Moves(side);
            position = position.Play(side, moves[random.Next(moves.Count)]);
            Assert.Equal(_rules.Parse(position.Text).Hash, position.Hash);
            Assert.True(seen.Add(position.Hash));
            side = side.Other();
        }
        foreach (var component in _rules.Parse("..#../..#..").Components())
            Assert.Equal(_rules.Parse(component.Text).Hash, component.Hash);
    }

    [Fact]
    public void TransposedRectangleHasTheSignedNormalKey()
    {
        string wide = _rules.Parse("2x3").NormalKey;
        Assert.Equal(".../...", wide);
        Assert.Equal("-" + wide, _rules.Parse("3x2").NormalKey);
        Assert.Equal(wide, _rules.Parse("#####/#...#/#...#").NormalKey);
        Assert.Equal("0", _rules.Parse(".#/#.").NormalKey);
    }

    [Fact]
    public void RegionsWiderThanTheBitboardAreRefusedAsOverBudget()
    {
        // 12×12 = 144 cells: the value is not computed exactly, which searches handle as a spent budget.
        Assert.Throws<BudgetExceededException>(() => _rules.Value(_rules.Parse("12x12"), new ValueContext()));
    }
}
