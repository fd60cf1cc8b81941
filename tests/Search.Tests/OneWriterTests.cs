using Bramble.Rules;
using Bramble.Values;

namespace Bramble.Search.Tests;

/// <summary>
/// One value, one spelling: the value the perfect player reports (the engine's <c>note value=</c>)
/// is written by the same writer as <c>bramble value</c>, not as a sum of its parts.
/// </summary>
public class OneWriterTests
{
    [Theory]
    [InlineData("{1|1/2} + *")]
    [InlineData("{3|-1} + 1/2")]
    [InlineData("* + ↑ + 2")]
    public void ThePlayersValueIsWrittenAsValueWritesIt(string text)
    {
        var forms = Rulesets.Get("forms");
        var position = forms.Parse(text);
        var decision = new PerfectPlayer().Choose(position, Side.Left, TimeSpan.FromMinutes(1));
        var store = new GameStore();
        // The expected spelling: the canonical sum, written by GameStore.Format (what 'value' prints).
        Assert.Equal(store.Format(store.Parse(text)), decision.Value);
    }
}
