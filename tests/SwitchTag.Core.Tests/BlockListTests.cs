using SwitchTag.Core.Text;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Items gathered in blocks come out as the list a plain <see cref="List{T}"/> would hold,
/// with no spare capacity.</summary>
public class BlockListTests
{
    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(16)]
    [InlineData(17)]
    [InlineData(25_000)] // many blocks, the later ones at their largest (80,000 bytes of 8-byte pairs)
    public void It_keeps_every_item_in_order(int count)
    {
        var blocks = new BlockList<(int, int)>();
        var plain = new List<(int, int)>();
        for (int i = 0; i < count; i++)
        {
            blocks.Add((i, 2 * i + 1));
            plain.Add((i, 2 * i + 1));
        }
        var list = blocks.ToList();
        Assert.Equal(count, blocks.Count);
        Assert.Equal(plain, list);
        Assert.Equal(count, list.Capacity);
    }
}
