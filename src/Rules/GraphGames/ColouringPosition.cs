using Bramble.Rules.Common;
using Bramble.Values;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// A Snort or Col position: a graph whose vertices are uncoloured, blue (Left's) or red
/// (Right's). A move colours one uncoloured vertex in the mover's colour and is named by the
/// vertex's number (<see cref="Move.A"/> is the label), e.g. <c>7</c>. Components are the
/// connected sets of uncoloured vertices someone may still colour, each with the coloured
/// vertices next to it (they carry its constraints); a component keeps the original labels, so
/// its moves are the whole position's moves.
/// </summary>
public sealed class ColouringPosition : IPosition
{
    private IReadOnlyList<TintedPart>? _parts;

    internal ColouringPosition(IRuleset ruleset, ColouringRule rule, ColouredGraph graph)
    {
        Ruleset = ruleset;
        Rule = rule;
        Graph = graph;
        Text = GraphNotationWriter.Write(graph);
        Hash = TextHash.Of(Text);
    }

    public IRuleset Ruleset { get; }

    public ColouringRule Rule { get; }

    public ColouredGraph Graph { get; }

    public string Text { get; }

    public ulong Hash { get; }

    /// <summary>The uncoloured vertices.</summary>
    public int Size
    {
        get
        {
            int n = 0;
            for (int v = 0; v < Graph.Count; v++) if (Graph.Colour(v) == VertexColour.Uncoloured) n++;
            return n;
        }
    }

    /// <summary>The tinted forms of the components, in the order of their lowest vertex.</summary>
    public IReadOnlyList<TintedPart> Parts => _parts ??= TintedPart.Of(Graph);

    /// <summary>Whether <paramref name="side"/> may colour vertex (index) <paramref name="v"/>.</summary>
    public bool MayColour(Side side, int v) =>
        Graph.Colour(v) == VertexColour.Uncoloured && Rule.Allows(side, Graph.Tint(v));

    public IReadOnlyList<Move> Moves(Side side)
    {
        var moves = new List<Move>();
        for (int v = 0; v < Graph.Count; v++)
            if (MayColour(side, v)) moves.Add(new Move(Graph.Label(v)));
        return moves;
    }

    public IPosition Play(Side side, Move move)
    {
        int v = Graph.IndexOf(move.A);
        if (v < 0) throw new IllegalMoveException($"there is no vertex {move.A} in this position");
        if (Graph.Colour(v) != VertexColour.Uncoloured)
            throw new IllegalMoveException($"vertex {move.A} is already coloured {(Graph.Colour(v) == VertexColour.Blue ? "blue" : "red")}");
        if (!Rule.Allows(side, Graph.Tint(v)))
        {
            var forbidding = Rule == ColouringRule.Col ? ColouringRuleExtensions.ColourOf(side) : ColouringRuleExtensions.ColourOf(side.Other());
            int neighbour = Graph.Neighbours(v).First(u => Graph.Colour(u) == forbidding);
            throw new IllegalMoveException(
                $"{side.Word()} may not colour vertex {move.A}: it is next to {(forbidding == VertexColour.Blue ? "blue" : "red")} vertex {Graph.Label(neighbour)}, and {Rule.Explain()}");
        }
        return new ColouringPosition(Ruleset, Rule, Graph.WithColour(v, ColouringRuleExtensions.ColourOf(side)));
    }

    public string FormatMove(Move move) => move.A.ToString(System.Globalization.CultureInfo.InvariantCulture);

    public Move ParseMove(string text)
    {
        var s = text.Trim();
        if (s.Length > 0 && (s[0] == 'v' || s[0] == 'V')) s = s[1..];
        if (s.Length == 0 || s.Length > 9 || !s.All(char.IsAsciiDigit))
            throw new IllegalMoveException($"'{text}' is not a {Ruleset.Name} move: expected the number of an uncoloured vertex, such as 7");
        return new Move(int.Parse(s, System.Globalization.CultureInfo.InvariantCulture));
    }

    public IReadOnlyList<IPosition> Components()
    {
        var parts = Parts;
        var result = new List<IPosition>(parts.Count);
        foreach (var part in parts)
        {
            // The part's vertices and the coloured vertices next to them.
            var keep = new SortedSet<int>(part.Origin);
            foreach (int v in part.Origin)
                foreach (int u in Graph.Neighbours(v))
                    if (Graph.Colour(u) != VertexColour.Uncoloured) keep.Add(u);
            if (parts.Count == 1 && keep.Count == Graph.Count) return [this];
            result.Add(new ColouringPosition(Ruleset, Rule, Graph.Induced(keep.ToArray())));
        }
        return result;
    }

    /// <summary>Each part's <see cref="TintedPart.SignedKey"/>, sorted and joined by " + "; "0" for none.</summary>
    public string NormalKey => ComponentValues.JoinKeys(Parts.Select(p => p.SignedKey));
}
