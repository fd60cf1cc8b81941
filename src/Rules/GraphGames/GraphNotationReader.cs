using Bramble.Rules.Common;

namespace Bramble.Rules.GraphGames;

/// <summary>
/// Reads the Snort and Col notation (docs/snort.md, docs/col.md) in one pass: graphs in
/// brackets (<c>[1-2-3, 2-4B]</c>), shortcuts for paths, cycles and grids (<c>P5</c>,
/// <c>C6</c>, <c>3x4</c>), parts joined by '+', and <c>0</c> for the empty position. Vertex
/// labels are shared by the whole text: a label written twice is one vertex. Every error names
/// the column and what could have stood there.
/// </summary>
internal sealed class GraphNotationReader
{
    /// <summary>The most vertices a shortcut may make (a few characters could otherwise ask for millions).</summary>
    public const int MaxShortcut = 4096;

    /// <summary>Labels have at most this many digits, so they fit an int.</summary>
    private const int MaxLabelDigits = 9;

    private const string PartStart = "a graph in brackets such as [1-2-3,2-4B], a shortcut P5, C6 or 3x4, or 0";
    private const string VertexExpected = "a vertex number such as 3, or 3B (coloured blue) or 3R (coloured red)";

    private readonly string _text;
    private int _pos;
    private readonly Dictionary<int, VertexColour> _vertices = new();
    // Where each label was first given a colour, for the message when a later mention disagrees.
    private readonly Dictionary<int, int> _colouredAt = new();
    private readonly List<(int A, int B)> _edges = new();
    private int _highest;

    private GraphNotationReader(string text) => _text = text;

    public static ColouredGraph Read(string text)
    {
        var reader = new GraphNotationReader(text);
        reader.ReadPosition();
        return ColouredGraph.Build(reader._vertices, reader._edges);
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
        if (Current == '0' && (_pos + 1 >= _text.Length || !char.IsAsciiDigit(_text[_pos + 1]) && char.ToLowerInvariant(_text[_pos + 1]) != 'x'))
        {
            _pos++;
            SkipSpace();
            if (!AtEnd) throw Error(_pos, "the end of the text (0 stands alone for the empty position)");
            return;
        }
        while (true)
        {
            ReadPart();
            SkipSpace();
            if (AtEnd) return;
            if (Current != '+') throw Error(_pos, "'+' or the end of the text");
            _pos++;
            SkipSpace();
            if (AtEnd) throw Error(_pos, "another part after '+': " + PartStart[..PartStart.LastIndexOf(", or 0", StringComparison.Ordinal)]);
        }
    }

    private void ReadPart()
    {
        char c = char.ToUpperInvariant(Current);
        if (c == '[') ReadGraph();
        else if (c == 'P' || c == 'C') ReadLine(c);
        else if (char.IsAsciiDigit(c)) ReadGrid();
        else throw Error(_pos, PartStart);
    }

    private void ReadGraph()
    {
        _pos++; // '['
        while (true)
        {
            SkipSpace();
            int previous = ReadVertex();
            while (true)
            {
                SkipSpace();
                if (AtEnd) throw Error(_pos, "'-', ',' or ']'");
                if (Current != '-') break;
                _pos++;
                SkipSpace();
                int at = _pos;
                int next = ReadVertex();
                if (next == previous) throw Error(at, $"a vertex other than {previous} (a vertex is not joined to itself)");
                _edges.Add((previous, next));
                previous = next;
            }
            if (Current == ',') { _pos++; continue; }
            if (Current == ']') { _pos++; return; }
            throw Error(_pos, "'-', ',' or ']'");
        }
    }

