using System.Numerics;

namespace Bramble.Search.Board;

/// <summary>
/// Win/loss search of one Domineering rectangle (holes allowed) on bitboards: T is <see cref="ulong"/>
/// for boards of up to 64 cells and <see cref="UInt128"/> up to 128. The state is two bitboards of
/// empty cells (one per view, <see cref="BoardShape"/>) and eight incremental hashes; a move is two
/// AND-NOTs and eight XORs, undone by restoring the saved words. Nothing on the hot path allocates
/// (move lists live on the stack) and nothing throws: a stop unwinds by returning.
/// <para>
/// At each node, in order: no move — a loss; the safe-move bounds (<see cref="BoardSearchOptions.SafeMoveBounds"/>);
/// the transposition table (exact outcomes, <see cref="OutcomeTable"/>); then the moves, ordered,
/// until one leaves the opponent lost. A win stores its move; a loss stores the move whose
/// refutation took the most nodes (the most stubborn defence, for the principal line).
/// </para>
/// One instance per thread; instances of one solve share the shape, the table and the stop signal.
/// </summary>
public sealed class BoardSearch<T> where T : unmanaged, IBinaryInteger<T>
{
    private const int MaxPly = 72;

    private readonly BoardShape _shape;
    private readonly OutcomeTable _table;
    private readonly StopSignal _stop;
    private readonly Func<bool> _spent;
    private readonly BoardSearchOptions _options;
    private readonly RegionLeaves<T>? _leaves;

    private readonly T[] _board = new T[2];
    private readonly ulong[] _hash = new ulong[8];

    // Per view: masks for the columns that have a right / left neighbour, the row mask.
    private readonly T[] _notLastColumn = new T[2], _notFirstColumn = new T[2];
    private readonly uint[] _rowMask = new uint[2];
    // Per side and top cell: the bits a move clears in its own view and in the other one.
    private readonly T[][] _clearOwn = new T[2][], _clearOther = new T[2][];

    // Shared with the other threads of a solve that search the same tree: who is searching what.
    private readonly BusyMarks? _busy;

    private readonly int[][] _history = [new int[128], new int[128]];
    private readonly int[] _killers = new int[MaxPly * 2];

    public BoardSearch(BoardShape shape, OutcomeTable table, StopSignal stop, BoardSearchOptions options, Func<bool>? spent = null, BusyMarks? busy = null)
    {
        _busy = busy;
        _shape = shape;
        _table = table;
        _stop = stop;
        _options = options;
        _spent = spent ?? (() => false);
        _sure = options.BlockMargin ? SureMoves.Margin : SureMoves.Shared;
        if (options.RegionLeaves) _leaves = new RegionLeaves<T>(shape, options.RegionLeafCells);
        Array.Fill(_killers, -1);
        for (int v = 0; v < 2; v++)
        {
            int h = shape.Height[v], w = shape.Width[v];
            _rowMask[v] = w >= 32 ? uint.MaxValue : (1u << w) - 1;
            (_notLastColumn[v], _notFirstColumn[v]) = ColumnMasks.Of<T>(shape, v);
            _clearOwn[v] = new T[shape.Cells];
            _clearOther[v] = new T[shape.Cells];
            for (int i = 0; i + w < shape.Cells; i++)
            {
                _clearOwn[v][i] = ~((T.One << i) | (T.One << (i + w)));
                _clearOther[v][i] = ~((T.One << shape.ToOther[v][i]) | (T.One << shape.ToOther[v][i + w]));
            }
            _ = h;
        }
    }

    // The moves being searched at the first plies, their places among the moves open there and how
    // many are open: read by progress reports from another thread (a torn read only mixes two lines).
    private const int ShownPlies = 4;
    private readonly int[] _lineMove = new int[ShownPlies], _linePlace = new int[ShownPlies], _lineOpen = new int[ShownPlies];
    private int _lineDepth;

