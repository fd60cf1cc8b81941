using Bramble.Values;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// The one difference between the two graph-colouring games: which coloured neighbour forbids
/// a move. In Col a player may not colour a vertex next to one of their own colour; in Snort
/// not next to one of the opponent's colour.
/// </summary>
public enum ColouringRule
{
    Col,
    Snort,
}

/// <summary>What a tint (the colours next to an uncoloured vertex) allows under each rule.</summary>
public static class ColouringRuleExtensions
{
    /// <summary>Tint bit: the vertex has a blue neighbour.</summary>
    public const byte NextToBlue = 1;

    /// <summary>Tint bit: the vertex has a red neighbour.</summary>
    public const byte NextToRed = 2;

    /// <summary>Both bits: nobody may ever colour the vertex (under either rule), so it is out of the game.</summary>
    public const byte Dead = NextToBlue | NextToRed;

    public static VertexColour ColourOf(Side side) => side == Side.Left ? VertexColour.Blue : VertexColour.Red;

    /// <summary>The tint bit a vertex of this colour puts on its uncoloured neighbours.</summary>
    public static byte TintOf(VertexColour colour) => colour switch
    {
        VertexColour.Blue => NextToBlue,
        VertexColour.Red => NextToRed,
        _ => 0,
    };

    /// <summary>Whether <paramref name="side"/> may colour an uncoloured vertex whose neighbours give it <paramref name="tint"/>.</summary>
    public static bool Allows(this ColouringRule rule, Side side, byte tint)
    {
        // The colour whose presence next door forbids the move: the mover's own in Col, the opponent's in Snort.
        var forbidding = rule == ColouringRule.Col ? ColourOf(side) : ColourOf(side.Other());
        return (tint & TintOf(forbidding)) == 0;
    }

    /// <summary>Lower-case name, as a ruleset is called on the command line.</summary>
    public static string Name(this ColouringRule rule) => rule == ColouringRule.Col ? "col" : "snort";

    /// <summary>The rule in words, for messages: why a neighbour forbids a move.</summary>
    public static string Explain(this ColouringRule rule) => rule == ColouringRule.Col
        ? "in Col no one colours a vertex next to one of their own colour"
        : "in Snort no one colours a vertex next to one of the opponent's colour";
}
