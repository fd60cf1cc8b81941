using Bramble.Rules.Domineering;

namespace Bramble.Rules.Tests.Domineering;

public class PolyominoTests
{
    [Fact]
    public void FreePolyominoCountsUpToTenCells()
    {
        var counts = new int[11];
        foreach (var region in Polyominoes.UpTo(10)) counts[region.CellCount]++;
        // [from memory] OEIS A000105, free polyominoes with n cells: 1, 1, 2, 5, 12, 35, 108, 369, 1285, 4655.
        Assert.Equal([0, 1, 1, 2, 5, 12, 35, 108, 369, 1285, 4655], counts);
    }

    [Fact]
    public void EveryListedRegionIsConnectedAndInNormalForm()
    {
        foreach (var region in Polyominoes.UpTo(8))
        {
            Assert.Equal(region.Cells, region.ConnectedPart(region.Cells & (~region.Cells + UInt128.One)));
            Assert.Equal(new NormalRegion(region, false), NormalRegion.Of(region));
        }
    }
}