    /// <summary>
    /// The moves this instance is searching at its first plies (top cells, the side alternating from
    /// the side it was asked about), each with its place (from 1) among the moves left open there
    /// and how many those are; for progress reports.
    /// </summary>
    public (int Cell, int Place, int Open)[] SearchLine()
    {
        int d = Volatile.Read(ref _lineDepth);
        var line = new (int, int, int)[d];
        for (int p = 0; p < d; p++) line[p] = (_lineMove[p], _linePlace[p], _lineOpen[p]);
        return line;
    }

    /// <summary>The root move (top cell) this instance is searching, or -1; for progress reports.</summary>
    public int RootMove => Volatile.Read(ref _lineDepth) > 0 ? _lineMove[0] : -1;

    /// <summary>Nodes visited by this instance.</summary>
    public long Nodes { get; private set; }

    public BoardShape Shape => _shape;

    /// <summary>Sets the position: which cells of view 0 (row-major, rows × columns) are empty.</summary>
    public void SetPosition(ReadOnlySpan<bool> empty)
    {
        T v0 = T.Zero, v1 = T.Zero;
        for (int p = 0; p < _shape.Cells; p++)
        {
            if (!empty[p]) continue;
            v0 |= T.One << p;
            v1 |= T.One << _shape.ToOther[0][p];
        }
        _board[0] = v0;
        _board[1] = v1;
        _shape.Hashes(empty).CopyTo(_hash, 0);
    }

    /// <summary>The empty cells of view 0, for copying the position to another thread's instance.</summary>
    public bool[] EmptyCells()
    {
        var e = new bool[_shape.Cells];
        for (int p = 0; p < e.Length; p++) e[p] = ((_board[0] >> p) & T.One) != T.Zero;
        return e;
    }

    /// <summary>The legal moves of side s (top cells in view s), in search order.</summary>
    public int[] OrderedMoves(int s)
    {
        Span<int> moves = stackalloc int[_shape.Cells];
        int n = Generate(s, 0, moves);
        return moves[..n].ToArray();
    }

    public void Play(int s, int i)
    {
        _board[s] &= _clearOwn[s][i];
        _board[1 - s] &= _clearOther[s][i];
        var d = _shape.HashDelta[s];
        int k = i * 8;
        for (int j = 0; j < 8; j++) _hash[j] ^= d[k + j];
    }

    /// <summary>Undoes <see cref="Play"/> given the words saved before it.</summary>
    private void Undo(int s, int i, T own, T other)
    {
        _board[s] = own;
        _board[1 - s] = other;
        var d = _shape.HashDelta[s];
        int k = i * 8;
        for (int j = 0; j < 8; j++) _hash[j] ^= d[k + j];
    }

    /// <summary>Plays and later takes back a move from outside the search (root threads, principal line).</summary>
    public (T Own, T Other) Save(int s) => (_board[s], _board[1 - s]);

    public void Restore(int s, int i, (T Own, T Other) saved) => Undo(s, i, saved.Own, saved.Other);

    /// <summary>Whether side s (0 = Left, 1 = Right), to move, wins. False also when stopped; check the stop signal.</summary>
    public bool Wins(int s) => Wins(s, 0, boundsTried: false, expectWin: true);

    /// <summary>The move a table entry holds for side s to move here, in this orientation, or -1.</summary>
    public int TableMove(int s, out bool win)
    {
        var key = Key(s, out int f);
        if (_table.TryGet(key, out win, out int m) && m != OutcomeTable.NoMove) return _shape.MirrorMove[s][f][m];
        return -1;
    }

    /// <summary>
    /// Move counts of side s: Possible, its most disjoint moves now (an upper bound on the moves it
    /// can still make); Safe, disjoint moves the opponent can never take away; Blocks, protective
    /// 2×2 areas (two side-by-side pairs that end a run across in both rows, on the same side, or with
    /// <see cref="BoardSearchOptions.RunEndBlocks"/> off form a run of exactly two: a move in the
    /// inner column leaves the outer column safe — Bullock 2002; Uiterwijk 2014); Spare, further moves disjoint from all those and from each other (each
    /// opponent move can spoil at most two of them); Lone, the spares that no opponent move can
    /// spoil together with another (counted apart from Spare).
    /// </summary>
    public (int Possible, int Safe, int Blocks, int Lone, int Spare) Counts(int s)
    {
        Span<uint> rows = stackalloc uint[_shape.Height[s]];
        Rows(s, rows);
        return Counts(s, rows);
    }

