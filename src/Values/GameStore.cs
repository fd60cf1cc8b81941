using System.Runtime.InteropServices;
using Microsoft.Extensions.ObjectPool;

namespace Bramble.Values;

/// <summary>
/// Interns canonical short games. Every game the store hands out is in canonical form and equal
/// games get equal ids, so "=" is an int compare and memo tables are keyed by ids. Numbers and
/// the x + n·↑ + *m family carry a compact tag beside their record so sums and comparisons
/// among them are arithmetic; everything else is a node with sorted option-id arrays.
/// A store is not thread-safe: use one per thread.
/// </summary>
public sealed partial class GameStore
{
    // Per-id records, in parallel lists indexed by id. Options of number records are made on
    // first request (a number such as 2^-100000 would otherwise drag a chain of 100000 records
    // into existence just by being named).
    private readonly List<int[]?> _left = new();
    private readonly List<int[]?> _right = new();
    private readonly List<Dyadic?> _number = new();
    private readonly List<UpStarTag?> _tag = new();
    // What kind of record an id is, read on the hot paths instead of the nullable structs above.
    private readonly List<byte> _kind = new();
    private const byte General = 0, NumberKind = 1, TaggedKind = 2;

    private readonly Dictionary<OptionKey, int> _byOptions = new();
    private readonly Dictionary<Dyadic, int> _numbers = new();
    private readonly Dictionary<UpStarTag, int> _upStars = new();

    // Operation caches keyed by id pairs packed into a long (first id in the high half).
    // long's own hash is the XOR of its halves, so every pair (a, b) with the same a ^ b would
    // share a bucket: the packed keys get a multiplicative hash instead.
    private readonly PairTable _leq = new();
    private readonly Dictionary<long, int> _sum = new(PairHash.Instance);
    private readonly List<int> _negative = new();
    private readonly List<int> _birthday = new();

    private static readonly ObjectPool<List<int>> s_lists =
        new DefaultObjectPool<List<int>>(new ListPolicy(), 64);

    public GameStore()
    {
        Zero = Number(Dyadic.Zero);
        Star = Nimber(1);
        Up = UpStar(Dyadic.Zero, 1, 0);
    }

    public Game Zero { get; }
    public Game Star { get; }
    public Game Up { get; }
    public Game Down => Negate(Up);

    /// <summary>How many distinct games the store holds.</summary>
    public int Count => _left.Count;

    /// <summary>
    /// Called every <see cref="InterruptPeriod"/> order tests and constructions; a caller with a
    /// budget or a cancel throws from it to stop a long computation. One canonical form can take
    /// minutes (a long mixed Hackenbush stalk), and its caller's own checks between values never
    /// run in the meantime. The store stays consistent when it throws: every cache entry is
    /// written only once its answer is complete.
    /// </summary>
    public Action? Interrupt { get; set; }

    private const int InterruptPeriod = 1024;
    private int _untilInterrupt = InterruptPeriod;

    private void Poll()
    {
        if (--_untilInterrupt > 0) return;
        _untilInterrupt = InterruptPeriod;
        Interrupt?.Invoke();
    }

    // ---------------------------------------------------------------- construction

    public Game Number(Dyadic value)
    {
        if (_numbers.TryGetValue(value, out int id)) return new Game(id);
        id = NewRecord(null, null, value);
        _numbers.Add(value, id);
        SetTag(id, new UpStarTag(value, 0, 0));
        _upStars[new UpStarTag(value, 0, 0)] = id;
        return new Game(id);
    }

    public Game Integer(long n) => Number(Dyadic.FromInteger(n));

    public Game Nimber(int m) => UpStar(Dyadic.Zero, 0, m);

