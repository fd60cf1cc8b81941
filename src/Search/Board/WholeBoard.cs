using System.Diagnostics;
using System.Numerics;
using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Values;

namespace Bramble.Search.Board;

/// <summary>What a whole-board solve found.</summary>
/// <param name="Win">Whether the side to move wins; null when the budget ran out first.</param>
/// <param name="Move">A winning first move when it wins; when it loses, the most stubborn defence (the move whose refutation took the most nodes).</param>
/// <param name="Line">The principal line from the root: winning moves for the winner, stubborn ones for the loser.</param>
public sealed record BoardAnswer(bool? Win, Move? Move, long Nodes, long ElapsedMs, IReadOnlyList<Move> Line, int RootMoves, int RootMovesSearched);

/// <summary>Progress of a running solve, for a report on stderr.</summary>
/// <param name="Below">The moves being searched below the root move, a ply each (the opponent's reply first), with each one's place (from 1) among the moves left open there and how many those are; empty when not known.</param>
public readonly record struct BoardProgress(long Nodes, long ElapsedMs, int RootMoveIndex, int RootMoves, Move RootMove, IReadOnlyList<(Move Move, int Place, int Open)> Below);

/// <summary>
/// Solves whole Domineering boards of up to 128 cells with <see cref="BoardSearch{T}"/>: picks the
/// word size, splits the root moves over the threads (they share one <see cref="OutcomeTable"/>),
/// and reads the principal line back from the table. The table is kept between solves of the same
/// board shape, so the second side to move, and later moves of a game, start from what is known.
/// </summary>
public sealed class WholeBoard
{
    private OutcomeTable? _table;
    private BoardShape? _shape;

    public WholeBoard(BoardSearchOptions? options = null) => Options = options ?? new BoardSearchOptions();

    public BoardSearchOptions Options { get; }

    // What a running solve is doing, read by Current from another thread (for progress reports).
    private Func<long>? _liveNodes;
    private Stopwatch? _liveClock;
    private int _liveRoot = -1;
    private int[]? _liveMoves;
    private int _liveSide;
    private Func<int>? _liveRootCell;
    // The line below the root move: the plies a searcher is searching, the opponent's reply first.
    private Func<(int Cell, int Place, int Open)[]>? _liveLine;

    /// <summary>The table of the last shape solved (for saving and resuming).</summary>
    public OutcomeTable? Table => _table;

    /// <summary>
    /// The table size picked for a board of that many cells: bigger boards search more positions
    /// (8×8 took 13% fewer nodes with 2^26 buckets than with 2^24, bench/README.md), so from 2^16
    /// buckets (2 MiB) for small boards up to 2^24 (512 MiB) for 64 cells and 2^25 above, but never
    /// more than an eighth of the memory the process may use.
    /// </summary>
    public static int TableLog2For(int cells)
    {
        int log2 = cells <= 30 ? 16 : cells <= 42 ? 19 : cells <= 49 ? 21 : cells <= 56 ? 22 : cells <= 64 ? 24 : 25;
        long available = GC.GetGCMemoryInfo().TotalAvailableMemoryBytes;
        while (log2 > 16 && (32L << log2) > available / 8) log2--;
        return log2;
    }

    /// <summary>Whether the board fits the bitboards (at most 128 cells).</summary>
    public static bool Fits(Rules.Domineering.Board board) => board.Rows * board.Columns <= 128;

    public BoardAnswer Solve(DomineeringPosition position, Side toMove, Func<bool>? spent = null)
    {
        var board = position.Board;
        if (!Fits(board)) throw new ArgumentException("the whole-board search takes boards of at most 128 cells", nameof(position));
        if (_shape is null || _shape.Rows != board.Rows || _shape.Columns != board.Columns)
        {
            _shape = new BoardShape(board.Rows, board.Columns);
            _table = new OutcomeTable(Options.TableLog2 ?? TableLog2For(_shape.Cells));
        }
        var empty = new bool[_shape.Cells];
        for (int r = 0; r < board.Rows; r++)
            for (int c = 0; c < board.Columns; c++)
                empty[r * board.Columns + c] = board.IsEmpty(r, c);
        return _shape.Cells <= 64
            ? Run<ulong>(_shape, _table!, empty, toMove, spent)
            : Run<UInt128>(_shape, _table!, empty, toMove, spent);
    }

