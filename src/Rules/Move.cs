namespace Bramble.Rules;

/// <summary>
/// A move, encoded by its ruleset in two ints so move lists and search stacks allocate nothing:
/// Hackenbush uses A = edge id; Domineering A = cell index (row * 26 + column); Forms A = term
/// (1-based) and B = option (1-based). Text form comes from <see cref="IPosition.FormatMove"/>.
/// </summary>
public readonly record struct Move(int A, int B = 0);