    /// <summary>x + n·↑ + *m (n may be negative for downs).</summary>
    public Game UpStar(Dyadic x, int n, int m)
    {
        if (m < 0) throw new ArgumentOutOfRangeException(nameof(m));
        if (n == 0 && m == 0) return Number(x);
        var tag = new UpStarTag(x, n, m);
        if (_upStars.TryGetValue(tag, out int id)) return new Game(id);
        Game g;
        if (!x.IsZero)
        {
            // Number translation: x + G = {x + G^L | x + G^R} when G is not a number.
            var inner = UpStar(Dyadic.Zero, n, m);
            var num = Number(x);
            g = Make(LeftOptions(inner).Select(o => Add(num, o)), RightOptions(inner).Select(o => Add(num, o)));
        }
        else if (n == 0)
        {
            // *m = {0, *, ..., *(m-1) | 0, *, ..., *(m-1)}: the record is written directly and
            // its options only on request (a green graph can have a nim-value in the millions).
            g = new Game(NewRecord(null, null, null));
        }
        else if (n < 0)
        {
            g = Negate(UpStar(Dyadic.Zero, -n, m));
        }
        else if (n == 1 && m == 0)
        {
            g = Make([Zero], [Nimber(1)]);
        }
        else
        {
            // n·↑ + *m = ↑ + ((n-1)·↑ + *m), summed from the options so the tag shortcut is not used on itself.
            g = AddByOptions(Up, UpStar(Dyadic.Zero, n - 1, m));
        }
        _upStars[tag] = g.Id;
        SetTag(g.Id, tag);
        return g;
    }

    /// <summary>The canonical form of {L | R} for any option sets.</summary>
    public Game Make(IEnumerable<Game> left, IEnumerable<Game> right)
    {
        var l = s_lists.Get();
        var r = s_lists.Get();
        try
        {
            foreach (var g in left) l.Add(g.Id);
            foreach (var g in right) r.Add(g.Id);
            return MakeFromLists(l, r);
        }
        finally
        {
            s_lists.Return(l);
            s_lists.Return(r);
        }
    }

    /// <summary>{L | R} with the options as games already in this store.</summary>
    public Game Make(ReadOnlySpan<Game> left, ReadOnlySpan<Game> right)
    {
        var l = s_lists.Get();
        var r = s_lists.Get();
        try
        {
            foreach (var g in left) l.Add(g.Id);
            foreach (var g in right) r.Add(g.Id);
            return MakeFromLists(l, r);
        }
        finally
        {
            s_lists.Return(l);
            s_lists.Return(r);
        }
    }

    private Game MakeFromLists(List<int> l, List<int> r)
    {
        Poll();
        SortUnique(l);
        SortUnique(r);
        if (TryNumberRule(l, r, out var quick)) return quick;
        // Removing dominated options and bypassing reversible ones keep the value of {L | R}, so
        // the comparisons with it stay valid for the whole simplification.
        ForgetVirtual();
        bool changed = true;
        while (changed)
        {
            changed = false;
            RemoveDominated(l, leftSide: true);
            RemoveDominated(r, leftSide: false);
            // Bypass one reversible option at a time, then look again for dominated ones.
            for (int i = 0; i < l.Count && !changed; i++)
            {
                foreach (int ar in RightIds(l[i]))
                {
                    if (LeqVirtualRight(ar, l, r))
                    {
                        l.RemoveAt(i);
                        l.AddRange(LeftIds(ar));
                        SortUnique(l);
                        changed = true;
                        break;
                    }
                }
            }
            for (int i = 0; i < r.Count && !changed; i++)
            {
                foreach (int bl in LeftIds(r[i]))
                {
                    if (LeqVirtualLeft(l, r, bl))
                    {
                        r.RemoveAt(i);
                        r.AddRange(RightIds(bl));
                        SortUnique(r);
                        changed = true;
                        break;
                    }
                }
            }
        }
        if (TryNumberRule(l, r, out var number)) return number;
        if (NimberPattern(l, r) is int m) return Nimber(m);
        var key = new OptionKey(l.ToArray(), r.ToArray());
        if (_byOptions.TryGetValue(key, out int id)) return new Game(id);
        id = NewRecord(key.Left, key.Right, null);
        _byOptions.Add(key, id);
        return new Game(id);
    }

