using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Rules.Forms;
using Bramble.Rules.Hackenbush;
using Bramble.Web.Api;

namespace Bramble.Web;

/// <summary>
/// Takes a typed position apart into what the editor builds with: Hackenbush edges (colour and
/// end points, 0 being the ground), a Domineering grid and its filled cells, Forms terms. Other
/// rulesets are edited as text only.
/// </summary>
public static class Editor
{
    public static DescribeReply Describe(DescribeRequest request)
    {
        var rules = GameReplay.Ruleset(request.Ruleset);
        var position = GameReplay.Parse(rules, request.Position, "position");
        return position switch
        {
            HackenbushPosition h => new DescribeReply(rules.Name, h.Text,
                h.Edges.Select(e => new EdgeReply(e.Id.Value, e.Colour switch { EdgeColour.Blue => "blue", EdgeColour.Red => "red", _ => "green" }, e.From, e.To)).ToList(), null, null),
            DomineeringPosition d => new DescribeReply(rules.Name, d.Text, null, Grid(d.Board), null),
            FormsPosition f => new DescribeReply(rules.Name, f.Text, null, null, f.Terms.Select(t => t.Term.Text).ToList()),
            _ => new DescribeReply(rules.Name, position.Text, null, null, null),
        };
    }

    private static GridReply Grid(Board board)
    {
        var filled = new List<string>();
        for (int r = 0; r < board.Rows; r++)
            for (int c = 0; c < board.Columns; c++)
                if (!board.IsEmpty(r, c)) filled.Add($"{(char)('a' + c)}{r + 1}");
        return new GridReply(board.Rows, board.Columns, filled);
    }
}
