// A minimal twine/1 engine (docs/protocol.md): it keeps the position and plays a random legal move.
// It uses Bramble's rulesets for the rules and speaks the protocol by hand, one reply per request.
using Bramble.Rules;
using Bramble.Values;

var random = new Random(args.Length > 0 ? int.Parse(args[0]) : 1);
IPosition? position = null;
while (Console.In.ReadLine() is { } line)
{
    var words = line.Split(' ');
    if (words[0] == "halt") continue; // we answer think at once, so there is never anything to stop
    string reply;
    try
    {
        reply = words[0] switch
        {
            "hello" => "welcome name=random-example version=1 rulesets=" + string.Join(',', Rulesets.All.Select(r => r.Name)),
            "set" => words.Length >= 3 && words[1] == "seed" ? Seed(int.Parse(words[2])) : $"err unknown-setting {words.ElementAtOrDefault(1)}",
            "begin" when words.Length >= 3 => Begin(words[1], line[(words[0].Length + words[1].Length + 2)..]),
            "apply" when words.Length >= 3 && position is not null => Apply(Side(words[1]), words[2]),
            "think" when words.Length >= 2 && position is not null => Think(Side(words[1])),
            "assess" => "err no-value this engine does not assess",
            "bye" => "bye",
            "begin" or "apply" or "think" => "err bad-request incomplete, or no game yet",
            _ => $"err unknown-request {words[0]}",
        };
    }
    catch (Exception e)
    {
        var code = words[0] switch { "begin" => "bad-position", "apply" => "bad-move", _ => "bad-request" };
        reply = $"err {code} {e.Message.ReplaceLineEndings(" ")}";
    }
    Console.Out.Write(reply + "\n");
    Console.Out.Flush();
    if (reply == "bye") return 0;
}
return 0;

string Seed(int seed) { random = new Random(seed); return "ok"; }
string Begin(string ruleset, string text) { position = Rulesets.Get(ruleset).Parse(text); return $"ok components={position.Components().Count}"; }
string Apply(Side side, string move) { position = position!.Play(side, position.ParseMove(move)); return "ok"; }
string Think(Side side) { var moves = position!.Moves(side); return moves.Count == 0 ? "pick none" : "pick " + position.FormatMove(moves[random.Next(moves.Count)]); }
Side Side(string word) => SideExtensions.TryParse(word, out var side) ? side : throw new FormatException($"not a side: {word}");
