namespace Bramble.Search;

/// <summary>Knobs of <see cref="PerfectPlayer"/>; the defaults suit interactive play and <c>bramble solve</c>.</summary>
public sealed record PerfectSettings
{
    /// <summary>Node cap for the exact value of each component of the position to decide.</summary>
    public long ComponentCap { get; init; } = 400_000;

    /// <summary>
    /// Components of the position to decide up to this size (<see cref="Bramble.Rules.IPosition.Size"/>)
    /// are valued within <see cref="ComponentCap"/>; bigger ones within <see cref="ProbeCap"/>
    /// (enough for a value that is cheap whatever the size), else they go to the search of large components.
    /// </summary>
    public int ExactSize { get; init; } = 20;

    /// <summary>Node cap of the exact attempt for a component over <see cref="ExactSize"/>.</summary>
    public long ProbeCap { get; init; } = 256;

    /// <summary>Node cap for the exact value of a piece made by a move inside the search of large components.</summary>
    public long PieceCap { get; init; } = 20_000;

    /// <summary>Pieces up to this size made inside the search are valued within <see cref="PieceCap"/>; bigger ones stay large.</summary>
    public int SmallSize { get; init; } = 14;

    /// <summary>Total node cap of one decision (local values and searches together).</summary>
    public long NodeCap { get; init; } = long.MaxValue;

    /// <summary>
    /// The share of a decision's time kept back for the Thermostrat fallback (at most
    /// <see cref="FallbackMaxMs"/>): the exact search stops early enough for the fallback to finish
    /// inside the budget.
    /// </summary>
    public double FallbackShare { get; init; } = 0.1;

    public long FallbackMaxMs { get; init; } = 2_000;

    /// <summary>
    /// Spend the whole budget on the exact answer and look for no fallback move past it: for
    /// solving, where a move that is not proved is not reported anyway (<c>bramble solve</c>).
    /// </summary>
    public bool ProofOnly { get; init; }

    /// <summary>
    /// A position whose ruleset offers a static estimate (<see cref="Bramble.Rules.IEstimable"/>, e.g.
    /// Amazons) and which has a component over this size is played by <see cref="HeuristicSearch"/>
    /// over the whole board instead: no exact value or proof search can finish there.
    /// </summary>
    public int HeuristicSize { get; init; } = 32;

    /// <summary>
    /// Domineering boards of at most 128 cells with a component over <see cref="ExactSize"/> go to
    /// the bitboard search of the whole board (<see cref="Board.WholeBoard"/>) instead of the
    /// decomposition search (unless <see cref="NodeCap"/> is set: node caps belong to the decomposition search).
    /// </summary>
    public bool WholeBoard { get; init; } = true;

    /// <summary>The switches of the whole-board search (threads, table size, each ingredient).</summary>
    public Board.BoardSearchOptions BoardOptions { get; init; } = new();
}