    /// <summary>The empty cells of view s, one word a row.</summary>
    private void Rows(int s, Span<uint> rows)
    {
        int w = _shape.Width[s];
        uint rm = _rowMask[s];
        T b = _board[s];
        for (int r = 0; r < rows.Length; r++) rows[r] = uint.CreateTruncating(b >> (r * w)) & rm;
    }

    /// <summary>As <see cref="Counts(int)"/>, from the rows of view s (so that a move can be tried on the rows alone).</summary>
    private (int Possible, int Safe, int Blocks, int Lone, int Spare) Counts(int s, ReadOnlySpan<uint> rows)
    {
        int h = _shape.Height[s];
        uint rm = _rowMask[s];
        Span<uint> used = stackalloc uint[h];
        Span<uint> near = stackalloc uint[h];
        int possible = 0, safe = 0, blocks = 0, spare = 0;
        uint usedP = 0, usedS = 0, usedB = 0, usedX = 0;
        uint prevSafe = rows[0] & ~(rows[0] >> 1) & ~(rows[0] << 1);
        uint prevRun2 = Run2(rows[0]);
        used[0] = 0;
        for (int r = 1; r < h; r++)
        {
            uint prev = rows[r - 1], cur = rows[r];
            // A cell is protected when neither horizontal neighbour is empty: the opponent can never cover it.
            uint curSafe = cur & ~(cur >> 1) & ~(cur << 1);
            // Greedy from the top pairs each run of a column into ⌊length/2⌋ dominoes, the most there are.
            uint t = prev & ~usedP & cur;
            possible += BitOperations.PopCount(t);
            usedP = t;
            uint u = prevSafe & ~usedS & curSafe;
            safe += BitOperations.PopCount(u);
            usedS = u;
            used[r - 1] |= u;
            used[r] = u;
            prevSafe = curSafe;
            if (_options.ProtectiveBlocks && !_options.RunEndBlocks)
            {
                // Runs of exactly two across in both rows, at the same columns: a protective block
                // (its cells are never protected, so never part of a safe move).
                uint curRun2 = Run2(cur);
                uint x = prevRun2 & curRun2 & ~usedB;
                blocks += BitOperations.PopCount(x);
                usedB = x;
                uint cells = x | (x << 1);
                used[r - 1] |= cells;
                used[r] |= cells;
                prevRun2 = curRun2;
            }
        }
        if (_options.ProtectiveBlocks && _options.RunEndBlocks)
            blocks = EndBlocks(rows, used, near, h, rm);
        Span<uint> spareCells = stackalloc uint[h];
        Span<uint> spareTops = stackalloc uint[h];
        spareCells[0] = 0;
        for (int r = 1; r < h; r++)
        {
            uint x = rows[r - 1] & ~used[r - 1] & ~near[r - 1] & ~usedX & rows[r] & ~used[r] & ~near[r];
            spare += BitOperations.PopCount(x);
            usedX = x;
            spareCells[r - 1] |= x;
            spareCells[r] = x;
            spareTops[r - 1] = x;
        }
        int lone = 0;
        if (_options.LoneSpares && spare > 0)
        {
            // A spare none of whose cells has another spare's cell beside it across: an opponent
            // move that spoils it spoils nothing else (safe cells and blocks never stand beside a spare).
            for (int r = 0; r + 1 < h; r++)
            {
                uint top = spareTops[r];
                if (top == 0) continue;
                uint beside = (spareCells[r] << 1) | (spareCells[r] >> 1) | (spareCells[r + 1] << 1) | (spareCells[r + 1] >> 1);
                lone += BitOperations.PopCount(top & ~beside);
            }
        }
        return (possible, safe, blocks, lone, spare - lone);
    }

