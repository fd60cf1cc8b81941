namespace Bramble.Values.Tests;

/// <summary>Algebraic laws on random games, checked by brute-force play on unsimplified trees.</summary>
public class LawTests
{
    [Fact]
    public void CanonicalisationPreservesValueByBruteForce()
    {
        var rng = new Random(101);
        var store = new GameStore();
        for (int i = 0; i < 400; i++)
        {
            var raw = TreeGame.Random(rng, 4);
            var canonical = raw.ToStore(store);
            var back = TreeGame.FromStore(store, canonical);
            // G = H iff G - H is a second-player win (the definition of equality, common practice).
            Assert.Equal(Outcome.P, new BruteForce().OutcomeOf(raw, TreeGame.Negate(back)));
            // Canonicalising again is the identity.
            Assert.Equal(canonical, back.ToStore(store));
        }
    }

    [Fact]
    public void OutcomeClassAgreesWithBruteForce()
    {
        var rng = new Random(202);
        var store = new GameStore();
        for (int i = 0; i < 400; i++)
        {
            var a = TreeGame.Random(rng, 3);
            var b = TreeGame.Random(rng, 3);
            var sum = store.Add(a.ToStore(store), b.ToStore(store));
            Assert.Equal(new BruteForce().OutcomeOf(a, b), store.OutcomeOf(sum));
        }
    }

    [Fact]
    public void OrderAgreesWithBruteForce()
    {
        // G ≤ H iff Left loses moving first in H - G... i.e. Right wins G - H moving second (definition of ≤, common practice).
        var rng = new Random(303);
        var store = new GameStore();
        for (int i = 0; i < 400; i++)
        {
            var a = TreeGame.Random(rng, 3);
            var b = TreeGame.Random(rng, 3);
            var bf = new BruteForce();
            bool leq = !bf.MoverWins([a, TreeGame.Negate(b)], Side.Left);
            Assert.Equal(leq, store.Leq(a.ToStore(store), b.ToStore(store)));
        }
    }

    [Fact]
    public void GroupLaws()
    {
        var rng = new Random(404);
        var store = new GameStore();
        var pool = Enumerable.Range(0, 60).Select(_ => TreeGame.Random(rng, 3).ToStore(store)).ToArray();
        for (int i = 0; i < 1500; i++)
        {
            var a = pool[rng.Next(pool.Length)];
            var b = pool[rng.Next(pool.Length)];
            var c = pool[rng.Next(pool.Length)];
            Assert.Equal(store.Zero, store.Add(a, store.Negate(a)));
            Assert.Equal(store.Add(a, b), store.Add(b, a));
            Assert.Equal(store.Add(store.Add(a, b), c), store.Add(a, store.Add(b, c)));
            Assert.Equal(a, store.Negate(store.Negate(a)));
            // ≤ is transitive and antisymmetric on canonical forms.
            if (store.Leq(a, b) && store.Leq(b, c)) Assert.True(store.Leq(a, c));
            if (store.Leq(a, b) && store.Leq(b, a)) Assert.Equal(a, b);
            // Comparison is translation invariant.
            Assert.Equal(store.Leq(a, b), store.Leq(store.Add(a, c), store.Add(b, c)));
        }
    }

    [Fact]
    public void StoresAgreeWhateverTheOrderOfConstruction()
    {
        // Equal games get equal ids within a store; two stores built in different orders print the same forms.
        var rng = new Random(505);
        var trees = Enumerable.Range(0, 200).Select(_ => TreeGame.Random(rng, 3)).ToArray();
        var s1 = new GameStore();
        var s2 = new GameStore();
        var f1 = trees.Select(t => s1.Format(t.ToStore(s1))).ToArray();
        var f2 = trees.Reverse().Select(t => s2.Format(t.ToStore(s2))).Reverse().ToArray();
        Assert.Equal(f1, f2);
    }
}
