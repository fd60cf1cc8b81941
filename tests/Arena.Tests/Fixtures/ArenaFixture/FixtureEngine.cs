using System.Diagnostics;
using System.Text;
using Bramble.Values;

namespace Bramble.Arena.Fixture;

/// <summary>
/// A twine/1 engine for the heaps ruleset, written by hand (not with the Wire codec, so the
/// harness is tested against an independent speaker of the protocol). It plays legal moves until
/// its misbehaviour is due — after <c>--after N</c> thinks, and with <c>--once FILE</c> only in the
/// first process to get there — and then does what <c>--mode</c> says:
/// good, crash, hang, garbage, illegal, none, huge, slow, stubborn, wrong-kind, noisy, exit-at-start,
/// spawn (starts a sleeping child at once, then plays well), orphan (starts <c>sleep 900</c> when
/// asked to think, then exits). <c>--pick</c> chooses how it plays well:
/// random (seeded), first, or perfect.
/// </summary>
public sealed class FixtureEngine
{
    private readonly string _mode;
    private readonly int _after;
    private readonly int _delayMs;
    private readonly string? _once;
    private readonly string _rulesets;
    private readonly string _pick;
    private readonly Bramble.Rules.ValueContext _values = new();
    private Random _random;
    private readonly Stream _out = Console.OpenStandardOutput();
    private readonly Lock _write = new();
    private readonly HeapsRuleset _rules = new();
    private HeapsPosition? _position;
    private int _thinks;
    private CancellationTokenSource? _thinking;
    private readonly string? _pidDir;

    public FixtureEngine(Dictionary<string, string> options)
    {
        _mode = options.GetValueOrDefault("mode", "good");
        _after = int.Parse(options.GetValueOrDefault("after", "0"));
        _delayMs = int.Parse(options.GetValueOrDefault("delay-ms", "0"));
        _once = options.GetValueOrDefault("once");
        _rulesets = options.GetValueOrDefault("rulesets", "heaps");
        _pick = options.GetValueOrDefault("pick", "random");
        _random = new Random(int.Parse(options.GetValueOrDefault("seed", "1")));
        _pidDir = options.GetValueOrDefault("pid-dir");
        if (options.TryGetValue("pid-dir", out var folder))
            File.WriteAllText(Path.Combine(folder, Environment.ProcessId.ToString()), _mode);
        if (_mode == "spawn")
        {
            var self = Environment.ProcessPath!;
            var info = new ProcessStartInfo(self) { UseShellExecute = false };
            if (Path.GetFileNameWithoutExtension(self) == "dotnet") info.ArgumentList.Add(typeof(FixtureEngine).Assembly.Location);
            info.ArgumentList.Add("sleeper");
            if (options.TryGetValue("pid-dir", out var dir)) { info.ArgumentList.Add("--pid-dir"); info.ArgumentList.Add(dir); }
            Process.Start(info);
        }
    }

    public int Run()
    {
        var input = new StreamReader(Console.OpenStandardInput(), new UTF8Encoding(false));
        while (input.ReadLine() is { } line)
        {
            var words = line.Split(' ');
            switch (words[0])
            {
                case "hello":
                    if (_mode == "exit-at-start") return 3;
                    Say($"welcome name=fixture-{_mode} version=1 rulesets={_rulesets} colour=green");
                    break;
                case "set":
                    // The harness seeds each game of a seeded match: chance starts afresh from the seed.
                    if (words.Length == 3 && words[1] == "seed") _random = new Random(int.Parse(words[2]));
                    Say("ok");
                    break;
                case "begin":
                    try
                    {
                        _position = (HeapsPosition)_rules.Parse(line[(line.IndexOf(' ', 6) + 1)..]);
                        Say($"ok components={_position.Components().Count} spare=1");
                    }
                    catch (Exception e)
                    {
                        Say($"err bad-position {e.Message.Replace('\n', ' ')}");
                    }
                    break;
                case "apply":
                    if (Due() && _mode == "wrong-kind")
                    {
                        Say("pick 1.0");
                        break;
                    }
                    try
                    {
                        var side = words[1] == "left" ? Side.Left : Side.Right;
                        _position = (HeapsPosition)_position!.Play(side, _position.ParseMove(words[2]));
                        Say("ok");
                    }
                    catch (Exception e)
                    {
                        Say($"err bad-move {e.Message.Replace('\n', ' ')}");
                    }
                    break;
                case "think":
                    _thinks++;
                    Think(words[1] == "left" ? Side.Left : Side.Right);
                    break;
                case "halt":
                    _thinking?.Cancel();
                    break;
                case "assess":
                    Say("err no-value the fixture does not assess");
                    break;
                case "bye":
                    Say("bye");
                    return 0;
                default:
                    Say($"err unknown-request {words[0]}");
                    break;
            }
        }
        return 0;
    }