    /// <summary>
    /// Protective blocks at the ends of runs (Uiterwijk's safe-making moves, ICGA J. 37, 2014): two
    /// rows whose runs across end at the same two columns, on the same side. A move down the inner
    /// column leaves the outer one protected (its far neighbour is filled or off the board), so it is
    /// worth this move and a safe one; it also takes one move off each row's runs for the opponent,
    /// whatever their length, as a run of exactly two does. Chosen greedily from the top and the
    /// left, disjoint from the safe moves and from each other, and with no cell of one beside a cell
    /// of another: so one opponent move spoils at most one of them. The cells beside them across
    /// are returned in <paramref name="near"/>: the spares keep clear of them for the same reason.
    /// </summary>
    private static int EndBlocks(ReadOnlySpan<uint> rows, Span<uint> used, Span<uint> near, int h, uint rm)
    {
        int blocks = 0;
        uint prevRight = RightEnds(rows[0]), prevLeft = LeftEnds(rows[0]);
        for (int r = 1; r < h; r++)
        {
            uint curRight = RightEnds(rows[r]), curLeft = LeftEnds(rows[r]);
            uint both = (prevRight & curRight) | (prevLeft & curLeft);
            prevRight = curRight;
            prevLeft = curLeft;
            if (both == 0) continue;
            uint taken = used[r - 1] | used[r] | near[r - 1] | near[r];
            for (uint c = both; c != 0; c &= c - 1)
            {
                uint first = c & (0u - c);
                uint cells = first | (first << 1);
                if ((cells & taken) != 0) continue;
                blocks++;
                uint beside = ((cells << 1) | (cells >> 1)) & ~cells & rm;
                used[r - 1] |= cells;
                used[r] |= cells;
                near[r - 1] |= beside;
                near[r] |= beside;
                taken |= cells | beside;
            }
        }
        return blocks;
    }

    /// <summary>The first cells of the pairs of empty cells across a row that end a run on the right (the cell beyond is filled or off the board).</summary>
    private static uint RightEnds(uint x) => x & (x >> 1) & ~(x >> 2);

    /// <summary>The first cells of the pairs of empty cells across a row that start a run (the cell before is filled or off the board).</summary>
    private static uint LeftEnds(uint x) => x & (x >> 1) & ~(x << 1);

    /// <summary>The first cells of the runs of exactly two empty cells across a row.</summary>
    private static uint Run2(uint x) => x & (x >> 1) & ~(x << 1) & ~(x >> 2);

    /// <summary>
    /// Moves side s is sure to make however the opponent plays: its safe moves, plus what it wins
    /// in the race for its blocks and spare moves (<see cref="SureMoves"/>).
    /// </summary>
    private int Guaranteed(int safe, int blocks, int lone, int spare, bool movesFirst) =>
        safe + _sure.Get(blocks, lone, spare, movesFirst);

    private readonly SureMoves _sure;

    /// <summary>
    /// The safe-move bounds for side s to move here: +1 when its sure moves outlast every move the
    /// opponent can still make (it wins), −1 when the opponent answers each of its possible moves
    /// with one of the opponent's sure moves (it loses), 0 when they decide nothing.
    /// </summary>
    public int BoundVerdict(int s)
    {
        var (possible, safe, blocks, lone, spare) = Counts(s);
        var (oppPossible, oppSafe, oppBlocks, oppLone, oppSpare) = Counts(1 - s);
        if (Guaranteed(safe, blocks, lone, spare, movesFirst: true) > oppPossible) return 1;
        if (Guaranteed(oppSafe, oppBlocks, oppLone, oppSpare, movesFirst: false) >= possible) return -1;
        return 0;
    }
    private ulong Key(int s, out int mirror)
    {
        ulong best = _hash[s * 4];
        mirror = 0;
        if (!_options.Symmetry) return best;
        for (int f = 1; f < 4; f++)
        {
            ulong h = _hash[s * 4 + f];
            if (h < best)
            {
                best = h;
                mirror = f;
            }
        }
        return best;
    }

