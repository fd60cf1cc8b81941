namespace Bramble.Rules.Common;

/// <summary>A square of a stone board: empty, a Left stone (written x) or a Right stone (written o).</summary>
public enum Stone : byte { None = 0, Left = 1, Right = 2 }
