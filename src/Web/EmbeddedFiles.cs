using System.Reflection;

namespace Bramble.Web;

/// <summary>
/// The page's files, compiled into this assembly (wwwroot/**), so the board serves everything it
/// needs itself: no files beside the program, no internet.
/// </summary>
public sealed class EmbeddedFiles
{
    private static readonly Dictionary<string, string> s_types = new(StringComparer.OrdinalIgnoreCase)
    {
        [".html"] = "text/html; charset=utf-8",
        [".js"] = "text/javascript; charset=utf-8",
        [".css"] = "text/css; charset=utf-8",
        [".svg"] = "image/svg+xml",
        [".png"] = "image/png",
        [".ico"] = "image/x-icon",
        [".json"] = "application/json",
    };

    private readonly Dictionary<string, (byte[] Bytes, string Type)> _files = new(StringComparer.Ordinal);

    public EmbeddedFiles()
    {
        var assembly = typeof(EmbeddedFiles).Assembly;
        foreach (var name in assembly.GetManifestResourceNames().Where(n => n.StartsWith("wwwroot/", StringComparison.Ordinal)))
        {
            using var stream = assembly.GetManifestResourceStream(name)!;
            using var copy = new MemoryStream();
            stream.CopyTo(copy);
            var path = name["wwwroot/".Length..].Replace('\\', '/');
            _files[path] = (copy.ToArray(), s_types.GetValueOrDefault(Path.GetExtension(path), "application/octet-stream"));
        }
    }

    public IEnumerable<string> Paths => _files.Keys;

    public bool TryGet(string path, out byte[] bytes, out string type)
    {
        if (_files.TryGetValue(path.TrimStart('/'), out var f)) { bytes = f.Bytes; type = f.Type; return true; }
        bytes = []; type = "";
        return false;
    }
}
