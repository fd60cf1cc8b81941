using Bramble.Rules;

namespace Bramble.Pictures;

/// <summary>A plain-text drawing of a position for the terminal game.</summary>
public static class TextPicture
{
    public static string Draw(IPosition position) => position.Ruleset.Name switch
    {
        "hackenbush" => HackenbushPicture.Text((Bramble.Rules.Hackenbush.HackenbushPosition)position),
        "domineering" => DomineeringPicture.Text((Bramble.Rules.Domineering.DomineeringPosition)position),
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