    private bool TryNumberRule(List<int> l, List<int> r, out Game result)
    {
        result = default;
        Dyadic? maxL = null, minR = null;
        foreach (int a in l)
        {
            if (_number[a] is not { } x) return false;
            if (maxL is null || x > maxL.Value) maxL = x;
        }
        foreach (int b in r)
        {
            if (_number[b] is not { } y) return false;
            if (minR is null || y < minR.Value) minR = y;
        }
        if (maxL is { } lo && minR is { } hi && lo >= hi) return false;
        result = Number(Dyadic.Simplest(maxL, minR));
        return true;
    }

    private void RemoveDominated(List<int> options, bool leftSide)
    {
        if (options.Count < 2) return;
        for (int i = options.Count - 1; i >= 0; i--)
        {
            int a = options[i];
            for (int j = 0; j < options.Count; j++)
            {
                if (j == i) continue;
                int b = options[j];
                // Distinct ids are distinct values, so a ≤ b here means a is strictly worse for Left.
                if (leftSide ? Leq(a, b) : Leq(b, a)) { options.RemoveAt(i); break; }
            }
        }
    }

    // Memos of the comparisons with the game {L | R} under construction, valid while L and R
    // stay as they are. Without them the comparison walks the option tree of the option being
    // tested, which is exponential in its depth. Make never re-enters itself while comparing, so
    // one pair of tables serves the store.
    private readonly Dictionary<int, bool> _belowVirtual = new();
    private readonly Dictionary<int, bool> _aboveVirtual = new();

    private void ForgetVirtual()
    {
        _belowVirtual.Clear();
        _aboveVirtual.Clear();
    }

    /// <summary>x ≤ {L | R}: no (R option) ≤ x and no x^L ≥ {L | R}.</summary>
    private bool LeqVirtualRight(int x, List<int> l, List<int> r)
    {
        if (_belowVirtual.TryGetValue(x, out bool known)) return known;
        bool result = true;
        foreach (int b in r) if (Leq(b, x)) { result = false; break; }
        if (result) foreach (int xl in LeftIds(x)) if (LeqVirtualLeft(l, r, xl)) { result = false; break; }
        _belowVirtual[x] = result;
        return result;
    }

    /// <summary>{L | R} ≤ y: no (L option) ≥ y and no y^R ≤ {L | R}.</summary>
    private bool LeqVirtualLeft(List<int> l, List<int> r, int y)
    {
        if (_aboveVirtual.TryGetValue(y, out bool known)) return known;
        bool result = true;
        foreach (int a in l) if (Leq(y, a)) { result = false; break; }
        if (result) foreach (int yr in RightIds(y)) if (LeqVirtualRight(yr, l, r)) { result = false; break; }
        _aboveVirtual[y] = result;
        return result;
    }

    /// <summary>m when the options are exactly {0, *, ..., *(m-1) | the same}, else null.</summary>
    private int? NimberPattern(List<int> l, List<int> r)
    {
        // Nimber records are never in the option index (their options are made on request),
        // so a simplification that lands on *m must be caught here, or *m would get a second id.
        if (l.Count != r.Count) return null;
        int m = l.Count;
        for (int i = 0; i < m; i++)
        {
            if (l[i] != r[i] || _tag[l[i]] is not { } t || !t.X.IsZero || t.N != 0 || t.M >= m) return null;
        }
        // m distinct nimbers all below *m (ids are unique and equal ids are equal values) are
        // exactly 0, *, ..., *(m-1).
        return m;
    }

    private int NewRecord(int[]? left, int[]? right, Dyadic? number)
    {
        int id = _left.Count;
        _left.Add(left);
        _right.Add(right);
        _number.Add(number);
        _tag.Add(null);
        _kind.Add(number is null ? General : NumberKind);
        _ls.Add(number ?? default);
        _rs.Add(number ?? default);
        _stopsKnown.Add(number is not null);
        _negative.Add(-1);
        _birthday.Add(-1);
        return id;
    }

    private void SetTag(int id, UpStarTag tag)
    {
        _tag[id] = tag;
        if (_kind[id] == General) _kind[id] = TaggedKind;
        // x + n·↑ + *m is x plus an infinitesimal: both stops are x.
        _ls[id] = tag.X;
        _rs[id] = tag.X;
        _stopsKnown[id] = true;
    }

