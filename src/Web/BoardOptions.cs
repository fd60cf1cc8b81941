using System.Net;

namespace Bramble.Web;

/// <summary>Where the board listens and which engines of the user's own it may start.</summary>
/// <param name="Address">The address to bind; loopback unless the user asked otherwise.</param>
/// <param name="Port">The port; 0 picks a free one (tests).</param>
public sealed record BoardOptions(IPAddress Address, int Port, EngineRoster Engines)
{
    public static BoardOptions Loopback(int port) => new(IPAddress.Loopback, port, EngineRoster.None);
}