    /// <param name="boundsTried">The parent already applied the bounds to this position while ordering its moves (they did not decide it).</param>
    /// <param name="expectWin">
    /// Whether the side to move is expected to win here (the node types of common practice): the
    /// first reply searched from an expected win is expected lost; every other reply is expected won.
    /// </param>
    private bool Wins(int s, int ply, bool boundsTried, bool expectWin)
    {
        Nodes++;
        if ((Nodes & 4095) == 1 && _spent()) _stop.Set();
        if (_stop.IsSet) return false;
        T me = _board[s];
        int w = _shape.Width[s];
        if ((me & (me >> w)) == T.Zero) return false;
        if (_options.SafeMoveBounds && !boundsTried)
        {
            int verdict = BoundVerdict(s);
            if (verdict != 0) return verdict > 0;
        }
        ulong key = Key(s, out int mirror);
        if (_table.TryGet(key, out bool known, out _)) return known;
        if (_leaves is not null && _leaves.TryDecide(me, s, out bool summed))
        {
            // Stored (without a move) so that the parent's child lookup finds it as it would a searched node.
            _table.Store(key, summed, OutcomeTable.NoMove, 1);
            return summed;
        }

        long start = Nodes;
        Span<int> moves = stackalloc int[_shape.Cells];
        Span<sbyte> verdicts = stackalloc sbyte[_shape.Cells];
        int n = Generate(s, ply, moves, verdicts);
        for (int k = 0; k < n; k++)
        {
            if (verdicts[k] <= 0) continue;
            // A move after which the opponent loses by the bounds.
            _table.Store(key, true, _shape.MirrorMove[s][mirror][moves[k]], 1);
            return true;
        }
        if (_options.ChildLookup)
        {
            for (int k = 0; k < n; k++)
            {
                int i = moves[k];
                if (_table.TryGet(ChildKey(s, i), out bool replyWins, out _) && !replyWins)
                {
                    _table.Store(key, true, _shape.MirrorMove[s][mirror][i], 1);
                    return true;
                }
            }
        }
        // Whether Generate applied the bounds to every child (then a searched child is one they left open).
        bool judged = _options.SafeMoveBounds && _options.ChildBounds && _options.CountOrdering && _options.EvaluationOrdering;
        int stubborn = -1;
        long stubbornWork = -1;
        T other = _board[1 - s];
        // With threads sharing the tree: this node is marked while its moves are searched, and a
        // child another thread is searching is put off until the others are done (by then it is
        // usually in the table). The first move of an expected win is never put off: there the
        // other thread helps inside it rather than trying the next move.
        bool share = _busy is not null && ply < _busy.Depth;
        int mark = share ? _busy!.Enter(key) : -1;
        Span<int> later = share ? stackalloc int[n] : [];
        int put = 0, tried = 0;
        for (int pass = 0; pass < 2; pass++)
        {
            int count = pass == 0 ? n : put;
            for (int q = 0; q < count; q++)
            {
                int k = pass == 0 ? q : later[q];
                int i = moves[k];
                // The opponent wins there by the bounds: this move loses, nothing to search.
                if (verdicts[k] < 0) continue;
                if (pass == 0 && share && (tried > 0 || !expectWin) && _busy!.IsBusy(ChildKey(s, i)))
                {
                    later[put++] = k;
                    continue;
                }
                long before = Nodes;
                if (ply < ShownPlies)
                {
                    (_lineMove[ply], _linePlace[ply], _lineOpen[ply]) = (i, tried + 1, n);
                    Volatile.Write(ref _lineDepth, ply + 1);
                }
                Play(s, i);
                bool replyWins = Wins(1 - s, ply + 1, judged, expectWin: !expectWin || tried > 0);
                Undo(s, i, me, other);
                tried++;
                if (_stop.IsSet)
                {
                    if (share) _busy!.Leave(mark);
                    return false;
                }
                if (!replyWins)
                {
                    if (share) _busy!.Leave(mark);
                    Reward(s, ply, i, Nodes - before);
                    _table.Store(key, true, _shape.MirrorMove[s][mirror][i], Nodes - start);
                    return true;
                }
                if (Nodes - before > stubbornWork)
                {
                    stubbornWork = Nodes - before;
                    stubborn = i;
                }
            }
        }
        if (share) _busy!.Leave(mark);
        _table.Store(key, false, stubborn < 0 ? OutcomeTable.NoMove : _shape.MirrorMove[s][mirror][stubborn], Nodes - start);
        return false;
    }