    private static void SortUnique(List<int> list)
    {
        if (list.Count < 2) return;
        list.Sort();
        int w = 1;
        for (int i = 1; i < list.Count; i++) if (list[i] != list[w - 1]) list[w++] = list[i];
        list.RemoveRange(w, list.Count - w);
    }

    // ---------------------------------------------------------------- options

    internal int[] LeftIds(int id) => _left[id] ?? MaterialiseOptions(id).Left;
    internal int[] RightIds(int id) => _right[id] ?? MaterialiseOptions(id).Right;

    private (int[] Left, int[] Right) MaterialiseOptions(int id)
    {
        if (_number[id] is null)
        {
            // A nimber *m: {0, *, ..., *(m-1) | the same}, each option itself made lazily.
            int m = _tag[id]!.Value.M;
            var options = new int[m];
            for (int i = 0; i < m; i++) options[i] = Nimber(i).Id;
            Array.Sort(options);
            _left[id] = options;
            _right[id] = options;
            return (options, options);
        }
        var x = _number[id]!.Value;
        int[] l, r;
        if (x.IsZero) { l = []; r = []; }
        else if (x.IsInteger)
        {
            if (x.Sign > 0) { l = [Number(x - Dyadic.One).Id]; r = []; }
            else { l = []; r = [Number(x + Dyadic.One).Id]; }
        }
        else
        {
            var step = Dyadic.PowerOfHalf(x.Exponent);
            l = [Number(x - step).Id];
            r = [Number(x + step).Id];
        }
        _left[id] = l;
        _right[id] = r;
        return (l, r);
    }

    public IReadOnlyList<Game> LeftOptions(Game g) => Wrap(LeftIds(g.Id));
    public IReadOnlyList<Game> RightOptions(Game g) => Wrap(RightIds(g.Id));
    public IReadOnlyList<Game> Options(Game g, Side side) => side == Side.Left ? LeftOptions(g) : RightOptions(g);

    private static Game[] Wrap(int[] ids) => MemoryMarshal.Cast<int, Game>(ids.AsSpan()).ToArray();

    // ---------------------------------------------------------------- arithmetic

    public Game Negate(Game g)
    {
        int cached = _negative[g.Id];
        if (cached >= 0) return new Game(cached);
        Game result;
        if (_number[g.Id] is { } x) result = Number(-x);
        else if (_tag[g.Id] is { X.IsZero: true, N: 0 }) result = g;
        else if (_tag[g.Id] is { } tag && _upStars.TryGetValue(new UpStarTag(-tag.X, -tag.N, tag.M), out int known)) result = new Game(known);
        else
        {
            // The negative of a canonical form is canonical: swap and negate, no simplification needed.
            var nl = RightIds(g.Id).Select(o => Negate(new Game(o)).Id).ToArray();
            var nr = LeftIds(g.Id).Select(o => Negate(new Game(o)).Id).ToArray();
            Array.Sort(nl);
            Array.Sort(nr);
            var key = new OptionKey(nl, nr);
            if (!_byOptions.TryGetValue(key, out int id))
            {
                id = NewRecord(nl, nr, null);
                _byOptions.Add(key, id);
            }
            result = new Game(id);
            if (_tag[g.Id] is { } t && _tag[id] is null)
            {
                var negated = new UpStarTag(-t.X, -t.N, t.M);
                SetTag(id, negated);
                _upStars.TryAdd(negated, id);
            }
        }
        _negative[g.Id] = result.Id;
        _negative[result.Id] = g.Id;
        return result;
    }

    public Game Add(Game a, Game b)
    {
        if (a.Id == Zero.Id) return b;
        if (b.Id == Zero.Id) return a;
        long key = a.Id <= b.Id ? Pack(a.Id, b.Id) : Pack(b.Id, a.Id);
        if (_sum.TryGetValue(key, out int cached)) return new Game(cached);
        Game result;
        if (_number[a.Id] is { } x && _number[b.Id] is { } y) result = Number(x + y);
        else if (_tag[a.Id] is { } s && _tag[b.Id] is { } t) result = UpStar(s.X + t.X, s.N + t.N, s.M ^ t.M);
        else if (_number[a.Id] is { } xa) result = Translate(b, xa);
        else if (_number[b.Id] is { } xb) result = Translate(a, xb);
        else result = AddByOptions(a, b);
        _sum[key] = result.Id;
        return result;
    }

