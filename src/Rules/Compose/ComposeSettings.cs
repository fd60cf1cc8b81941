namespace Bramble.Rules.Compose;

/// <summary>
/// Bounds of one compose run: the largest size to look at (null: the ruleset's default search
/// size, or the size of a construction when that is larger), how many positions to find, and a
/// time budget after which the search stops and says how far it got.
/// </summary>
public sealed record ComposeSettings(int? MaxSize = null, int Count = 1, long? BudgetMs = null);
