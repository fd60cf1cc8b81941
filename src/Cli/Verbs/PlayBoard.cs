using Bramble.Pictures;
using Bramble.Rules;
using Bramble.Rules.Domineering;
using Bramble.Rules.Forms;
using Bramble.Rules.Hackenbush;
using Bramble.Values;

namespace Bramble.Cli;

/// <summary>
/// What the terminal game shows of a position: the board drawn with what the game remembers (node
/// names fixed at the start for Hackenbush, the dominoes laid so far for Domineering), and each
/// legal move with what it does.
/// </summary>
public sealed class PlayBoard
{
    private readonly NodeNames? _names;
    private readonly List<PlacedDomino> _laid = new();

    public PlayBoard(IPosition start)
    {
        if (start is HackenbushPosition h) _names = new NodeNames(h);
    }

    /// <summary>Notes a move just played (before it is played), so the drawing can show it.</summary>
    public void Played(IPosition before, Side side, Move move)
    {
        if (before is DomineeringPosition) _laid.Add(PlacedDomino.Of(side, move));
    }

    /// <summary>Forgets the last move noted (undo).</summary>
    public void TakeBack(IPosition position)
    {
        if (position is DomineeringPosition && _laid.Count > 0) _laid.RemoveAt(_laid.Count - 1);
    }

    public string Draw(IPosition position) => position switch
    {
        HackenbushPosition h => HackenbushPicture.Text(h, _names),
        DomineeringPosition d => DomineeringPicture.Text(d, _laid),
        FormsPosition f => string.Join('\n', f.Terms.Select(t => $"  term {t.Number}: {t.Term.Text}")
            .Prepend(f.Terms.Count == 0 ? "  (no terms left)" : "terms:")),
        _ => TextPicture.Draw(position),
    };

    /// <summary>One line per legal move of <paramref name="side"/>: its name and what it does.</summary>
    public IEnumerable<string> DescribeMoves(IPosition position, Side side)
    {
        var rows = new List<string[]>();
        foreach (var move in position.Moves(side))
        {
            string name = position.FormatMove(move);
            rows.Add(position switch
            {
                FormsPosition f => [name, "->", LeadsTo(f, side, move)],
                HackenbushPosition h => [name, Edge(h, move)],
                DomineeringPosition => [name, "covers", $"{name} and {CellName.Format(PlacedDomino.Of(side, move).OtherCell)}"],
                _ => [name],
            });
        }
        return TextColumns.Lay(rows);
    }

    private static string LeadsTo(FormsPosition position, Side side, Move move)
    {
        var term = position.Terms.First(t => t.Number == move.A).Term;
        return $"{FormsTerm.TextOf(term.Options(side)[move.B - 1])}   (in term {move.A}, {term.Text})";
    }

    private string Edge(HackenbushPosition position, Move move)
    {
        var e = position.Edges.First(x => x.Id.Value == move.A);
        var (a, b) = (_names ?? new NodeNames(position)).Ends(e);
        string colour = e.Colour switch { EdgeColour.Blue => "blue", EdgeColour.Red => "red", _ => "green" };
        return $"{e.Colour.Letter()} {colour,-5}  {(a == b ? a + " (a loop)" : a + " - " + b)}";
    }
}