    public Game Subtract(Game a, Game b) => Add(a, Negate(b));

    public Game Sum(IEnumerable<Game> games)
    {
        var total = Zero;
        foreach (var g in games) total = Add(total, g);
        return total;
    }

    /// <summary>G + x for a non-number G: {G^L + x | G^R + x} (number translation), never expanding x.</summary>
    private Game Translate(Game g, Dyadic x)
    {
        var num = Number(x);
        return Make(LeftOptions(g).Select(o => Add(o, num)), RightOptions(g).Select(o => Add(o, num)));
    }

    private Game AddByOptions(Game a, Game b)
    {
        var left = new List<Game>();
        var right = new List<Game>();
        foreach (int o in LeftIds(a.Id)) left.Add(Add(new Game(o), b));
        foreach (int o in LeftIds(b.Id)) left.Add(Add(a, new Game(o)));
        foreach (int o in RightIds(a.Id)) right.Add(Add(new Game(o), b));
        foreach (int o in RightIds(b.Id)) right.Add(Add(a, new Game(o)));
        return Make(left, right);
    }

    // ---------------------------------------------------------------- order

    /// <summary>a ≤ b.</summary>
    public bool Leq(Game a, Game b) => Leq(a.Id, b.Id);

    private bool Leq(int a, int b)
    {
        if (TrySettle(a, b, out bool settled)) return settled;
        Poll();
        // A refutation that needs no search is looked for first, over all options, before any
        // option is searched: the first search would otherwise often go deep for nothing. The
        // options settled there (the first 64 of a side) are not asked again.
        var al = _kind[a] != NumberKind ? LeftIds(a) : [];
        var br = _kind[b] != NumberKind ? RightIds(b) : [];
        ulong settledLeft = 0, settledRight = 0;
        bool result = !SettledRefutation(al, b, leftOptions: true, ref settledLeft)
            && !SettledRefutation(br, a, leftOptions: false, ref settledRight);
        // No a^L ≥ b (a number a has no left option that matters: x ≤ G iff no G^R ≤ x), no b^R ≤ a.
        for (int i = 0; result && i < al.Length; i++)
            if ((i >= 64 || (settledLeft >> i & 1) == 0) && Leq(b, al[i])) result = false;
        for (int i = 0; result && i < br.Length; i++)
            if ((i >= 64 || (settledRight >> i & 1) == 0) && Leq(br[i], a)) result = false;
        _leq.Set(Pack(a, b), result);
        return result;
    }

    /// <summary>
    /// Whether one of the options refutes without search (a^L ≥ b for left options of a, b^R ≤ a
    /// for right options of b); marks in <paramref name="settled"/> those found not to refute.
    /// </summary>
    private bool SettledRefutation(int[] options, int other, bool leftOptions, ref ulong settled)
    {
        for (int i = 0; i < options.Length; i++)
        {
            bool known = leftOptions ? TrySettle(other, options[i], out bool refutes) : TrySettle(options[i], other, out refutes);
            if (!known) continue;
            if (refutes) return true;
            if (i < 64) settled |= 1UL << i;
        }
        return false;
    }

    /// <summary>a ≤ b when it is known without search: equal ids, closed forms, stops or the memo.</summary>
    private bool TrySettle(int a, int b, out bool answer)
    {
        answer = true;
        if (a == b) return true;
        byte ka = _kind[a], kb = _kind[b];
        if (ka == NumberKind && kb == NumberKind) { answer = _number[a]!.Value <= _number[b]!.Value; return true; }
        if (ka != General && kb != General)
        {
            var s = _tag[a]!.Value;
            var t = _tag[b]!.Value;
            answer = new UpStarTag(t.X - s.X, t.N - s.N, t.M ^ s.M).IsNonNegative;
            return true;
        }
        // Stops settle most comparisons without search: a ≤ b forces L(a) ≤ L(b) and
        // R(a) ≤ R(b), and L(a) < R(b) forces a < b (L(a - b) ≤ L(a) - R(b) < 0).
        EnsureStops(a);
        EnsureStops(b);
        if (_ls[a] > _ls[b] || _rs[a] > _rs[b]) { answer = false; return true; }
        if (_ls[a] < _rs[b]) return true;
        return _leq.TryGet(Pack(a, b), out answer);
    }

