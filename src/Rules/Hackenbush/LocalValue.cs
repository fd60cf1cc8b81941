using Bramble.Values;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// A value met while folding a piece down to the ground, kept in the cheapest form that holds
/// it, so that green parts stay plain ints (nim-sum is XOR) and blue-red parts plain dyadics, and
/// only genuinely mixed parts are interned in the game store:
/// <list type="bullet">
/// <item>Nim: the nimber *n (also 0);</item>
/// <item>Number: a dyadic (never 0, which is Nim 0);</item>
/// <item>Chain: a blue-red chain of edges still being read downwards, carrying a number; its
/// value is settled by the sign-expansion rule once the chain ends;</item>
/// <item>Game: a canonical game of the store.</item>
/// </list>
/// </summary>
internal readonly struct LocalValue
{
    public enum Form : byte { Nim, Number, Chain, Game }

    public readonly Form Kind;
    public readonly int Nim;
    public readonly Dyadic Number;
    public readonly Chain? Pending;
    public readonly Game Game;

    private LocalValue(Form kind, int nim, Dyadic number, Chain? chain, Game game)
    {
        Kind = kind; Nim = nim; Number = number; Pending = chain; Game = game;
    }

    public static readonly LocalValue Zero = default;

    public static LocalValue OfNimber(int n) => new(Form.Nim, n, default, null, default);
    public static LocalValue OfNumber(Dyadic x) => x.IsZero ? Zero : new(Form.Number, 0, x, null, default);
    public static LocalValue OfChain(Chain chain) => new(Form.Chain, 0, default, chain, default);

    public static LocalValue OfGame(GameStore store, Game g)
    {
        if (store.TryGetNimber(g, out int n)) return OfNimber(n);
        if (store.TryGetNumber(g, out var x)) return OfNumber(x);
        return new(Form.Game, 0, default, null, g);
    }

    public bool IsZero => Kind == Form.Nim && Nim == 0;
    public bool IsNimber => Kind == Form.Nim;
    public bool IsNumberLike => Kind is Form.Number or Form.Chain || IsZero;

    public Dyadic AsNumber() => Kind switch
    {
        Form.Number => Number,
        Form.Chain => Pending!.Settle(),
        _ when IsZero => Dyadic.Zero,
        _ => throw new InvalidOperationException("not a number"),
    };

    public Game ToGame(GameStore store) => Kind switch
    {
        Form.Nim => store.Nimber(Nim),
        Form.Number => store.Number(Number),
        Form.Chain => store.Number(Pending!.Settle()),
        _ => Game,
    };

    public static LocalValue Add(GameStore store, LocalValue a, LocalValue b)
    {
        if (a.IsZero) return b;
        if (b.IsZero) return a;
        if (a.Kind == Form.Nim && b.Kind == Form.Nim) return OfNimber(a.Nim ^ b.Nim);
        if (a.IsNumberLike && b.IsNumberLike) return OfNumber(a.AsNumber() + b.AsNumber());
        return OfGame(store, store.Add(a.ToGame(store), b.ToGame(store)));
    }

    /// <summary>
    /// A chain of blue and red edges read from the top down, carrying a number. Owned by exactly
    /// one vertex at a time (a chain only grows while each vertex has one thing hanging from it),
    /// so it can be extended in place.
    /// </summary>
    internal sealed class Chain(Dyadic carried)
    {
        private readonly List<sbyte> _topDown = new();
        private Dyadic? _settled;

        public void Extend(EdgeColour colour)
        {
            _topDown.Add((sbyte)colour.Sign());
            _settled = null;
        }

        public Dyadic Settle()
        {
            if (_settled is { } known) return known;
            var bottomUp = new sbyte[_topDown.Count];
            for (int i = 0; i < bottomUp.Length; i++) bottomUp[i] = _topDown[_topDown.Count - 1 - i];
            var value = SignExpansion.Under(bottomUp, carried);
            _settled = value;
            return value;
        }
    }
}
