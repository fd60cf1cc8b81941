namespace Bramble.Search.Board;

/// <summary>
/// Depth-first proof-number search (Nagai 2002; the 1 + ε threshold of Pawlewicz and Lew 2007) on
/// the same board state, bounds, move order and outcome table as the alpha-beta search. Numbers
/// are in negamax form: a node's proof number (the side to move wins) is the least disproof number
/// of its children, its disproof number the sum of their proof numbers. A child the outcome table
/// knows is settled; one the proof table knows has its numbers; a new child starts from an
/// estimate taken from the counts (<see cref="BoardSearchOptions.ProofNumberSearch"/>).
/// </summary>
public sealed partial class BoardSearch<T>
{
    private const uint Infinite = uint.MaxValue / 2;

    private ProofTable? _proofs;

    /// <summary>Whether side s, to move, wins, by proof-number search; null when stopped first.</summary>
    public bool? ProveWins(int s, ProofTable proofs)
    {
        _proofs = proofs;
        var (pn, dn) = Mid(s, 0, Infinite, Infinite);
        if (_stop.IsSet) return null;
        return pn == 0 ? true : dn == 0 ? false : null;
    }

    private static uint Add(uint a, uint b) => Math.Min(Infinite, a + b);

    private (uint Pn, uint Dn) Mid(int s, int ply, uint thpn, uint thdn)
    {
        Nodes++;
        if ((Nodes & 4095) == 1 && _spent()) _stop.Set();
        if (_stop.IsSet) return (1, 1);
        T me = _board[s];
        int w = _shape.Width[s];
        if ((me & (me >> w)) == T.Zero) return (Infinite, 0);
        // Below the root the parent's move generation has already applied the bounds, unless it could not.
        bool judged = _options.SafeMoveBounds && _options.ChildBounds && _options.CountOrdering && _options.EvaluationOrdering;
        if (_options.SafeMoveBounds && (ply == 0 || !judged))
        {
            int verdict = BoundVerdict(s);
            if (verdict != 0) return verdict > 0 ? (0, Infinite) : (Infinite, 0);
        }
        ulong key = Key(s, out int mirror);
        if (_table.TryGet(key, out bool known, out _)) return known ? (0, Infinite) : (Infinite, 0);

        long start = Nodes;
        Span<int> moves = stackalloc int[_shape.Cells];
        Span<sbyte> verdicts = stackalloc sbyte[_shape.Cells];
        Span<int> replies = stackalloc int[_shape.Cells];
        int n = Generate(s, ply, moves, verdicts, replies);
        if (n > 0 && verdicts[0] > 0)
        {
            _table.Store(key, true, _shape.MirrorMove[s][mirror][moves[0]], 1);
            return (0, Infinite);
        }
        // Children equal up to symmetry are one position: keep the first of each.
        Span<ulong> keys = stackalloc ulong[n];
        int open = 0;
        for (int k = 0; k < n; k++)
        {
            ulong ck = ChildKey(s, moves[k]);
            if (keys[..open].Contains(ck)) continue;
            keys[open] = ck;
            moves[open] = moves[k];
            replies[open] = replies[k];
            open++;
        }
        n = open;
        // The last numbers seen of each child, for when the proof table has let it go.
        Span<uint> lastPn = stackalloc uint[n];
        Span<uint> lastDn = stackalloc uint[n];
        for (int k = 0; k < n; k++) (lastPn[k], lastDn[k]) = (1, (uint)Math.Max(1, _options.ProofEstimate ? replies[k] : 1));
        T other = _board[1 - s];
        while (true)
        {
            uint pn = Infinite, dn = 0, second = Infinite, bestPn = 0;
            int best = -1;
            for (int k = 0; k < n; k++)
            {
                var (cpn, cdn) = ChildNumbers(keys[k], lastPn[k], lastDn[k]);
                (lastPn[k], lastDn[k]) = (cpn, cdn);
                if (cdn < pn)
                {
                    second = pn;
                    pn = cdn;
                    best = k;
                    bestPn = cpn;
                }
                else if (cdn < second) second = cdn;
                dn = Add(dn, cpn);
            }
            if (pn == 0)
            {
                _table.Store(key, true, _shape.MirrorMove[s][mirror][moves[best]], Nodes - start);
                return (0, Infinite);
            }
            if (dn == 0 || best < 0)
            {
                _table.Store(key, false, OutcomeTable.NoMove, Nodes - start);
                return (Infinite, 0);
            }
            if (pn >= thpn || dn >= thdn)
            {
                _proofs!.Store(key, pn, dn, Nodes - start);
                return (pn, dn);
            }
            // The chosen child may grow until this node's disproof number reaches its threshold,
            // and its disproof number until it passes the second best's by a quarter (1 + ε).
            uint childThpn = Add(thdn - dn, bestPn);
            uint childThdn = Math.Min(thpn, Add(second, second / 4 + 1));
            int i = moves[best];
            if (ply == 0) Volatile.Write(ref _rootMove, i);
            Play(s, i);
            (lastPn[best], lastDn[best]) = Mid(1 - s, ply + 1, childThpn, childThdn);
            Undo(s, i, me, other);
            if (_stop.IsSet) return (pn, dn);
        }
    }

    /// <summary>The numbers of a child for the opponent to move there: settled, remembered, or estimated.</summary>
    private (uint Pn, uint Dn) ChildNumbers(ulong key, uint lastPn, uint lastDn)
    {
        if (_table.TryGet(key, out bool win, out _)) return win ? (0, Infinite) : (Infinite, 0);
        if (_proofs!.TryGet(key, out uint pn, out uint dn)) return (pn, dn);
        return (lastPn, lastDn);
    }
}
