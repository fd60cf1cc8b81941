namespace Bramble.Values;

/// <summary>
/// A value expression as written (before simplification): what the Forms ruleset keeps per term,
/// so moves can name options "as written". <see cref="GameStore.Evaluate"/> turns it into a
/// canonical game.
/// </summary>
public abstract record ValueExpr;

/// <summary>A number such as 3, -2 or 3/8.</summary>
public sealed record NumberExpr(Dyadic Value) : ValueExpr;

/// <summary>x + n·↑ + *m written as one token group: *, *2, ↑, ⇑*, 3↓*2, 1*, up*.</summary>
public sealed record UpStarExpr(Dyadic X, int Ups, int Star) : ValueExpr;

/// <summary>±x = {x | -x}.</summary>
public sealed record SwitchExpr(Dyadic X) : ValueExpr;

/// <summary>{L | R} with the options as written.</summary>
public sealed record OptionsExpr(IReadOnlyList<ValueExpr> Left, IReadOnlyList<ValueExpr> Right) : ValueExpr;

/// <summary>A sum a + b + ... (subtraction is a sum with a negated term).</summary>
public sealed record SumExpr(IReadOnlyList<ValueExpr> Terms) : ValueExpr;

/// <summary>-G.</summary>
public sealed record NegateExpr(ValueExpr Inner) : ValueExpr;

/// <summary>A named part of a shared form, <c>#k</c>, at a 0-based column of the text.</summary>
public sealed record PartExpr(int Name, int Column) : ValueExpr;

/// <summary>
/// A value written with shared parts: <c>body where #1 = …; #2 = …</c>. Large canonical forms
/// are written this way so that each distinct subgame appears once (docs/values.md).
/// </summary>
public sealed record SharedExpr(ValueExpr Body, IReadOnlyDictionary<int, ValueExpr> Parts) : ValueExpr
{
    /// <summary>
    /// <paramref name="body"/> with the parts it reaches, directly or through other parts: the
    /// body itself when it names none, else a shared form holding only those parts.
    /// </summary>
    public static ValueExpr Around(ValueExpr body, IReadOnlyDictionary<int, ValueExpr> parts)
    {
        var used = new SortedDictionary<int, ValueExpr>();
        var pending = new Stack<ValueExpr>([body]);
        while (pending.Count > 0)
        {
            foreach (var r in References(pending.Pop()))
            {
                if (used.ContainsKey(r.Name) || !parts.TryGetValue(r.Name, out var part)) continue;
                used[r.Name] = part;
                pending.Push(part);
            }
        }
        return used.Count == 0 ? body : new SharedExpr(body, used);
    }

    /// <summary>The named parts an expression refers to directly (not inside nested shared forms).</summary>
    public static IEnumerable<PartExpr> References(ValueExpr e)
    {
        var stack = new Stack<ValueExpr>();
        stack.Push(e);
        while (stack.Count > 0)
        {
            switch (stack.Pop())
            {
                case PartExpr p: yield return p; break;
                case OptionsExpr o: foreach (var x in o.Left) stack.Push(x); foreach (var x in o.Right) stack.Push(x); break;
                case SumExpr s: foreach (var x in s.Terms) stack.Push(x); break;
                case NegateExpr n: stack.Push(n.Inner); break;
            }
        }
    }
}
