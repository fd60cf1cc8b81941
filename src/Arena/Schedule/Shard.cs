namespace Bramble.Arena.Schedule;

/// <summary>
/// <c>--shard K/N</c>: this run plays the games whose id ≡ K (mod N). K may run 0…N−1 or 1…N (a
/// job array counts from either), K = N meaning the same games as K = 0.
/// </summary>
public readonly record struct Shard(int K, int N)
{
    public static Shard Whole => new(0, 1);

    public bool IsWhole => N == 1;

    public bool Contains(int gameId) => ((gameId - K) % N + N) % N == 0;

    /// <summary>Parses <c>K/N</c>; false (with the reason) when it is not that.</summary>
    public static bool TryParse(string text, out Shard shard, out string problem)
    {
        shard = Whole;
        var parts = text.Split('/');
        if (parts.Length != 2 || !int.TryParse(parts[0], out var k) || !int.TryParse(parts[1], out var n))
        {
            problem = $"'{text}' is not K/N (e.g. 3/8)";
            return false;
        }
        if (n < 1 || k < 0 || k > n)
        {
            problem = $"'{text}': need N ≥ 1 and 0 ≤ K ≤ N";
            return false;
        }
        shard = new Shard(k, n);
        problem = "";
        return true;
    }

    /// <summary>Journal path of this shard: <c>x.jsonl</c> becomes <c>x.shard-3-of-8.jsonl</c>.</summary>
    public string JournalPath(string path)
    {
        if (IsWhole) return path;
        var folder = Path.GetDirectoryName(path) ?? "";
        return Path.Combine(folder, $"{Path.GetFileNameWithoutExtension(path)}.shard-{K}-of-{N}{Path.GetExtension(path)}");
    }

    public override string ToString() => $"{K}/{N}";
}
