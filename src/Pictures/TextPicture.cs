using Bramble.Rules;

namespace Bramble.Pictures;

/// <summary>A plain-text drawing of a position for the terminal game.</summary>
public static class TextPicture
{
    public static string Draw(IPosition position) => position.Ruleset.Name switch
    {
        "hackenbush" => HackenbushPicture.Text((Bramble.Rules.Hackenbush.HackenbushPosition)position),
        "domineering" => DomineeringPicture.Text((Bramble.Rules.Domineering.DomineeringPosition)position),
        "toads-and-frogs" => ToadsAndFrogsPicture.Text((Bramble.Rules.ToadsAndFrogs.ToadsAndFrogsPosition)position),
        "clobber" => StonePicture.Text(position, ((Bramble.Rules.Clobber.ClobberPosition)position).Grid,
            "A move takes a stone onto an orthogonal neighbour of the other colour: b2-c2. Left plays x, Right plays o."),
        "konane" => StonePicture.Text(position, ((Bramble.Rules.Konane.KonanePosition)position).Grid,
            "A move jumps a stone over opposing stones into empty squares along a line: c3-c5. Left plays x, Right plays o."),
        "amazons" => AmazonsPicture.Text((Bramble.Rules.Amazons.AmazonsPosition)position),
        "snort" or "col" => GraphGamePicture.Text((Bramble.Rules.GraphGames.ColouringPosition)position),
        _ => Generic(position),
    };

    private static string Generic(IPosition position)
    {
        var parts = position.Components();
        var lines = new List<string> { position.Text };
        if (parts.Count > 1) lines.AddRange(parts.Select((c, i) => $"  component {i + 1}: {c.Text}"));
        return string.Join('\n', lines);
    }
}