    /// <summary>
    /// Play where the board cannot be solved in time: iterative deepening of the depth-limited
    /// search (<see cref="BoardSearch{T}.Score"/>) until <paramref name="spent"/> says stop; the
    /// best root move of the last finished depth (the first move when not even depth 1 finished).
    /// </summary>
    public (Move Move, int Depth, int Score, long Nodes) Play(DomineeringPosition position, Side toMove, Func<bool> spent)
    {
        var board = position.Board;
        var shape = _shape is not null && _shape.Rows == board.Rows && _shape.Columns == board.Columns ? _shape : new BoardShape(board.Rows, board.Columns);
        if (!ReferenceEquals(shape, _shape))
        {
            _shape = shape;
            _table = new OutcomeTable(Options.TableLog2 ?? TableLog2For(shape.Cells));
        }
        var empty = new bool[shape.Cells];
        for (int r = 0; r < board.Rows; r++)
            for (int c = 0; c < board.Columns; c++)
                empty[r * board.Columns + c] = board.IsEmpty(r, c);
        return shape.Cells <= 64 ? Deepen<ulong>(shape, empty, toMove, spent) : Deepen<UInt128>(shape, empty, toMove, spent);
    }

    private (Move, int, int, long) Deepen<T>(BoardShape shape, bool[] empty, Side toMove, Func<bool> spent) where T : unmanaged, IBinaryInteger<T>
    {
        int s = toMove == Side.Left ? 0 : 1;
        var stop = new StopSignal();
        var search = new BoardSearch<T>(shape, _table!, stop, Options, spent);
        search.SetPosition(empty);
        var moves = search.OrderedMoves(s).ToList();
        if (moves.Count == 0) throw new InvalidOperationException("no move to play");
        int bestMove = moves[0], bestScore = int.MinValue, depth = 0;
        for (int d = 0; d < shape.Cells / 2 && !stop.IsSet; d++)
        {
            int alpha = -BoardSearch<T>.ProvenWin - 1, iterationBest = -1, iterationScore = int.MinValue;
            foreach (int m in moves)
            {
                var saved = search.Save(s);
                search.Play(s, m);
                int v = -search.Score(1 - s, d, -BoardSearch<T>.ProvenWin - 1, -alpha);
                search.Restore(s, m, saved);
                if (stop.IsSet) break;
                if (v > iterationScore)
                {
                    iterationScore = v;
                    iterationBest = m;
                }
                if (v > alpha) alpha = v;
            }
            if (stop.IsSet) break;
            (bestMove, bestScore, depth) = (iterationBest, iterationScore, d + 1);
            // The best move first at the next depth; a proven result needs no deeper look.
            moves.Remove(bestMove);
            moves.Insert(0, bestMove);
            if (Math.Abs(bestScore) >= BoardSearch<T>.ProvenWin - shape.Cells) break;
        }
        return (ToMove(shape, s, bestMove), depth, bestScore, search.Nodes);
    }

    /// <summary>What the running solve is doing (nodes, time, the root move being searched), or null between solves.</summary>
    public BoardProgress? Current
    {
        get
        {
            var (nodes, clock, moves, shape) = (_liveNodes, _liveClock, _liveMoves, _shape);
            if (nodes is null || clock is null || moves is null || shape is null) return null;
            int k = _liveRootCell is { } cell ? Array.IndexOf(moves, cell()) : Volatile.Read(ref _liveRoot);
            k = Math.Clamp(k, 0, moves.Length - 1);
            var below = new List<(Move, int, int)>();
            if (_liveLine is { } line)
            {
                var plies = line();
                for (int p = 0; p < plies.Length && below.Count < 3; p++)
                {
                    // Below the root the sides alternate, the opponent's reply first.
                    int side = (below.Count % 2 == 0) ? 1 - _liveSide : _liveSide;
                    below.Add((ToMove(shape, side, plies[p].Cell), plies[p].Place, plies[p].Open));
                }
            }
            return new BoardProgress(nodes(), clock.ElapsedMilliseconds, k, moves.Length, ToMove(shape, _liveSide, moves[k]), below);
        }
    }

    private const string TableMagic = "bramble-board-table/2";

    /// <summary>Writes the board shape and the table, so that a later solve of the same board can resume from it.</summary>
    public void SaveTable(Stream stream)
    {
        if (_shape is null || _table is null) throw new InvalidOperationException("nothing solved yet");
        using var w = new BinaryWriter(stream, System.Text.Encoding.UTF8, leaveOpen: true);
        w.Write(TableMagic);
        w.Write(_shape.Rows);
        w.Write(_shape.Columns);
        _table.Save(w);
    }

