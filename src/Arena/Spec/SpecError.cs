namespace Bramble.Arena.Spec;

/// <summary>One problem in a match spec, at a JSON path such as <c>$.players[1].run</c>.</summary>
public sealed record SpecError(string Path, string Message)
{
    public override string ToString() => $"{Path}: {Message}";
}

/// <summary>A match spec with problems; every problem found is listed, not just the first.</summary>
public sealed class MatchSpecException(string file, IReadOnlyList<SpecError> errors)
    : Exception($"{file}: {errors.Count} problem{(errors.Count == 1 ? "" : "s")}:\n" + string.Join("\n", errors.Select(e => "  " + e.ToString().Replace("\n", "\n    "))))
{
    public string File { get; } = file;
    public IReadOnlyList<SpecError> Errors { get; } = errors;
}
