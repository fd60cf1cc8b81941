using System.Text;

namespace Bramble.Rules.Hackenbush;

/// <summary>
/// The normal key of a piece: a text that is the same for every piece with the same game up to
/// renaming edges and nodes and reordering them, and that determines the game (so equal keys
/// may share one memo entry). Built on the block tree from the ground:
/// <code>
/// vertex := { entry }                       entries in a fixed order (by a content hash)
/// entry  := colour vertex '.'               a bridge and what stands on it; a loop is a twig
///         | '[' k ':' edges ';' vertex { '/' vertex } ']'
///                                           a block of k vertices, canonically labelled
///                                           (root 0), with what hangs at vertices 1..k-1
/// </code>
/// Trees therefore get their canonical encoding. A green block carrying only green parts is
/// written fused (fusion principle): its vertices merge into its root and its edges become
/// loops, that is green twigs, of which only the parity is kept. Every other block gets a
/// canonical labelling (<see cref="BlockCertificate"/>). An all-green piece, finally, is
/// written as the stalk that fusion and the colon principle reduce it to, <c>*n</c>: that is its
/// normal form under those principles, found in linear time even for 10^6 edges, where
/// writing out the fused tree would cost more than the value itself. See docs/hackenbush.md.
/// </summary>
internal static class NormalForm
{
    private const ulong GreenTwig = 0x47UL;

    private enum EntryKind : byte { Bridge, Loop, Fused, Block }

    public static string Key(HackenbushPosition piece)
    {
        if (piece.IsEmpty) return "0";
        if (piece.IsGreen) return "*" + piece.NimValue;
        int n = piece.NodeCount;
        var colours = piece.Colours;
        var from = piece.From;
        var to = piece.To;
        var blocks = BlockDecomposition.Build(n, from, to, piece.Adjacency, 0);

        var hash = new ulong[n];
        var green = new bool[n];
        Array.Fill(green, true);
        var kind = new EntryKind[blocks.Count];
        var entryHash = new ulong[blocks.Count];
        var certificates = new BlockCertificate.Result[blocks.Count];
        var blockVertices = new int[blocks.Count][];

        for (int b = 0; b < blocks.Count; b++)
        {
            int root = blocks.Root[b];
            int start = blocks.Start[b], size = blocks.Size(b);
            if (size == 1)
            {
                int e = blocks.Edges[start];
                bool loop = from[e] == to[e];
                int top = loop ? -1 : Adjacency.Other(from, to, e, root);
                kind[b] = loop ? EntryKind.Loop : EntryKind.Bridge;
                entryHash[b] = Mix.Hash((ulong)colours[e] + 1, top < 0 ? 0 : hash[top]);
                hash[root] += Mix.Hash(entryHash[b]);
                green[root] &= colours[e] == EdgeColour.Green && (top < 0 || green[top]);
                continue;
            }
            var members = new List<int>();
            var local = new Dictionary<int, int> { [root] = 0 };
            bool fusible = true;
            for (int i = start; i < start + size; i++)
            {
                int e = blocks.Edges[i];
                if (colours[e] != EdgeColour.Green) fusible = false;
                foreach (int v in (ReadOnlySpan<int>)[from[e], to[e]])
                {
                    if (local.ContainsKey(v)) continue;
                    local.Add(v, local.Count);
                    members.Add(v);
                    if (!green[v]) fusible = false;
                }
            }
            blockVertices[b] = members.ToArray();
            if (fusible)
            {
                kind[b] = EntryKind.Fused;
                foreach (int v in members) hash[root] += hash[v];
                if ((size & 1) == 1) hash[root] += Mix.Hash(Mix.Hash(GreenTwig, 0));
                continue;
            }
            kind[b] = EntryKind.Block;
            green[root] = false;
            int k = local.Count;
            var c = new EdgeColour[size];
            var f = new int[size];
            var t = new int[size];
            for (int i = 0; i < size; i++)
            {
                int e = blocks.Edges[start + i];
                c[i] = colours[e];
                f[i] = local[from[e]];
                t[i] = local[to[e]];
            }
            var labels = new ulong[k];
            for (int j = 0; j < members.Count; j++) labels[j + 1] = hash[members[j]];
            var cert = BlockCertificate.Find(k, c, f, t, labels);
            certificates[b] = cert;
            ulong h = Mix.Hash(0xB10C, (ulong)k);
            foreach (long code in cert.Edges) h = Mix.Hash(h, (ulong)code);
            for (int j = 1; j < k; j++) h = Mix.Hash(h, labels[cert.Order[j]]);
            entryHash[b] = h;
            hash[root] += Mix.Hash(h);
        }

        // Blocks grouped by the vertex they hang from.
        var firstAt = new int[n + 1];
        for (int b = 0; b < blocks.Count; b++) firstAt[blocks.Root[b] + 1]++;
        for (int v = 0; v < n; v++) firstAt[v + 1] += firstAt[v];
        var fill = (int[])firstAt.Clone();
        var byRoot = new int[blocks.Count];
        for (int b = 0; b < blocks.Count; b++) byRoot[fill[blocks.Root[b]]++] = b;

        return Emit(piece, blocks, kind, entryHash, certificates, blockVertices, firstAt, byRoot);
    }

