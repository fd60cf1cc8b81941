namespace Bramble.Rules.Hackenbush;

/// <summary>
/// The name of an edge for a whole game: 1, 2, 3, … in the order the edges appear in the start
/// position's text (docs/hackenbush.md). Cutting edges never renames the others.
/// </summary>
public readonly record struct EdgeId(int Value)
{
    public override string ToString() => $"e{Value}";
}

/// <summary>One edge of a position. Node 0 is the ground; other node numbers are this position's own.</summary>
public readonly record struct HackenbushEdge(EdgeId Id, EdgeColour Colour, int From, int To)
{
    public bool IsLoop => From == To;
}
