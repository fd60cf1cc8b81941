namespace Bramble.Rules.ToadsAndFrogs;

/// <summary>What stands on one square of the strip. A wall is a square no piece can enter or jump.</summary>
public enum Square : byte { Empty = 0, Toad = 1, Frog = 2, Wall = 3 }
