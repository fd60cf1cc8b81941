namespace Bramble.Arena.Statistics;

/// <summary>Which sampling model an interval or a test rests on.</summary>
public enum ScoreModel
{
    /// <summary>Every game an independent sample scoring 0, ½ or 1.</summary>
    Trinomial,
    /// <summary>Every colour-swapped pair of games one sample scoring 0, ¼, ½, ¾ or 1.</summary>
    Pentanomial,
}

public static class ScoreModelExtensions
{
    public static string Word(this ScoreModel model) => model == ScoreModel.Pentanomial ? "pentanomial" : "trinomial";
}
