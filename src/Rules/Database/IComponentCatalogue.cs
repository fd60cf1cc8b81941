namespace Bramble.Rules.Database;

/// <summary>
/// A ruleset whose components up to a given size can be listed one by one (every Domineering
/// region of up to N cells, every Hackenbush piece of up to N edges, every Clobber group of up to
/// N stones, ...), so <c>bramble db build</c> can precompute their values into a database file.
/// The verb knows no ruleset: implementing this interface is all a ruleset does to be listed.
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

    /// <summary>
    /// The size of a component in the measure <see cref="ComponentsUpTo"/> counts (what
    /// <c>bramble db info</c> groups entries by); the position's own <see cref="IPosition.Size"/>
    /// unless the catalogue counts something else (Konane lists rectangles by their squares).
    /// </summary>
    int CatalogueSize(IPosition component) => component.Size;
}
