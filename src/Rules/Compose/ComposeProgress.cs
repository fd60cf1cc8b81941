namespace Bramble.Rules.Compose;

/// <summary>A progress note from a running search: the size being worked on and the counts so far.</summary>
public sealed record ComposeProgress(int Size, string SizeUnit, long ComponentsTried, long SumsTried, int Found, long ElapsedMs);