    /// <summary>The table key of the position after side s plays top cell i (from the incremental hashes, without playing it).</summary>
    private ulong ChildKey(int s, int i)
    {
        var d = _shape.HashDelta[s];
        int o = (1 - s) * 4, at = i * 8 + o;
        ulong child = _hash[o] ^ d[at];
        if (_options.Symmetry)
            for (int f = 1; f < 4; f++) child = Math.Min(child, _hash[o + f] ^ d[at + f]);
        return child;
    }

    /// <summary>Score of a proven win in the depth-limited search (minus the plies to reach it).</summary>
    public const int ProvenWin = 10_000;

    /// <summary>
    /// Depth-limited negamax score of side s to move, for play where the board cannot be solved:
    /// proven outcomes (no move, the safe-move bounds, the table) score ±<see cref="ProvenWin"/>;
    /// at the horizon the evaluation is the same counts, own minus the opponent's
    /// (possible moves + 3 × safe moves). Moves in the order of the exact search.
    /// </summary>
    public int Score(int s, int depth, int alpha, int beta, int ply = 0)
    {
        Nodes++;
        if ((Nodes & 4095) == 1 && _spent()) _stop.Set();
        if (_stop.IsSet) return 0;
        T me = _board[s];
        int w = _shape.Width[s];
        if ((me & (me >> w)) == T.Zero) return -ProvenWin + ply;
        var (possible, safe, blocks, lone, spare) = Counts(s);
        var (oppPossible, oppSafe, oppBlocks, oppLone, oppSpare) = Counts(1 - s);
        if (Guaranteed(safe, blocks, lone, spare, movesFirst: true) > oppPossible) return ProvenWin - ply;
        if (Guaranteed(oppSafe, oppBlocks, oppLone, oppSpare, movesFirst: false) >= possible) return -ProvenWin + ply;
        if (_table.TryGet(Key(s, out _), out bool known, out _)) return known ? ProvenWin - ply : -ProvenWin + ply;
        if (depth <= 0) return possible + 3 * safe - oppPossible - 3 * oppSafe;
        Span<int> moves = stackalloc int[_shape.Cells];
        int n = Generate(s, ply, moves);
        T other = _board[1 - s];
        int best = -ProvenWin - 1;
        for (int k = 0; k < n; k++)
        {
            int i = moves[k];
            Play(s, i);
            int v = -Score(1 - s, depth - 1, -beta, -alpha, ply + 1);
            Undo(s, i, me, other);
            if (_stop.IsSet) return 0;
            if (v > best) best = v;
            if (v > alpha) alpha = v;
            if (alpha >= beta)
            {
                Reward(s, ply, i, 1L << Math.Min(depth, 40));
                break;
            }
        }
        return best;
    }

    private void Reward(int s, int ply, int move, long work)
    {
        int slot = Math.Min(ply, MaxPly - 1) * 2;
        if (_options.Killers && _killers[slot] != move)
        {
            _killers[slot + 1] = _killers[slot];
            _killers[slot] = move;
        }
        if (!_options.History) return;
        var h = _history[s];
        h[move] += 1 + BitOperations.Log2((ulong)Math.Max(1, work));
        if (h[move] > 1 << 20)
            for (int j = 0; j < h.Length; j++) h[j] >>= 1;
    }

