namespace Bramble.Rules.Common;

/// <summary>
/// FNV-1a over the characters of a text: the same in every process (unlike string.GetHashCode),
/// which is all a position hash needs when positions are small enough to be hashed whole.
/// </summary>
public static class TextHash
{
    public static ulong Of(string text)
    {
        ulong h = 14695981039346656037UL;
        foreach (char ch in text)
        {
            h ^= ch;
            h *= 1099511628211UL;
        }
        // A final scramble so that texts differing in one late character spread over all bits.
        h ^= h >> 31;
        h *= 0x94D049BB133111EBUL;
        return h ^ (h >> 29);
    }
}