    /// <summary>Reads a table written by <see cref="SaveTable"/>; the next solve of a board of that shape starts from it.</summary>
    public void LoadTable(Stream stream)
    {
        using var r = new BinaryReader(stream, System.Text.Encoding.UTF8, leaveOpen: true);
        string magic = r.ReadString();
        if (magic != TableMagic)
            throw new InvalidDataException(magic.StartsWith("bramble-board-table/", StringComparison.Ordinal)
                ? $"the board table was saved by an earlier version in another layout ('{magic}', this version reads '{TableMagic}'); delete the file and solve again"
                : $"not a saved board table (it starts with '{magic}')");
        int rows = r.ReadInt32(), columns = r.ReadInt32();
        var shape = new BoardShape(rows, columns);
        // The table comes back at the size it was saved with, whatever this solver would pick.
        var table = OutcomeTable.Read(r);
        (_shape, _table) = (shape, table);
    }

    private BoardAnswer Run<T>(BoardShape shape, OutcomeTable table, bool[] empty, Side toMove, Func<bool>? spent)
        where T : unmanaged, IBinaryInteger<T>
    {
        var clock = Stopwatch.StartNew();
        var stop = new StopSignal();
        int s = toMove == Side.Left ? 0 : 1;
        var main = new BoardSearch<T>(shape, table, stop, Options, spent);
        main.SetPosition(empty);
        var rootMoves = main.OrderedMoves(s);
        if (rootMoves.Length == 0) return new BoardAnswer(false, null, 1, clock.ElapsedMilliseconds, [], 0, 0);

        if (Options.Threads > 1 && Options.SplitBelowRoot)
            return RunSplit<T>(shape, table, empty, s, rootMoves, spent, clock);
        if (Options.Threads > 1 && Options.ShareTree)
            return RunShared<T>(shape, table, empty, s, rootMoves, spent, clock);

        int threads = Math.Clamp(Options.Threads, 1, rootMoves.Length);
        var searchers = new BoardSearch<T>[threads];
        searchers[0] = main;
        for (int t = 1; t < threads; t++)
        {
            searchers[t] = new BoardSearch<T>(shape, table, stop, Options, spent);
            searchers[t].SetPosition(empty);
        }
        int next = -1, winner = -1, searched = 0;
        var work = new long[rootMoves.Length];
        _liveNodes = () => searchers.Sum(x => x?.Nodes ?? 0);
        _liveClock = clock;
        _liveMoves = rootMoves;
        _liveSide = s;
        // With one thread its line is below the root move shown; with more, it may be below another.
        if (threads == 1) _liveLine = main.SearchLine;

        void Worker(int t)
        {
            var search = searchers[t];
            while (!stop.IsSet)
            {
                int k = Interlocked.Increment(ref next);
                if (k >= rootMoves.Length) return;
                Volatile.Write(ref _liveRoot, k);
                long before = search.Nodes;
                var saved = search.Save(s);
                search.Play(s, rootMoves[k]);
                bool replyWins = search.Wins(1 - s);
                search.Restore(s, rootMoves[k], saved);
                work[k] = search.Nodes - before;
                if (stop.IsSet) return;
                Interlocked.Increment(ref searched);
                if (!replyWins)
                {
                    Interlocked.CompareExchange(ref winner, k, -1);
                    stop.Set();
                    return;
                }
            }
        }

        if (threads == 1) Worker(0);
        else RunThreads(threads, Worker);
        _liveNodes = null;
        _liveLine = null;
        long nodes = searchers.Sum(x => x.Nodes);
        bool? win = winner >= 0 ? true : searched == rootMoves.Length ? false : null;
        return Answer<T>(shape, table, empty, s, rootMoves, spent, clock, win, winner, work, nodes, searched);
    }

