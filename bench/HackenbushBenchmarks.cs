using BenchmarkDotNet.Attributes;
using Bramble.Rules;
using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Bench;

/// <summary>
/// What <c>bramble value hackenbush</c> does with a position text, short of printing: read the
/// text, split it into components, write each component's text, value each through one fresh
/// memo and game store, add the values, write them out and work out the measures the verb
/// prints (outcome, stops, mean, temperature, birthday, atomic weight). Runs on a big stack,
/// as the verb does.
/// </summary>
internal static class HackenbushValuePath
{
    public static readonly HackenbushRuleset Rules = new();

    public static int Value(string text) => BigStack.Run(() =>
    {
        var context = new ValueContext();
        var store = context.Store;
        var position = Rules.Parse(text);
        var parts = position.Components().Select(c => (c.Text, Value: Rules.Value(c, context))).ToList();
        var total = store.Sum(parts.Select(p => p.Value));
        int written = store.Format(total).Length + parts.Sum(p => p.Text.Length + store.Format(p.Value).Length);
        var measures = (store.OutcomeOf(total), store.LeftStop(total), store.RightStop(total), store.Mean(total),
            store.Temperature(total), store.Birthday(total), store.AtomicWeight(total));
        return written + measures.GetHashCode();
    });

    /// <summary>
    /// A sum of <paramref name="pieces"/> pieces, each a single block of <paramref name="edges"/>
    /// edges of random colours: a circuit through the ground of edges/2 nodes, then chords between
    /// random nodes of it (a chord from a node to itself is a loop, a repeated pair gives parallel
    /// edges). No shortcut applies to such a block: the subset search has to do all of it.
    /// </summary>
    public static string Blocks(int pieces, int edges, int seed)
    {
        var random = new Random(seed);
        var text = new List<string>();
        for (int p = 0; p < pieces; p++)
        {
            int circuit = edges / 2;
            var list = new List<string>();
            char Colour() => "BRG"[random.Next(3)];
            for (int v = 0; v < circuit; v++) list.Add($"{Colour()}{v}-{(v + 1) % circuit}");
            while (list.Count < edges)
            {
                int a = random.Next(circuit), b = random.Next(circuit);
                if (a != b) list.Add($"{Colour()}{a}-{b}");
            }
            text.Add("[" + string.Join(",", list) + "]");
        }
        return string.Join(" + ", text);
    }
}

/// <summary>
/// The 10^6-edge green graph (the <c>graphs</c> generator: a random tree plus chords to nearby
/// ancestors, some parallel edges and loops), read from its text, and valued the way the value
/// verb does it. Also the 10^5-edge blue-red tree(s) of the <c>trees</c> generator.
/// </summary>
[Config(typeof(SlowBenchmarkConfig))]
public class HackenbushLargeBenchmarks
{
    private string _green = "";
    private string _blueRed = "";

    [GlobalSetup]
    public void Setup()
    {
        _green = HackenbushValuePath.Rules.Generate("graphs", 1, 1_000_000, 2026, "G")[0];
        _blueRed = HackenbushValuePath.Rules.Generate("trees", 1, 100_000, 2027, "BR")[0];
    }

    /// <summary>Reading the 10^6-edge text into a position; returns its edge count.</summary>
    [Benchmark]
    public int ParseGreenGraph() => HackenbushValuePath.Rules.ParsePosition(_green).Size;

    [Benchmark]
    public int ValueGreenGraph() => HackenbushValuePath.Value(_green);

    [Benchmark]
    public int ValueBlueRedTree() => HackenbushValuePath.Value(_blueRed);
}

/// <summary>
/// Exact values the store has to work for: mixed trees (the <c>trees</c> generator with all
/// three colours: one to three trees of <see cref="Edges"/> edges in all). Larger sizes are left
/// out: at 1,000 edges one call takes minutes, longer than BenchmarkDotNet lets an in-process
/// benchmark run (bench/README.md gives that one measured call).
/// </summary>
[Config(typeof(OneRunConfig))]
public class HackenbushMixedTreeBenchmarks
{
    private string _text = "";

    [Params(250, 500)]
    public int Edges { get; set; } = 250;

    [GlobalSetup]
    public void Setup() => _text = HackenbushValuePath.Rules.Generate("trees", 1, Edges, 2028, "BRG")[0];

    [Benchmark]
    public int ValueMixedTree() => HackenbushValuePath.Value(_text);
}

/// <summary>
/// Sums of ten pieces with circuits of 16 edges of all colours: ten single 16-edge blocks
/// (<see cref="HackenbushValuePath.Blocks"/>, the hard case: every state is searched) and ten
/// 16-edge pieces of the <c>graphs</c> generator (short circuits hung on a tree).
/// </summary>
[Config(typeof(SlowBenchmarkConfig))]
public class HackenbushCircuitBenchmarks
{
    private string _blocks = "";
    private string _graphs = "";

    [GlobalSetup]
    public void Setup()
    {
        _blocks = HackenbushValuePath.Blocks(10, 16, 2029);
        _graphs = string.Join(" + ", HackenbushValuePath.Rules.Generate("graphs", 10, 16, 2030, "BRG"));
    }

    [Benchmark]
    public int TenBlocksOf16() => HackenbushValuePath.Value(_blocks);

    [Benchmark]
    public int TenGeneratedGraphsOf16() => HackenbushValuePath.Value(_graphs);
}
