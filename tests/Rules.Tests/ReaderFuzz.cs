using System.Text;

namespace Bramble.Rules.Tests;

/// <summary>
/// Hostile text for a ruleset's reader: deep nesting of every bracket kind, huge texts, long
/// digit runs, binary junk, and damaged copies of generated positions. Each text is read on a
/// 1 MiB stack; the reader must either accept it (and then its components and text must work)
/// or refuse it with a located <see cref="PositionSyntaxException"/>, nothing else. Shared by
/// the test (a small count, in CI) and bench/ReaderFuzzBenchmarks.cs (a large count); it uses no
/// test framework.
/// </summary>
public static class ReaderFuzz
{
    private const int SmallStack = 1024 * 1024;

    /// <summary>Reads <paramref name="count"/> hostile texts; returns a description of each one that misbehaved.</summary>
    public static List<string> Run(IRuleset ruleset, int count, int seed)
    {
        var random = new Random(seed);
        var samples = Samples(ruleset);
        string alphabet = new string(samples.SelectMany(s => s).Distinct().ToArray()) + "{}()[]|,;+-*/#0123456789 \n";
        var failures = new List<string>();
        for (int i = 0; i < count; i++)
        {
            string text = (i % 6) switch
            {
                0 => Nested(random, alphabet),
                1 => Huge(random, alphabet),
                2 => Binary(random),
                3 => Digits(random, samples),
                _ => Damaged(random, samples, alphabet),
            };
            if (Check(ruleset, text) is { } problem)
                failures.Add($"{ruleset.Name} case {i} (seed {seed}, {text.Length} chars, starts {Show(text)}): {problem}");
        }
        return failures;
    }

    private static string? Check(IRuleset ruleset, string text)
    {
        string? problem = null;
        var thread = new Thread(() =>
        {
            try
            {
                var position = ruleset.Parse(text);
                _ = position.Components().Count;
                _ = position.Text.Length;
            }
            catch (PositionSyntaxException e)
            {
                if (e.Column < 0 || e.Column > text.Length) problem = $"column {e.Column} outside the text";
                else if (e.Pointer.Length > 4 * (Values.PrintableText.Before + Values.PrintableText.After) + e.Expected.Length + 40)
                    problem = $"the message echoes {e.Pointer.Length} characters";
            }
            catch (Exception e)
            {
                problem = $"{e.GetType().Name}: {e.Message}";
            }
        }, SmallStack);
        thread.Start();
        thread.Join();
        return problem;
    }

    private static List<string> Samples(IRuleset ruleset)
    {
        var samples = new List<string>();
        foreach (var generator in ruleset.Generators)
        {
            foreach (int size in new[] { 2, 4, 8 })
            {
                try
                {
                    samples.AddRange(ruleset.Generate(generator, 3, size, seed: size));
                }
                catch (ArgumentException)
                {
                    // a size this generator does not take
                }
            }
        }
        if (samples.Count == 0) samples.Add("0");
        return samples;
    }

    private static string Nested(Random random, string alphabet)
    {
        var (open, close) = new[] { ("{", "}"), ("(", ")"), ("[", "]"), ("{0|", "}"), ("B(", ")"), ("{", "|0}") }[random.Next(6)];
        int depth = random.Next(4) == 0 ? random.Next(1, 60_000) : random.Next(1, 3000);
        var sb = new StringBuilder();
        for (int i = 0; i < depth; i++) sb.Append(open);
        if (random.Next(2) == 0) sb.Append(alphabet[random.Next(alphabet.Length)]);
        int closes = random.Next(3) == 0 ? random.Next(depth + 2) : depth;
        for (int i = 0; i < closes; i++) sb.Append(close);
        return sb.ToString();
    }

    private static string Huge(Random random, string alphabet)
    {
        int length = random.Next(4) == 0 ? random.Next(500_000, 2_000_000) : random.Next(1000, 50_000);
        var chars = new char[length];
        for (int i = 0; i < length; i++) chars[i] = alphabet[random.Next(alphabet.Length)];
        return new string(chars);
    }

    private static string Binary(Random random)
    {
        var chars = new char[random.Next(1, 5000)];
        for (int i = 0; i < chars.Length; i++)
            chars[i] = random.Next(3) == 0 ? (char)random.Next(0, 0x10000) : (char)random.Next(0, 256);
        return new string(chars);
    }

    private static string Digits(Random random, List<string> samples)
    {
        string sample = samples[random.Next(samples.Count)];
        int at = random.Next(sample.Length + 1);
        return sample[..at] + new string('9', random.Next(10, 5000)) + sample[at..];
    }

    private static string Damaged(Random random, List<string> samples, string alphabet)
    {
        var sb = new StringBuilder(samples[random.Next(samples.Count)]);
        int edits = random.Next(1, 6);
        for (int e = 0; e < edits; e++)
        {
            int at = random.Next(sb.Length + 1);
            char ch = alphabet[random.Next(alphabet.Length)];
            switch (random.Next(3))
            {
                case 0: sb.Insert(at, ch); break;
                case 1: if (at < sb.Length) sb.Remove(at, 1); break;
                default: if (at < sb.Length) sb[at] = ch; break;
            }
        }
        return sb.ToString();
    }

    private static string Show(string text) =>
        Values.PrintableText.Escape(text.Length <= 40 ? text : text[..40] + "…");
}
