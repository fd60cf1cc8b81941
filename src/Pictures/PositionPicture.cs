using Bramble.Rules;

namespace Bramble.Pictures;

/// <summary>Draws a position of any registered ruleset as SVG.</summary>
public static class PositionPicture
{
    public static string Draw(IPosition position) => position.Ruleset.Name switch
    {
        "hackenbush" => HackenbushPicture.Svg((Bramble.Rules.Hackenbush.HackenbushPosition)position),
        "domineering" => DomineeringPicture.Svg((Bramble.Rules.Domineering.DomineeringPosition)position),
        _ => throw new ArgumentException($"no picture for ruleset '{position.Ruleset.Name}' yet"),
    };
}
