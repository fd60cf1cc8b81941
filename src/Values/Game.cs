namespace Bramble.Values;

/// <summary>
/// A canonical short game, interned in a <see cref="GameStore"/>. The struct is just the store's
/// id: equal games have equal ids inside one store, so equality, hashing and memo keys are an int
/// compare. Ids mean nothing across stores; move values between stores as notation or through
/// <see cref="GameStore.Export"/>.
/// </summary>
public readonly record struct Game(int Id)
{
    public override string ToString() => $"#{Id}";
}
