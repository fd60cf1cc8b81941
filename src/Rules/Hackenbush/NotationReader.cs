namespace Bramble.Rules.Hackenbush;

/// <summary>
/// Reads the Hackenbush notation of docs/hackenbush.md in one pass over the text, without recursion
/// (a tree may nest as deep as it is long). Edge ids are handed out in order of appearance.
/// Every error names the column and what could have stood there.
/// </summary>
internal sealed class NotationReader
{
    private const string PartStart = "a stalk such as BRG, a graph in brackets such as [B0-1,R1-2] or 0";

    private readonly string _text;
    private int _pos;

    // The edges read so far, in order of appearance (= id order), with the column each began at.
    private readonly List<EdgeColour> _colours;
    private readonly List<int> _from;
    private readonly List<int> _to;
    private readonly List<int> _columns;
    private int _nodes = 1; // node 0 is the ground

    private NotationReader(string text)
    {
        _text = text;
        int guess = Math.Max(4, text.Length / 2);
        _colours = new(guess);
        _from = new(guess);
        _to = new(guess);
        _columns = new(guess);
    }

    public static HackenbushPosition Read(HackenbushRuleset ruleset, string text)
    {
        var reader = new NotationReader(text);
        reader.ReadPosition();
        return reader.Build(ruleset);
    }

    private PositionSyntaxException Error(int column, string expected) => new(_text, column, expected);

    private bool AtEnd => _pos >= _text.Length;
    private char Current => _text[_pos];

    private void SkipSpace()
    {
        while (_pos < _text.Length && char.IsWhiteSpace(_text[_pos])) _pos++;
    }

    private void ReadPosition()
    {
        SkipSpace();
        if (AtEnd) throw Error(_pos, PartStart);
        if (Current == '0')
        {
            _pos++;
            SkipSpace();
            if (!AtEnd) throw Error(_pos, "the end of the text (0 stands alone for the empty position)");
            return;
        }
        if (Current != '[' && !EdgeColourExtensions.TryParse(Current, out _)) throw Error(_pos, PartStart);
        while (true)
        {
            ReadPart();
            SkipSpace();
            if (AtEnd) return;
            // A letter that is no colour is most likely a mistyped one: say so, as the other
            // places do. A real colour here follows a closed branch list, where no stalk goes on.
            if (Current != '+')
                throw Error(_pos, char.IsLetter(Current) && !EdgeColourExtensions.TryParse(Current, out _)
                    ? "a colour B, R or G"
                    : "'+' or the end of the text");
            _pos++;
            SkipSpace();
            if (AtEnd) throw Error(_pos, "another part after '+': a stalk such as BRG or a graph such as [B0-1]");
        }
    }

    private void ReadPart()
    {
        if (Current == '[') ReadGraph();
        else if (EdgeColourExtensions.TryParse(Current, out _)) ReadTree();
        else throw Error(_pos, "a stalk (B, R or G) or a graph in brackets such as [B0-1]");
    }

    /// <summary>Reads colours from the bottom up, starting at <paramref name="bottom"/>; returns the top node.</summary>
    private int ReadStalk(int bottom)
    {
        SkipSpace();
        if (AtEnd || !EdgeColourExtensions.TryParse(Current, out _)) throw Error(_pos, "a colour B, R or G");
        int node = bottom;
        while (true)
        {
            SkipSpace();
            if (AtEnd || !EdgeColourExtensions.TryParse(Current, out var colour)) return node;
            int top = _nodes++;
            AddEdge(colour, node, top, _pos);
            node = top;
            _pos++;
        }
    }

    private void ReadTree()
    {
        // The nodes that open branch lists '(' still waiting for their ')'.
        var open = new Stack<int>();
        int top = ReadStalk(0);
        while (true)
        {
            SkipSpace();
            if (!AtEnd && Current == '(')
            {
                _pos++;
                open.Push(top);
                top = ReadStalk(top);
                continue;
            }
            // This tree is finished; go on at the innermost open branch list.
            while (true)
            {
                if (open.Count == 0) return;
                SkipSpace();
                if (AtEnd) throw Error(_pos, "',' or ')' to close the branches opened with '('");
                if (Current == ',')
                {
                    _pos++;
                    top = ReadStalk(open.Peek());
                    break;
                }
                if (Current == ')')
                {
                    _pos++;
                    open.Pop();
                    continue;
                }
                throw Error(_pos, "a colour B, R or G, '(', ',' or ')'");
            }
        }
    }

    private void ReadGraph()
    {
        _pos++; // '['
        var labels = new Dictionary<long, int>();
        while (true)
        {
            SkipSpace();
            int start = _pos;
            if (AtEnd || !EdgeColourExtensions.TryParse(Current, out var colour))
                throw Error(_pos, "an edge such as B0-1: a colour B, R or G, then two node numbers joined by '-'");
            _pos++;
            int a = ReadNode(labels);
            SkipSpace();
            if (AtEnd || Current != '-') throw Error(_pos, "'-' between the two nodes of an edge");
            _pos++;
            int b = ReadNode(labels);
            AddEdge(colour, a, b, start);
            SkipSpace();
            if (AtEnd) throw Error(_pos, "',' or ']'");
            if (Current == ',') { _pos++; continue; }
            if (Current == ']') { _pos++; return; }
            throw Error(_pos, "',' or ']'");
        }
    }

    private int ReadNode(Dictionary<long, int> labels)
    {
        SkipSpace();
        int start = _pos;
        long label = 0;
        while (!AtEnd && Current >= '0' && Current <= '9')
        {
            if (_pos - start >= 18) throw Error(_pos, "a node number of at most 18 digits");
            label = label * 10 + (Current - '0');
            _pos++;
        }
        if (_pos == start) throw Error(_pos, "a node number (0 is the ground)");
        if (label == 0) return 0;
        if (!labels.TryGetValue(label, out int node))
        {
            node = _nodes++;
            labels.Add(label, node);
        }
        return node;
    }

    private void AddEdge(EdgeColour colour, int from, int to, int column)
    {
        _colours.Add(colour);
        _from.Add(from);
        _to.Add(to);
        _columns.Add(column);
    }

    private HackenbushPosition Build(HackenbushRuleset ruleset)
    {
        int m = _colours.Count;
        var from = _from.ToArray();
        var to = _to.ToArray();
        var seen = Adjacency.Build(_nodes, from, to).ReachFromGround(from, to);
        for (int e = 0; e < m; e++)
        {
            if (!seen[from[e]])
            {
                int column = _columns[e];
                int end = _text.IndexOfAny([',', ']'], column);
                string shown = _text[column..(end < 0 ? _text.Length : end)].Trim();
                throw Error(column, $"an edge with a path to the ground, but edge e{e + 1} ({shown}) has none");
            }
        }
        var ids = new int[m];
        for (int e = 0; e < m; e++) ids[e] = e + 1;
        return new HackenbushPosition(ruleset, ids, _colours.ToArray(), from, to, _nodes);
    }
}
