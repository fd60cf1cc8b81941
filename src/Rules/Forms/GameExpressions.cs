using Bramble.Values;

namespace Bramble.Rules.Forms;

/// <summary>
/// Canonical games written back as expressions, so the option a player moves to can become a
/// term of its own: numbers, x + n·↑ + *m and ±x as their atoms, everything else as braces of
/// its canonical options.
/// </summary>
public static class GameExpressions
{
    public static ValueExpr Of(GameStore store, Game game)
    {
        if (store.TryGetNumber(game, out var x)) return new NumberExpr(x);
        if (store.TryGetUpStar(game, out var ux, out int ups, out int star)) return new UpStarExpr(ux, ups, star);
        var left = store.LeftOptions(game);
        var right = store.RightOptions(game);
        if (left.Count == 1 && right.Count == 1 && store.TryGetNumber(left[0], out var a) && store.TryGetNumber(right[0], out var b)
            && a == -b && a.Sign > 0)
            return new SwitchExpr(a);
        return new OptionsExpr(left.Select(o => Of(store, o)).ToArray(), right.Select(o => Of(store, o)).ToArray());
    }
}
