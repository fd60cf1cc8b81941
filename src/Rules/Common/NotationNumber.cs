namespace Bramble.Rules.Common;

/// <summary>Reads a run of decimal digits in position text, saturating at int.MaxValue so huge numbers are refused by range, not by overflow.</summary>
public static class NotationNumber
{
    public static int Read(string text, ref int i, string expected)
    {
        int from = i;
        long n = 0;
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            n = Math.Min(n * 10 + (text[i] - '0'), int.MaxValue);
            i++;
        }
        if (i == from) throw new PositionSyntaxException(text, i, expected);
        return (int)n;
    }
}
