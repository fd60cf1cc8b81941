namespace Bramble.Rules.Compose;

/// <summary>
/// A compose report in plain words, the same on the command line and on the browser board: why
/// nothing was found, how far the search went, why it stopped.
/// </summary>
public static class ComposeWords
{
    /// <summary>": no position of up to 8 cells has this value" and the like; empty when there is nothing more to say.</summary>
    public static string NoneReason(this ComposeReport r) => r.Stop switch
    {
        ComposeStop.RuledOut => ": no position of this ruleset has this value (see the note)",
        _ when r.LeastSize > r.Bound => $": a position of this value has at least {r.LeastSize} {r.SizeUnit} (its birthday), more than the bound {r.Bound}",
        ComposeStop.Bound when !r.Sampled && r.Restricted => $": no listed position of up to {r.Bound} {r.SizeUnit} has this value (see the note)",
        ComposeStop.Bound when !r.Sampled => $": no position of up to {r.Bound} {r.SizeUnit} has this value",
        _ => "",
    };

    public static string Searched(this ComposeReport r)
    {
        var what = r.Sampled ? "sampled components" : r.Restricted ? "every listed position (see the note)" : "every position";
        var range = r.SearchedThrough < r.LeastSize
            ? $"sizes below {r.LeastSize} ruled out by the birthday bound; no size looked at in full"
            : $"{what} of up to {r.SearchedThrough} {r.SizeUnit} (sizes below {r.LeastSize} ruled out by the birthday bound)";
        return $"{range}; {r.ComponentsTried:N0} components valued, {r.SumsTried:N0} sums tried, {r.ElapsedMs:N0} ms";
    }

    public static string Stopped(this ComposeReport r) => r.Stop switch
    {
        ComposeStop.Enough => $"found the {r.Positions.Count} asked for",
        ComposeStop.Bound => $"reached the size bound {r.Bound}",
        ComposeStop.ListingLimit => $"sizes above {r.SearchedThrough} only as sums of smaller components (listing stops there)",
        ComposeStop.Budget => "the time budget ran out",
        _ => "ruled out",
    };

    /// <summary>The stop as one lower-case word for JSON: enough, bound, listinglimit, budget, ruledout.</summary>
    public static string StopWord(this ComposeReport r) => r.Stop.ToString().ToLowerInvariant();

    public static string RouteWord(this ComposedPosition p) => p.Route == ComposeRoute.Construction ? "construction" : "search";
}
