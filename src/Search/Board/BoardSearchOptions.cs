namespace Bramble.Search.Board;

/// <summary>
/// Switches of the whole-board search, one per published ingredient, so that each can be measured
/// on its own (bench/README.md). The defaults are the combination that measured best.
/// </summary>
public sealed record BoardSearchOptions
{
    /// <summary>
    /// Decide a node from move counts before searching it: the side to move wins when its safe
    /// moves outnumber every move the opponent could still make, and loses when the opponent's
    /// safe moves are at least as many as its own possible moves (Lachmann, Moore, Rapaport 2002;
    /// Bullock 2002; Uiterwijk, ICGA J. 37, 2014).
    /// </summary>
    public bool SafeMoveBounds { get; init; } = true;

    /// <summary>
    /// Count protective 2×2 areas in the safe-move bounds (Bullock 2002): a side that plays into one
    /// gets a safe move beside it, and the opponent can spoil it only with a move inside it.
    /// </summary>
    public bool ProtectiveBlocks { get; init; } = true;

    /// <summary>
    /// Count as protective blocks not only runs of exactly two across but any two rows whose runs
    /// end at the same two columns on the same side (Uiterwijk's safe-making moves, ICGA J. 37,
    /// 2014): a move down the inner column leaves the outer one safe, and takes one opponent move
    /// off each row as a run of two does. No cell of such a block stands beside another counted area.
    /// </summary>
    public bool RunEndBlocks { get; init; } = true;

    /// <summary>
    /// Count apart the spare moves that no opponent move can spoil together with another (Bullock
    /// 2002 calls them vulnerable areas of the first type): one in two of them is sure, not one in three.
    /// </summary>
    public bool LoneSpares { get; init; } = true;

    /// <summary>
    /// In the bounds, a protective block the side plays into also takes both opponent moves in it
    /// off the opponent's possible moves, so the race counts it four, not two (<see cref="SureMoves.Margin"/>).
    /// </summary>
    public bool BlockMargin { get; init; } = true;

    /// <summary>Positions equal up to a mirror image (and, on square boards, a transposition with the roles swapped) share one table entry.</summary>
    public bool Symmetry { get; init; } = true;

    /// <summary>Order moves by the opponent's moves they take away and the own moves they spend; safe moves last.</summary>
    public bool CountOrdering { get; init; } = true;

    /// <summary>
    /// Order moves by the counts after the move (own possible and safe moves against the
    /// opponent's), as the evaluation of the position it leaves; costs two counts per move.
    /// </summary>
    public bool EvaluationOrdering { get; init; } = true;

    /// <summary>
    /// Before searching any move, look each child up in the table: one already known lost for
    /// the opponent wins at once (enhanced transposition cutoff, common practice in chess programs).
    /// </summary>
    public bool ChildLookup { get; init; } = true;

    /// <summary>
    /// Apply the safe-move bounds to each child while ordering (the evaluation ordering counts the
    /// position after every move anyway): a move the bounds call won is played at once, a move
    /// they call lost is never searched. Same answers; the children are not visited as nodes.
    /// </summary>
    public bool ChildBounds { get; init; } = true;

    /// <summary>
    /// Two killer moves per ply, tried before every other move (common practice in chess programs).
    /// Off by default: here they override the evaluation order when choosing which winning move
    /// to prove, and 8×8 with Left first took 161 M nodes with them against 53 M without (bench/README.md).
    /// </summary>
    public bool Killers { get; init; }

    /// <summary>A count per move of the cutoffs it made, breaking ties between moves of equal gain (common practice).</summary>
    public bool History { get; init; } = true;

    /// <summary>
    /// Never search a safe move while the side to move has another move. Off by default: plain
    /// search finds positions where only the safe move wins (docs/domineering.md), so the rule is
    /// kept only as a measured experiment.
    /// </summary>
    public bool SkipSafeMoves { get; init; }

    /// <summary>
    /// Decide a node without search when its empty cells fall apart into regions that are each
    /// small (at most <see cref="RegionLeafCells"/> cells) or playable by one side only: the
    /// outcome of the sum of their exact values (Barton and Uiterwijk, BNAIC 2014; <see cref="RegionLeaves{T}"/>).
    /// </summary>
    public bool RegionLeaves { get; init; }

    /// <summary>The most cells of a region both sides can move in, for <see cref="RegionLeaves"/>.</summary>
    public int RegionLeafCells { get; init; } = 12;

    /// <summary>
    /// Buckets of the transposition table as a power of two (32 bytes each); null sizes it by the
    /// board (<see cref="WholeBoard.TableLog2For"/>).
    /// </summary>
    public int? TableLog2 { get; init; }

    /// <summary>
    /// With more than one thread, share out the opponent's replies to one root move at a time
    /// (after the first reply alone), rather than the root moves themselves. Off by default: it
    /// saved nodes on 7×7 but cost them when the side to move loses (bench/README.md).
    /// </summary>
    public bool SplitBelowRoot { get; init; }

    /// <summary>
    /// With more than one thread, let them all search the whole tree from the root, each putting
    /// off the moves another is searching (<see cref="BusyMarks"/>), rather than sharing out the
    /// root moves. Work is shared at every depth down to <see cref="ShareDepth"/>. On by default:
    /// on 8×8 it measured faster than sharing out the root moves or the replies (bench/README.md).
    /// </summary>
    public bool ShareTree { get; init; } = true;

    /// <summary>Plies from the root within which threads sharing the tree mark and put off moves.</summary>
    public int ShareDepth { get; init; } = 24;

    /// <summary>Threads searching the root moves (sharing the table).</summary>
    public int Threads { get; init; } = 1;
}
