namespace Bramble.Rules.Database;

/// <summary>
/// A ruleset whose components up to a given size can be listed one by one (every Domineering
/// region of up to N cells, every Hackenbush piece of up to N edges), so <c>bramble db build</c>
/// can precompute their values into a database file.
/// </summary>
public interface IComponentCatalogue
{
    /// <summary>The largest size <see cref="ComponentsUpTo"/> accepts (the lists grow exponentially).</summary>
    int MaxCatalogueSize { get; }

    /// <summary>What the size counts, for messages: "cells", "edges".</summary>
    string SizeUnit { get; }

    /// <summary>
    /// One component of each kind (up to the symmetries its normal key ignores) for every size from
    /// the smallest up to <paramref name="size"/>, smaller ones first.
    /// </summary>
    IEnumerable<IPosition> ComponentsUpTo(int size);
}
