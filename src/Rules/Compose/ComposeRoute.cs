namespace Bramble.Rules.Compose;

/// <summary>How a composed position was found: built by a rule of the field, or met in the search.</summary>
public enum ComposeRoute
{
    Construction,
    Search,
}