    /// <summary>Writes the moves of side s into the span in search order; returns how many.</summary>
    private int Generate(int s, int ply, Span<int> moves) => Generate(s, ply, moves, []);

    /// <summary>
    /// As <see cref="Generate(int, int, Span{int})"/>; when <paramref name="verdicts"/> has room and
    /// the evaluation ordering has computed the counts after a move anyway, also the safe-move
    /// bounds of the child: +1 when the opponent, to move there, loses by them (then that move
    /// alone is returned), 0 when they leave it open. Moves after which the opponent wins by them
    /// are left out of the list (−1 only with the skip-safe-moves experiment, which keeps them).
    /// </summary>
    private int Generate(int s, int ply, Span<int> moves, Span<sbyte> verdicts)
    {
        bool judge = verdicts.Length >= moves.Length && _options.SafeMoveBounds && _options.ChildBounds;
        T b = _board[s];
        int w = _shape.Width[s];
        T tops = b & (b >> w);
        // Left cells of the opponent's dominoes (horizontal in this view) and the protected cells.
        T oppPairs = b & (b >> 1) & _notLastColumn[s];
        T leftPairs = b & (b << 1) & _notFirstColumn[s];
        T prot = b & ~oppPairs & ~leftPairs;
        // Per move, in generation order: cell, cheap gain, safe, verdict; the order is a sorted list of packed keys.
        Span<int> cells = stackalloc int[moves.Length];
        Span<int> gains = stackalloc int[moves.Length];
        Span<bool> safeMoves = stackalloc bool[moves.Length];
        Span<sbyte> judged = stackalloc sbyte[moves.Length];
        Span<long> order = stackalloc long[moves.Length];
        int slot = Math.Min(ply, MaxPly - 1) * 2;
        int k1 = _killers[slot], k2 = _killers[slot + 1];
        var hist = _history[s];
        bool skipSafe = _options.SkipSafeMoves;
        bool evaluate = _options.CountOrdering && _options.EvaluationOrdering;
        int n = 0, safeCount = 0;
        // First pass: the moves with what they take and spend, cheap to count.
        for (T t = tops; t != T.Zero; t &= t - T.One)
        {
            int i = int.CreateTruncating(T.TrailingZeroCount(t));
            int j = i + w;
            bool safe = Bit(prot, i) && Bit(prot, j);
            int gain = 0;
            if (_options.CountOrdering)
            {
                int oppTaken = Bit(oppPairs, i).AsInt() + Bit(oppPairs, i - 1).AsInt() + Bit(oppPairs, j).AsInt() + Bit(oppPairs, j - 1).AsInt();
                int ownSpent = Bit(tops, i - w).AsInt() + Bit(tops, j).AsInt();
                gain = 2 * oppTaken - ownSpent;
            }
            if (safe) safeCount++;
            cells[n] = i;
            gains[n] = gain;
            safeMoves[n] = safe;
            judged[n] = 0;
            order[n] = Pack(Key(gain, safe, i, k1, k2, hist), n);
            n++;
        }
        if (evaluate)
        {
            // When the bounds are applied to the children, look at them in the cheap order first:
            // the first child the opponent loses by them ends the generation (the move wins).
            // Only the first few places of the cheap order matter: a child the bounds settle is
            // nearly always among them, and when none is, every child is counted anyway.
            if (judge) SelectFirst(order, n, 4);
            // The position each move leaves, by the same counts as the bounds, on the rows of both
            // views: a move at row r, column c clears column c in rows r and r + 1 of its own view,
            // and columns r and r + 1 of row c in the other view (the transpose, BoardShape).
            Span<uint> ownRows = stackalloc uint[_shape.Height[s]];
            Span<uint> otherRows = stackalloc uint[_shape.Height[1 - s]];
            Rows(s, ownRows);
            Rows(1 - s, otherRows);
            for (int k = 0; k < n; k++)
            {
                int at = Unpack(order[k]), i = cells[at];
                int r = i / w, c = i - r * w;
                uint bit = 1u << c;
                uint top = ownRows[r], bottom = ownRows[r + 1], row = otherRows[c];
                ownRows[r] = top & ~bit;
                ownRows[r + 1] = bottom & ~bit;
                otherRows[c] = row & ~(3u << r);
                var (p1, s1, b1, v1, x1) = Counts(s, ownRows);
                var (p2, s2, b2, v2, x2) = Counts(1 - s, otherRows);
                ownRows[r] = top;
                ownRows[r + 1] = bottom;
                otherRows[c] = row;
                int gain = 4 * (s1 - s2) + 2 * (p1 - p2) + gains[at];
                order[k] = Pack(Key(gain, safeMoves[at], i, k1, k2, hist), at);
                if (!judge) continue;
                // The very tests the child would make first (Wins), settled here without visiting it.
                if (p2 == 0 || Guaranteed(s1, b1, v1, x1, movesFirst: false) >= p2)
                {
                    moves[0] = i;
                    verdicts[0] = 1;
                    return 1;
                }
                judged[at] = Guaranteed(s2, b2, v2, x2, movesFirst: true) > p1 ? (sbyte)-1 : (sbyte)0;
            }
        }
        if (judge && !skipSafe)
        {
            // A move after which the opponent wins by the bounds is never searched nor looked up:
            // leave it out, so the sort and the child lookups see only the moves left open.
            int open = 0;
            for (int k = 0; k < n; k++)
                if (judged[Unpack(order[k])] >= 0) order[open++] = order[k];
            n = open;
        }
        if (skipSafe)
            for (int k = 0; k < n; k++)
            {
                int at = Unpack(order[k]);
                if (safeMoves[at]) order[k] = Pack(int.MinValue, at);
            }
        Sort(order, n);
        for (int k = 0; k < n; k++)
        {
            int at = Unpack(order[k]);
            moves[k] = cells[at];
            if (judge) verdicts[k] = judged[at];
        }
        // The experiment of skipping safe moves: drop them (sorted last) unless nothing else is left.
        if (skipSafe && safeCount < n) n -= safeCount;
        return n;
    }

