using Bramble.Rules.Forms;
using Bramble.Values;

namespace Bramble.Rules.Tests.Forms;

/// <summary>
/// Forms terms in the shared form of docs/values.md play exactly like the same terms written out
/// (the shared form is this project's own notation; the check is against the written-out text).
/// </summary>
public class SharedTermTests
{
    private readonly FormsRuleset _rules = new();

    [Theory]
    [InlineData("{#1,↑|#1 - 1} + #2 where #1 = {1|0}; #2 = {#1|*}", "{{1|0},↑|{1|0} - 1} + {{1|0}|*}")]
    [InlineData("({#1|0} where #1 = {2|1}) + {3|1} + ({#1|#1} where #1 = ↑)", "{{2|1}|0} + {3|1} + {↑|↑}")]
    [InlineData("-{#1|#1} where #1 = {1|*}", "-{{1|*}|{1|*}}")]
    public void SharedTermsPlayLikeTheTermsWrittenOut(string shared, string written)
    {
        var a = _rules.Parse(shared);
        var b = _rules.Parse(written);
        // The position's text reads back as the same position.
        Assert.Equal(a.Text, _rules.Parse(a.Text).Text);
        Compare(a, b, depth: 3);
    }

    /// <summary>Same moves, and after each move the same value and again the same moves, a few plies deep.</summary>
    private void Compare(IPosition a, IPosition b, int depth)
    {
        var store = new GameStore();
        var ca = new ValueContext(store);
        Assert.Equal(_rules.Value(b, ca), _rules.Value(a, ca));
        if (depth == 0) return;
        foreach (var side in new[] { Side.Left, Side.Right })
        {
            var ma = a.Moves(side);
            var mb = b.Moves(side);
            Assert.Equal(mb.Select(b.FormatMove), ma.Select(a.FormatMove));
            for (int i = 0; i < ma.Count; i++) Compare(a.Play(side, ma[i]), b.Play(side, mb[i]), depth - 1);
        }
    }
}