    public bool Less(Game a, Game b) => a != b && Leq(a, b);
    public bool Geq(Game a, Game b) => Leq(b, a);

    public Relation Compare(Game a, Game b)
    {
        if (a == b) return Relation.Equal;
        bool le = Leq(a, b), ge = Leq(b, a);
        return le ? Relation.Less : ge ? Relation.Greater : Relation.Confused;
    }

    /// <summary>a ‖ b: neither a ≤ b nor b ≤ a.</summary>
    public bool Confused(Game a, Game b) => Compare(a, b) == Relation.Confused;

    public Outcome OutcomeOf(Game g) => Compare(g, Zero) switch
    {
        Relation.Equal => Outcome.P,
        Relation.Greater => Outcome.L,
        Relation.Less => Outcome.R,
        _ => Outcome.N,
    };

    // ---------------------------------------------------------------- predicates

    public bool IsNumber(Game g) => _number[g.Id] is not null;

    public bool TryGetNumber(Game g, out Dyadic value)
    {
        if (_number[g.Id] is { } x) { value = x; return true; }
        value = Dyadic.Zero;
        return false;
    }

    public bool IsNimber(Game g) => _tag[g.Id] is { } t && t.X.IsZero && t.N == 0;

    public bool TryGetNimber(Game g, out int m)
    {
        if (IsNimber(g)) { m = _tag[g.Id]!.Value.M; return true; }
        m = 0;
        return false;
    }

    /// <summary>The x + n·↑ + *m description when the store knows it (numbers, nimbers, ups built by the store).</summary>
    public bool TryGetUpStar(Game g, out Dyadic x, out int n, out int m)
    {
        if ((_tag[g.Id] ?? RecogniseUpStar(g.Id)) is { } found) { x = found.X; n = found.N; m = found.M; return true; }
        x = Dyadic.Zero; n = 0; m = 0;
        return false;
    }

    /// <summary>{x | y} with numbers x &gt; y: a hot switch.</summary>
    public bool IsSwitch(Game g)
    {
        var l = LeftIds(g.Id);
        var r = RightIds(g.Id);
        return !IsNumber(g) && l.Length == 1 && r.Length == 1 && _number[l[0]] is not null && _number[r[0]] is not null;
    }

    /// <summary>Every subposition with a move for one side has a move for the other (0 included).</summary>
    public bool IsAllSmall(Game g)
    {
        if (g == Zero) return true;
        if (IsNumber(g)) return false;
        if (_tag[g.Id] is { } t) return t.X.IsZero;
        // Memoised: game trees share subgames, and an unmemoised walk visits every path.
        if (_allSmall.TryGetValue(g.Id, out bool known)) return known;
        var l = LeftIds(g.Id);
        var r = RightIds(g.Id);
        bool result = l.Length > 0 && r.Length > 0;
        foreach (int o in l) result = result && IsAllSmall(new Game(o));
        foreach (int o in r) result = result && IsAllSmall(new Game(o));
        _allSmall[g.Id] = result;
        return result;
    }

    /// <summary>Smaller than every positive number and larger than every negative one (0 included).</summary>
    public bool IsInfinitesimal(Game g) => g == Zero || (!IsNumber(g) && LeftStop(g).IsZero && RightStop(g).IsZero);