    private int ReadVertex()
    {
        int start = _pos;
        if (AtEnd || !char.IsAsciiDigit(Current)) throw Error(_pos, VertexExpected);
        while (!AtEnd && char.IsAsciiDigit(Current))
        {
            if (_pos - start >= MaxLabelDigits) throw Error(_pos, $"a vertex number of at most {MaxLabelDigits} digits");
            _pos++;
        }
        int label = int.Parse(_text.AsSpan(start, _pos - start), System.Globalization.CultureInfo.InvariantCulture);
        var colour = VertexColour.Uncoloured;
        if (!AtEnd && char.ToUpperInvariant(Current) is 'B' or 'R')
        {
            colour = char.ToUpperInvariant(Current) == 'B' ? VertexColour.Blue : VertexColour.Red;
            _pos++;
        }
        else if (!AtEnd && char.IsLetter(Current))
        {
            throw Error(_pos, "B (blue) or R (red) after a vertex number, or nothing for an uncoloured vertex");
        }
        Add(label, colour, start);
        return label;
    }

    private void Add(int label, VertexColour colour, int column)
    {
        _highest = Math.Max(_highest, label);
        if (!_vertices.TryGetValue(label, out var known) || known == VertexColour.Uncoloured)
        {
            if (colour != VertexColour.Uncoloured || !_vertices.ContainsKey(label))
            {
                _vertices[label] = colour;
                if (colour != VertexColour.Uncoloured) _colouredAt[label] = column;
            }
            return;
        }
        if (colour != VertexColour.Uncoloured && colour != known)
        {
            string was = known == VertexColour.Blue ? "B" : "R";
            throw Error(column, $"vertex {label} in one colour (it was written {label}{was} at column {_colouredAt[label] + 1})");
        }
    }

    /// <summary>P n (a path of n vertices) or C n (a cycle of n vertices, n ≥ 3), numbered on from the highest label so far.</summary>
    private void ReadLine(char kind)
    {
        _pos++;
        SkipSpace();
        int at = _pos;
        int n = NotationNumber.Read(_text, ref _pos, kind == 'P' ? "the number of vertices of the path, as in P5" : "the number of vertices of the cycle, as in C6");
        int least = kind == 'P' ? 1 : 3;
        if (n < least || n > MaxShortcut)
            throw Error(at, $"a number from {least} to {MaxShortcut} ({(kind == 'P' ? "vertices of a path" : "vertices of a cycle")})");
        int first = NextLabels(n, at);
        for (int i = 0; i < n; i++) Add(first + i, VertexColour.Uncoloured, at);
        for (int i = 0; i + 1 < n; i++) _edges.Add((first + i, first + i + 1));
        if (kind == 'C') _edges.Add((first + n - 1, first));
    }

    /// <summary>R x C: a grid, numbered on row by row.</summary>
    private void ReadGrid()
    {
        int at = _pos;
        int rows = NotationNumber.Read(_text, ref _pos, "the number of rows");
        SkipSpace();
        if (AtEnd || char.ToLowerInvariant(Current) != 'x' && Current != '×')
            throw Error(_pos, "'x' between the numbers of rows and columns, as in 3x4");
        _pos++;
        SkipSpace();
        int columnsAt = _pos;
        int columns = NotationNumber.Read(_text, ref _pos, "the number of columns");
        if (rows < 1 || rows > MaxShortcut) throw Error(at, $"a number of rows from 1 to {MaxShortcut}");
        if (columns < 1 || (long)rows * columns > MaxShortcut) throw Error(columnsAt, $"a number of columns from 1 to {MaxShortcut / rows} (at most {MaxShortcut} vertices)");
        int first = NextLabels(rows * columns, at);
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < columns; c++)
            {
                int label = first + r * columns + c;
                Add(label, VertexColour.Uncoloured, at);
                if (c + 1 < columns) _edges.Add((label, label + 1));
                if (r + 1 < rows) _edges.Add((label, label + columns));
            }
    }

    private int NextLabels(int count, int column)
    {
        long first = _highest + 1L;
        if (first + count - 1 > 999_999_999) throw Error(column, "a shortcut whose vertex numbers stay below 1000000000");
        return (int)first;
    }
}
