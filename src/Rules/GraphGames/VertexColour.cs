namespace Bramble.Rules.GraphGames;

/// <summary>
/// The state of one vertex in Snort and Col: not yet coloured, coloured blue by Left, or
/// coloured red by Right (the colours of Winning Ways, which Hackenbush's edges share here).
/// </summary>
public enum VertexColour : byte
{
    Uncoloured = 0,
    Blue = 1,
    Red = 2,
}
