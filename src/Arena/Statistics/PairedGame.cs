namespace Bramble.Arena.Statistics;

/// <summary>
/// One game for the joint fit: player <paramref name="A"/> (an index) against <paramref name="B"/>,
/// <paramref name="ScoreA"/> 1 for a win of A and 0 for a loss. Games with the same
/// <paramref name="Cluster"/> are not independent (the two games of a seat-swapped pair share a
/// position): the interval treats each cluster, not each game, as one sample.
/// </summary>
public readonly record struct PairedGame(int A, int B, double ScoreA, int Cluster);