    /// <summary>
    /// The birthday, saturating at <see cref="int.MaxValue"/> (a huge number such as 10^30 is born
    /// that late); <see cref="ExactBirthday"/> gives the true figure for such games.
    /// </summary>
    public int Birthday(Game g)
    {
        int cached = _birthday[g.Id];
        if (cached >= 0) return cached;
        int b;
        if (_number[g.Id] is { } x)
        {
            var day = NumberBirthday(x);
            b = day >= int.MaxValue ? int.MaxValue : (int)day;
        }
        else if (_tag[g.Id] is { X.IsZero: true, N: 0 } nim) b = nim.M;
        else
        {
            b = 0;
            foreach (int o in LeftIds(g.Id)) b = Math.Max(b, Later(Birthday(new Game(o))));
            foreach (int o in RightIds(g.Id)) b = Math.Max(b, Later(Birthday(new Game(o))));
        }
        _birthday[g.Id] = b;
        return b;
    }

    /// <summary>The birthday without saturation (only worth asking when <see cref="Birthday"/> is int.MaxValue).</summary>
    public System.Numerics.BigInteger ExactBirthday(Game g)
    {
        int day = Birthday(g);
        if (day < int.MaxValue) return day;
        if (_number[g.Id] is { } x) return NumberBirthday(x);
        System.Numerics.BigInteger b = 0;
        foreach (int o in LeftIds(g.Id)) b = System.Numerics.BigInteger.Max(b, ExactBirthday(new Game(o)) + 1);
        foreach (int o in RightIds(g.Id)) b = System.Numerics.BigInteger.Max(b, ExactBirthday(new Game(o)) + 1);
        return b;
    }

    private static System.Numerics.BigInteger NumberBirthday(Dyadic x)
    {
        var abs = x.Abs();
        return abs.IsInteger ? abs.Numerator : abs.Floor() + 1 + abs.Exponent;
    }

    private static int Later(int day) => day == int.MaxValue ? day : day + 1;

    // ---------------------------------------------------------------- helpers

    private static long Pack(int a, int b) => ((long)a << 32) | (uint)b;

    private readonly HashSet<int> _notUpStar = new();

    private UpStarTag? RecogniseUpStar(int id)
    {
        // Games equal to x + n·↑ + *m that were built from options rather than by UpStar: try the
        // few candidates their birthday allows (n·↑ + *m is born no earlier than day max(|n|, m)).
        if (_tag[id] is { } known) return known;
        if (_notUpStar.Contains(id)) return null;
        var g = new Game(id);
        var x = LeftStop(g);
        int day = Birthday(g);
        if (x == RightStop(g) && day <= 16)
        {
            for (int n = -day; n <= day; n++)
            {
                for (int m = 0; m <= day; m++)
                {
                    if (n == 0 && m == 0) continue;
                    UpStar(x, n, m);
                    if (_tag[id] is { } found) return found;
                }
            }
        }
        _notUpStar.Add(id);
        return null;
    }

    internal sealed class PairHash : IEqualityComparer<long>
    {
        public static readonly PairHash Instance = new();
        public bool Equals(long x, long y) => x == y;
        public int GetHashCode(long key) => PairTable.Hash(key);
    }

    private sealed class ListPolicy : PooledObjectPolicy<List<int>>
    {
        public override List<int> Create() => new(16);
        public override bool Return(List<int> obj) { obj.Clear(); return obj.Capacity <= 4096; }
    }

    private readonly record struct OptionKey(int[] Left, int[] Right)
    {
        public bool Equals(OptionKey other) => Left.AsSpan().SequenceEqual(other.Left) && Right.AsSpan().SequenceEqual(other.Right);

        public override int GetHashCode()
        {
            var h = new HashCode();
            foreach (int i in Left) h.Add(i);
            h.Add(-1);
            foreach (int i in Right) h.Add(i);
            return h.ToHashCode();
        }
    }

    /// <summary>x + n·↑ + *m.</summary>
    private readonly record struct UpStarTag(Dyadic X, int N, int M)
    {
        /// <summary>x + n·↑ + *m ≥ 0: from the sign of x, else from n (with ↑* the one fuzzy case).</summary>
        public bool IsNonNegative
        {
            get
            {
                if (X.Sign != 0) return X.Sign > 0;
                if (N == 0) return M == 0;
                if (N < 0) return false;
                return !(N == 1 && M == 1);
            }
        }
    }
}
