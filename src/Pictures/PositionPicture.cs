using Bramble.Rules;

namespace Bramble.Pictures;

/// <summary>Draws a position of any registered ruleset as SVG.</summary>
public static class PositionPicture
{
    public static string Draw(IPosition position) => position.Ruleset.Name switch
    {
        "hackenbush" => HackenbushPicture.Svg((Bramble.Rules.Hackenbush.HackenbushPosition)position),
        "forms" => FormsPicture.Svg((Bramble.Rules.Forms.FormsPosition)position),
        "domineering" => DomineeringPicture.Svg((Bramble.Rules.Domineering.DomineeringPosition)position),
        "cutcake" => CutcakePicture.Svg((Bramble.Rules.Cutcake.CutcakePosition)position),
        "toads-and-frogs" => ToadsAndFrogsPicture.Svg((Bramble.Rules.ToadsAndFrogs.ToadsAndFrogsPosition)position),
        "clobber" => StonePicture.Svg(position, ((Bramble.Rules.Clobber.ClobberPosition)position).Grid, "Clobber"),
        "konane" => StonePicture.Svg(position, ((Bramble.Rules.Konane.KonanePosition)position).Grid, "Konane"),
        "amazons" => AmazonsPicture.Svg((Bramble.Rules.Amazons.AmazonsPosition)position),
        "snort" or "col" => GraphGamePicture.Svg((Bramble.Rules.GraphGames.ColouringPosition)position),
        _ => throw new ArgumentException($"no picture for ruleset '{position.Ruleset.Name}' yet"),
    };
}