    /// <summary>A sort key and the move's place in generation order in one number; equal keys keep generation order.</summary>
    private static long Pack(int key, int at) => ((long)key << 8) | (long)(255 - at);

    private static int Unpack(long packed) => 255 - (int)(packed & 255);

    /// <summary>The sort key of a move: its gain, safe moves last, then history; killers first when they are on.</summary>
    private int Key(int gain, bool safe, int i, int k1, int k2, int[] hist)
    {
        int score = 0;
        if (_options.CountOrdering) score = safe ? 0 : (Math.Clamp(gain, -250, 250) + 256) << 21;
        if (_options.History) score += hist[i];
        if (_options.Killers)
        {
            if (i == k1) score = int.MaxValue;
            else if (i == k2) score = int.MaxValue - 1;
        }
        return score;
    }

    /// <summary>Moves the <paramref name="places"/> largest entries to the front, largest first; the rest stay in any order.</summary>
    private static void SelectFirst(Span<long> order, int n, int places)
    {
        for (int a = 0; a < Math.Min(places, n - 1); a++)
        {
            int best = a;
            for (int c = a + 1; c < n; c++)
                if (order[c] > order[best]) best = c;
            (order[a], order[best]) = (order[best], order[a]);
        }
    }

    /// <summary>Insertion sort, largest first: lists are short and mostly ordered already.</summary>
    private static void Sort(Span<long> order, int n)
    {
        for (int a = 1; a < n; a++)
        {
            long x = order[a];
            int c = a - 1;
            while (c >= 0 && order[c] < x)
            {
                order[c + 1] = order[c];
                c--;
            }
            order[c + 1] = x;
        }
    }

    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]
    private static bool Bit(T x, int i) => i >= 0 && ((x >> i) & T.One) != T.Zero;
}

internal static class BoolExtensions
{
    public static int AsInt(this bool b) => b ? 1 : 0;
}