    /// <summary>True when the misbehaviour is due now (and, with --once, claims it for this process).</summary>
    private bool Due()
    {
        if (_mode is "good" or "noisy" or "spawn" || _thinks <= _after) return false;
        if (_once is null) return true;
        try
        {
            using (File.Open(_once, FileMode.CreateNew)) { }
            return true;
        }
        catch (IOException)
        {
            return false;
        }
    }

    private void Think(Side side)
    {
        var moves = _position!.Moves(side);
        var pick = moves.Count == 0 ? "none" : _position.FormatMove(Choose(side, moves));
        if (_mode == "noisy")
        {
            for (var i = 0; i < 20; i++)
            {
                Say($"note nodes={i * 100} ms={i} line=1.0,2.0 mystery=yes");
                Console.Error.WriteLine($"thinking hard, step {i}");
            }
        }
        if (!Due())
        {
            Say("pick " + pick);
            return;
        }
        switch (_mode)
        {
            case "crash":
                Environment.Exit(3);
                break;
            case "orphan":
                // A grandchild started after the handshake that holds the engine's stdout, then the engine dies.
                var sleeper = Process.Start(new ProcessStartInfo("sleep") { ArgumentList = { "900" }, UseShellExecute = false })!;
                if (_pidDir is not null) File.WriteAllText(Path.Combine(_pidDir, sleeper.Id.ToString()), "sleep");
                Environment.Exit(3);
                break;
            case "hang":
                break;
            case "garbage":
                Say("blorp 42 ☃");
                break;
            case "illegal":
                Say("pick 99.0");
                break;
            case "none":
                Say("pick none");
                break;
            case "huge":
                Say("note line=" + new string('x', 2 << 20));
                break;
            case "slow":
            case "stubborn":
                var cancel = new CancellationTokenSource();
                _thinking = cancel;
                var honoursHalt = _mode == "slow";
                _ = Task.Run(async () =>
                {
                    try { await Task.Delay(_delayMs, honoursHalt ? cancel.Token : CancellationToken.None); }
                    catch (OperationCanceledException) { }
                    Say("pick " + pick);
                });
                break;
            default:
                Say("pick " + pick);
                break;
        }
    }

    /// <summary>random (seeded), first (the first legal move: deterministic), or perfect (a winning move when there is one).</summary>
    private Bramble.Rules.Move Choose(Side side, IReadOnlyList<Bramble.Rules.Move> moves)
    {
        if (_pick == "first") return moves[0];
        if (_pick == "perfect")
        {
            foreach (var move in moves)
            {
                var value = _rules.Value(_position!.Play(side, move), _values);
                if (_values.Store.OutcomeOf(value).WinnerMovingFirst(side.Other()) == side) return move;
            }
        }
        return moves[_random.Next(moves.Count)];
    }

    private void Say(string line)
    {
        var bytes = Encoding.UTF8.GetBytes(line + "\n");
        lock (_write)
        {
            try
            {
                _out.Write(bytes);
                _out.Flush();
            }
            catch (IOException)
            {
                Environment.Exit(0);
            }
        }
    }
}
