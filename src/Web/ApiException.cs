namespace Bramble.Web;

/// <summary>
/// A request the board cannot answer as asked: the HTTP status (4xx for the caller's mistakes,
/// 502 when an engine of the user's own misbehaved), a message for people and, where it helps,
/// the JSON path of the field at fault.
/// </summary>
public sealed class ApiException(int status, string message, string? path = null) : Exception(message)
{
    public int Status { get; } = status;
    public string? Path { get; } = path;

    public static ApiException Bad(string message, string? path = null) => new(400, message, path);
}
