using System.Diagnostics;
using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Search.Board;
using Bramble.Values;

namespace Bramble.Bench;

/// <summary>
/// The whole-board search with each ingredient switched off in turn, on the same boards: nodes
/// (deterministic with one thread) and wall time. Run with
/// <c>dotnet run -c Release --project bench/Bramble.Bench.csproj -- boards 6x6 6x7 7x7</c>;
/// <c>--only NAME</c> runs one configuration, <c>--threads N</c> sets the threads.
/// </summary>
public static class BoardAblation
{
    public static void Run(string[] args)
    {
        var boards = new List<string>();
        string? only = null;
        int threads = 1;
        int capSeconds = 600;
        int? log2 = null;
        Side[] sides = [Side.Left, Side.Right];
        for (int i = 0; i < args.Length; i++)
        {
            if (args[i] == "--only") only = args[++i];
            else if (args[i] == "--threads") threads = int.Parse(args[++i]);
            else if (args[i] == "--first") sides = args[++i] == "left" ? [Side.Left] : [Side.Right];
            else if (args[i] == "--cap") capSeconds = int.Parse(args[++i]);
            else if (args[i] == "--table") log2 = int.Parse(args[++i]);
            else boards.Add(args[i]);
        }
        var all = new BoardSearchOptions { Threads = threads, TableLog2 = log2 };
        var configs = new (string Name, BoardSearchOptions Options)[]
        {
            ("all", all),
            ("no-bounds", all with { SafeMoveBounds = false }),
            ("no-symmetry", all with { Symmetry = false }),
            ("no-count-order", all with { CountOrdering = false }),
            ("no-eval-order", all with { EvaluationOrdering = false }),
            ("no-child-lookup", all with { ChildLookup = false }),
            ("killers", all with { Killers = true }),
            ("no-history", all with { History = false }),
            ("killers-no-history", all with { Killers = true, History = false }),
            ("no-blocks", all with { ProtectiveBlocks = false }),
            ("no-run-end-blocks", all with { RunEndBlocks = false }),
            ("no-block-margin", all with { BlockMargin = false }),
            ("no-lone-spares", all with { LoneSpares = false }),
            ("no-child-bounds", all with { ChildBounds = false }),
            ("split-below-root", all with { SplitBelowRoot = true, ShareTree = false }),
            ("root-moves", all with { ShareTree = false }),
            ("share-tree-16", all with { ShareTree = true, ShareDepth = 16 }),
            ("share-tree-32", all with { ShareTree = true, ShareDepth = 32 }),
            ("skip-safe", all with { SkipSafeMoves = true }),
            ("region-leaves", all with { RegionLeaves = true }),
            ("region-leaves-8", all with { RegionLeaves = true, RegionLeafCells = 8 }),
            ("region-leaves-16", all with { RegionLeaves = true, RegionLeafCells = 16 }),
            ("region-leaves-0", all with { RegionLeaves = true, RegionLeafCells = 0 }),
            ("no-bounds+region-leaves", all with { SafeMoveBounds = false, RegionLeaves = true }),
            ("no-bounds+region-leaves-16", all with { SafeMoveBounds = false, RegionLeaves = true, RegionLeafCells = 16 }),
        };
        var rules = Rulesets.Get("domineering");
        Console.WriteLine("| board | first | configuration | winner | nodes | ms |");
        Console.WriteLine("|---|---|---|---|---|---|");
        foreach (var text in boards)
        {
            foreach (var (name, options) in configs)
            {
                if (only is not null && name != only) continue;
                foreach (var side in sides)
                {
                    var position = (DomineeringPosition)rules.Parse(text);
                    var solver = new WholeBoard(options);
                    var clock = Stopwatch.StartNew();
                    // Ten minutes at most per measurement unless told (--cap): the machine is shared.
                    var answer = solver.Solve(position, side, () => clock.ElapsedMilliseconds > capSeconds * 1000L);
                    string winner = answer.Win is { } w ? (w == (side == Side.Left) ? "left" : "right") : "unknown";
                    Console.WriteLine($"| {text} | {side.Word()} | {name} | {winner} | {answer.Nodes:N0} | {clock.ElapsedMilliseconds:N0} |" + (answer.Win is null ? $" root moves searched {answer.RootMovesSearched}/{answer.RootMoves}" : ""));
                }
            }
        }
    }
}