    /// <summary>Writes the key top-down with an explicit work stack (trees may be 10^6 deep).</summary>
    private static string Emit(HackenbushPosition piece, BlockDecomposition blocks, EntryKind[] kind, ulong[] entryHash,
        BlockCertificate.Result[] certificates, int[][] blockVertices, int[] firstAt, int[] byRoot)
    {
        var colours = piece.Colours;
        var from = piece.From;
        var to = piece.To;
        var sb = new StringBuilder(piece.EdgeCount * 2 + 4);
        // Work items: a vertex to expand (>= 0), or a literal character (-1 - char).
        var work = new Stack<int>();
        work.Push(0);
        var entries = new List<(ulong Hash, int Block, bool Twig)>();
        var expand = new Stack<int>();
        while (work.Count > 0)
        {
            int item = work.Pop();
            if (item < 0) { sb.Append((char)(-1 - item)); continue; }
            // Gather the entries at this vertex, looking through fused blocks into what they carry.
            entries.Clear();
            expand.Push(item);
            while (expand.Count > 0)
            {
                int v = expand.Pop();
                for (int i = firstAt[v]; i < firstAt[v + 1]; i++)
                {
                    int b = byRoot[i];
                    if (kind[b] == EntryKind.Fused)
                    {
                        foreach (int member in blockVertices[b]) expand.Push(member);
                        if ((blocks.Size(b) & 1) == 1) entries.Add((Mix.Hash(GreenTwig, 0), -1, true));
                    }
                    else entries.Add((entryHash[b], b, false));
                }
            }
            entries.Sort((x, y) => x.Hash != y.Hash ? x.Hash.CompareTo(y.Hash) : x.Block.CompareTo(y.Block));
            // Push in reverse so the first entry is written first.
            for (int i = entries.Count - 1; i >= 0; i--)
            {
                var (_, b, twig) = entries[i];
                if (twig) { PushText(work, "G."); continue; }
                int start = blocks.Start[b];
                switch (kind[b])
                {
                    case EntryKind.Loop:
                        PushText(work, $"{colours[blocks.Edges[start]].Letter()}.");
                        break;
                    case EntryKind.Bridge:
                    {
                        int e = blocks.Edges[start];
                        work.Push(-1 - '.');
                        work.Push(Adjacency.Other(from, to, e, blocks.Root[b]));
                        work.Push(-1 - colours[e].Letter());
                        break;
                    }
                    default:
                    {
                        var cert = certificates[b];
                        int k = cert.Order.Length;
                        var members = blockVertices[b];
                        work.Push(-1 - ']');
                        for (int j = k - 1; j >= 1; j--)
                        {
                            work.Push(members[cert.Order[j] - 1]);
                            if (j > 1) work.Push(-1 - '/');
                        }
                        var head = new StringBuilder();
                        head.Append('[').Append(k).Append(':');
                        for (int j = 0; j < cert.Edges.Length; j++)
                        {
                            long code = cert.Edges[j];
                            int colour = (int)(code % 3);
                            long pair = code / 3;
                            if (j > 0) head.Append(',');
                            head.Append(((EdgeColour)colour).Letter()).Append(pair / k).Append('-').Append(pair % k);
                        }
                        head.Append(';');
                        PushText(work, head.ToString());
                        break;
                    }
                }
            }
        }
        return sb.ToString();
    }

    private static void PushText(Stack<int> work, string text)
    {
        for (int i = text.Length - 1; i >= 0; i--) work.Push(-1 - text[i]);
    }
}