    /// <summary>
    /// All threads search the whole tree from the root at once, sharing the table; each puts off the
    /// moves another is searching (<see cref="BusyMarks"/>), so the work spreads out at every
    /// depth, not only over the root moves. The first thread to settle the root gives the answer.
    /// </summary>
    private BoardAnswer RunShared<T>(BoardShape shape, OutcomeTable table, bool[] empty, int s, int[] rootMoves, Func<bool>? spent, Stopwatch clock)
        where T : unmanaged, IBinaryInteger<T>
    {
        int threads = Options.Threads;
        var stop = new StopSignal();
        var busy = new BusyMarks(Options.ShareDepth);
        var searchers = new BoardSearch<T>[threads];
        for (int t = 0; t < threads; t++)
        {
            searchers[t] = new BoardSearch<T>(shape, table, stop, Options, spent, busy);
            searchers[t].SetPosition(empty);
        }
        _liveNodes = () => searchers.Sum(x => x.Nodes);
        _liveClock = clock;
        _liveMoves = rootMoves;
        _liveSide = s;
        _liveRootCell = () => searchers[0].RootMove;
        // This searcher starts at the root itself: its first ply is the root move.
        _liveLine = () => searchers[0].SearchLine().Skip(1).ToArray();
        int settled = 0;
        bool result = false;

        void Worker(int t)
        {
            bool wins = searchers[t].Wins(s);
            // The first thread back with an answer gives it and stops the others.
            if (stop.IsSet) return;
            if (Interlocked.CompareExchange(ref settled, 1, 0) == 0)
            {
                result = wins;
                stop.Set();
            }
        }

        RunThreads(threads, Worker);
        _liveNodes = null;
        _liveRootCell = null;
        _liveLine = null;
        long nodes = searchers.Sum(x => x.Nodes);
        var work = new long[rootMoves.Length];
        if (settled == 0)
            return new BoardAnswer(null, null, nodes, clock.ElapsedMilliseconds, [], rootMoves.Length, 0);
        // The move the table holds for the root: the winning one, or the most stubborn defence.
        var reader = new BoardSearch<T>(shape, table, new StopSignal(), Options, spent);
        reader.SetPosition(empty);
        int at = Array.IndexOf(rootMoves, reader.TableMove(s, out _));
        // A root the bounds decided has no move in the table: the first move that leaves the opponent lost.
        if (at < 0 && result) at = Array.FindIndex(rootMoves, m => Leaves(reader, s, m, lost: true));
        at = Math.Max(0, at);
        if (!result) work[at] = 1;
        return Answer<T>(shape, table, empty, s, rootMoves, spent, clock, result, result ? at : -1, work, nodes, rootMoves.Length);
    }

    /// <summary>Runs the worker on that many threads at once and waits for them all.</summary>
    private static void RunThreads(int threads, Action<int> worker)
    {
        var pool = new Thread[threads];
        for (int t = 0; t < threads; t++)
        {
            int id = t;
            // A deep recursion on a big board needs more than the default stack.
            pool[t] = new Thread(() => worker(id), 64 << 20) { IsBackground = true };
            pool[t].Start();
        }
        foreach (var th in pool) th.Join();
    }

    /// <summary>
    /// The answer of a solve: nothing more when it did not finish; else the winning root move (or,
    /// lost, the one whose refutation took the most nodes) and the principal line from it.
    /// </summary>
    private BoardAnswer Answer<T>(BoardShape shape, OutcomeTable table, bool[] empty, int s, int[] rootMoves, Func<bool>? spent,
        Stopwatch clock, bool? win, int winner, long[] work, long nodes, int searched)
        where T : unmanaged, IBinaryInteger<T>
    {
        if (win is null) return new BoardAnswer(null, null, nodes, clock.ElapsedMilliseconds, [], rootMoves.Length, searched);
        int best = winner >= 0 ? winner : Array.IndexOf(work, work.Max());
        // The line is read with a fresh signal: the one of the search may have been set by the winning thread.
        var reader = new BoardSearch<T>(shape, table, new StopSignal(), Options, spent);
        reader.SetPosition(empty);
        var line = PrincipalLine(reader, shape, s, rootMoves[best]);
        nodes += reader.Nodes;
        return new BoardAnswer(win, ToMove(shape, s, rootMoves[best]), nodes, clock.ElapsedMilliseconds, line, rootMoves.Length, searched);
    }

