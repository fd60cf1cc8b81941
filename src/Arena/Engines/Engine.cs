using Bramble.Wire.Client;

namespace Bramble.Arena.Engines;

/// <summary>A started, greeted engine process of one player, as the pool hands it out.</summary>
public sealed record Engine(string PlayerId, EngineClient Client, Welcome Welcome)
{
    public bool IsUsable => Client.IsUsable;
}
