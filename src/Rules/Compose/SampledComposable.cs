using Bramble.Values;

namespace Bramble.Rules.Compose;

/// <summary>
/// The stand-in for a ruleset that does not list its components: components of the positions
/// its own generators make, at each size, deduplicated by normal key. A sample, not a listing, so
/// a search over it proves nothing when it finds nothing; and it makes no sums (it does not know
/// how to set the ruleset's components side by side).
/// </summary>
internal sealed class SampledComposable(IRuleset ruleset) : IComposable
{
    private const int PerGenerator = 200;

    public string SizeUnit => (ruleset as Database.IComponentCatalogue)?.SizeUnit ?? "units";

    public int ListingLimit => 12;

    public int DefaultSearchSize => 8;

    public IEnumerable<IPosition> ComponentsOfSize(int size)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var generator in ruleset.Generators)
        {
            IReadOnlyList<string> texts;
            try
            {
                texts = ruleset.Generate(generator, PerGenerator, size, seed: size);
            }
            catch (Exception e) when (e is not BudgetExceededException and not OutOfMemoryException)
            {
                // A generator that cannot make positions of this size (some reject it, some fail
                // outright on tiny sizes) only leaves this sample smaller.
                continue;
            }
            foreach (var text in texts)
                foreach (var part in ruleset.Parse(text).Components())
                    if (part.Size == size && seen.Add(part.NormalKey)) yield return part;
        }
    }

    public IPosition SumOf(IReadOnlyList<IPosition> components) => components.Count == 1
        ? components[0]
        : throw new NotSupportedException($"{ruleset.Name} cannot set components side by side");

    public int LeastSize(Game target, GameStore store) => target == store.Zero ? 0 : 1;
}