    /// <summary>
    /// Both cores on one root move at a time: the root moves are tried in order, and the threads
    /// share out the opponent's replies to the move being tried (each proves that the mover
    /// still wins after its reply). A reply after which the mover loses refutes the move and stops
    /// the other thread; a move all of whose replies are answered wins. A first move that wins —
    /// the usual case on boards the side to move wins — so gets both threads on its proof, where
    /// splitting the root moves themselves would leave the second thread on a move not needed.
    /// </summary>
    private BoardAnswer RunSplit<T>(BoardShape shape, OutcomeTable table, bool[] empty, int s, int[] rootMoves, Func<bool>? spent, Stopwatch clock)
        where T : unmanaged, IBinaryInteger<T>
    {
        int threads = Options.Threads;
        long nodes = 0;
        int winner = -1, searched = 0;
        var work = new long[rootMoves.Length];
        BoardSearch<T>[] searchers = [];
        _liveNodes = () => nodes + searchers.Sum(x => x?.Nodes ?? 0);
        _liveClock = clock;
        _liveMoves = rootMoves;
        _liveSide = s;
        bool outOfBudget = false;
        for (int k = 0; k < rootMoves.Length && winner < 0; k++)
        {
            Volatile.Write(ref _liveRoot, k);
            var stop = new StopSignal();
            var round = new BoardSearch<T>[threads];
            for (int t = 0; t < threads; t++)
            {
                round[t] = new BoardSearch<T>(shape, table, stop, Options, spent);
                round[t].SetPosition(empty);
                round[t].Play(s, rootMoves[k]);
            }
            searchers = round;
            var replies = round[0].OrderedMoves(1 - s);
            int next = -1, answered = 0;
            bool refuted = false;

            void Worker(int t)
            {
                var search = round[t];
                while (!stop.IsSet)
                {
                    int j = Interlocked.Increment(ref next);
                    if (j >= replies.Length) return;
                    var saved = search.Save(1 - s);
                    search.Play(1 - s, replies[j]);
                    bool moverWins = search.Wins(s);
                    search.Restore(1 - s, replies[j], saved);
                    if (stop.IsSet) return;
                    if (!moverWins)
                    {
                        refuted = true;
                        stop.Set();
                        return;
                    }
                    Interlocked.Increment(ref answered);
                }
            }

            // The first reply alone, as the move order makes it the likeliest refutation: only a
            // move that survives it gets both threads (young brothers wait, common practice).
            if (replies.Length > 0)
            {
                next = 0;
                var saved = round[0].Save(1 - s);
                round[0].Play(1 - s, replies[0]);
                bool moverWins = round[0].Wins(s);
                round[0].Restore(1 - s, replies[0], saved);
                if (!stop.IsSet && !moverWins) refuted = true;
                else if (!stop.IsSet) answered = 1;
            }
            if (!refuted && !stop.IsSet && replies.Length > 1) RunThreads(threads, Worker);
            long roundNodes = round.Sum(x => x.Nodes);
            nodes += roundNodes;
            work[k] = roundNodes;
            searchers = [];
            if (refuted) { searched++; continue; }
            if (answered == replies.Length) { searched++; winner = k; break; }
            outOfBudget = true;
            break;
        }
        _liveNodes = null;
        bool? win = winner >= 0 ? true : !outOfBudget && searched == rootMoves.Length ? false : null;
        return Answer<T>(shape, table, empty, s, rootMoves, spent, clock, win, winner, work, nodes, searched);
    }

    /// <summary>
    /// The line from the root: the first move given, then at each node the winner's winning move
    /// (from the table, checked, or found again) and the loser's stored most stubborn defence.
    /// </summary>
    private static List<Move> PrincipalLine<T>(BoardSearch<T> search, BoardShape shape, int s, int first)
        where T : unmanaged, IBinaryInteger<T>
    {
        var line = new List<Move> { ToMove(shape, s, first) };
        search.Play(s, first);
        int side = 1 - s;
        for (int ply = 1; ply < shape.Cells / 2 + 1; ply++)
        {
            var moves = search.OrderedMoves(side);
            if (moves.Length == 0) break;
            bool win = search.Wins(side);
            int move = search.TableMove(side, out _);
            if (win)
            {
                if (move < 0 || !Leaves(search, side, move, lost: true))
                {
                    move = -1;
                    foreach (int m in moves)
                        if (Leaves(search, side, m, lost: true)) { move = m; break; }
                }
            }
            else if (move < 0 || Array.IndexOf(moves, move) < 0) move = moves[0];
            if (move < 0) break;
            line.Add(ToMove(shape, side, move));
            search.Play(side, move);
            side = 1 - side;
        }
        return line;
    }

    private static bool Leaves<T>(BoardSearch<T> search, int side, int move, bool lost) where T : unmanaged, IBinaryInteger<T>
    {
        var saved = search.Save(side);
        search.Play(side, move);
        bool replyWins = search.Wins(1 - side);
        search.Restore(side, move, saved);
        return lost ? !replyWins : replyWins;
    }

    /// <summary>A top cell of view s as a board move: view 0 is the board, view 1 its transpose.</summary>
    public static Move ToMove(BoardShape shape, int s, int cell)
    {
        int r, c;
        if (s == 0)
        {
            r = cell / shape.Columns;
            c = cell % shape.Columns;
        }
        else
        {
            r = cell % shape.Rows;
            c = cell / shape.Rows;
        }
        return new Move(CellName.Index(r, c));
    }
}
