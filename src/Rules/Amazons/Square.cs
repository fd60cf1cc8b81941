namespace Bramble.Rules.Amazons;

/// <summary>What stands on a square of an Amazons board. One byte each, so a board copies as a short array.</summary>
public enum Square : byte
{
    Empty = 0,
    LeftAmazon = 1,
    RightAmazon = 2,
    Burnt = 3,
}
