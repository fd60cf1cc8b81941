using Bramble.Values;

namespace Bramble.Rules;

/// <summary>
/// One ruleset: parsing, generation and exact local values. Adding a ruleset means one folder
/// under src/Rules plus a registration line in <see cref="Rulesets"/>.
/// </summary>
public interface IRuleset
{
    string Name { get; }

    /// <summary>Parses the ruleset's position notation (docs/&lt;ruleset&gt;.md); throws <see cref="PositionSyntaxException"/>.</summary>
    IPosition Parse(string text);

    /// <summary>
    /// The exact canonical value of a position (the sum of its components' values), memoised by
    /// normal key in <paramref name="context"/>. Throws <see cref="BudgetExceededException"/> when
    /// the context's budget runs out.
    /// </summary>
    Game Value(IPosition position, ValueContext context);

    /// <summary>Generator names for <c>bramble generate</c>.</summary>
    IReadOnlyList<string> Generators { get; }

    /// <summary>Reproducible random positions, one notation string each.</summary>
    IReadOnlyList<string> Generate(string generator, int count, int size, int seed, string? colours = null);
}
