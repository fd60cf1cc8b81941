using Bramble.Rules;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>
/// What the page says about each ruleset: a start position and how moves are made. Rulesets
/// registered later get a generated start position and generic words, and are playable at once
/// through the list of legal moves under the board.
/// </summary>
public static class Examples
{
    private static readonly Dictionary<string, RulesetReply> s_known = new(StringComparer.OrdinalIgnoreCase)
    {
        ["hackenbush"] = new("hackenbush", "BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]",
            "click an edge to cut it (Left cuts blue or green, Right red or green)", "blue", "red"),
        ["domineering"] = new("domineering", "4x4",
            "click two neighbouring cells to place a domino (Left vertical, Right horizontal)", "vertical", "horizontal", "domino"),
        ["amazons"] = new("amazons", ".L../#..R/R..L/.#..",
            "click an amazon, the square it goes to, then where its arrow lands (Left plays L, Right R)", "L amazons", "R amazons", "three"),
        ["forms"] = new("forms", "{3|-1} + {5|2||0} + * + 1/2",
            "click an option's line in a term (Left's hang to the left, Right's to the right)", "Left", "Right"),
        ["snort"] = new("snort", "[1-2-3-4,2-5,6-7-8]",
            "click an uncoloured vertex to colour it (Left blue, Right red; never next to the other's colour)", "blue", "red"),
        ["col"] = new("col", "[1-2-3-4,2-5,6-7-8]",
            "click an uncoloured vertex to colour it (Left blue, Right red; never next to your own colour)", "blue", "red"),
    };

    public static RulesetReply For(IRuleset rules)
    {
        if (s_known.TryGetValue(rules.Name, out var known)) return known;
        string example = "";
        try
        {
            if (rules.Generators.Count > 0) example = rules.Generate(rules.Generators[0], 1, 4, 1).FirstOrDefault() ?? "";
        }
        catch (ArgumentException)
        {
            // A generator that wants other sizes: the person types a position instead.
        }
        return new RulesetReply(rules.Name, example, "click a move on the drawing, or choose one from the list under the board", "Left", "Right");
    }
}
