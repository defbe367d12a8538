using System.Text.Json;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Mention ids as the output contract writes them: index.json <c>headings[].mentions</c> are
/// "indices into <c>mentions</c>, in time order" and <c>review[].mention</c> is an "index into
/// <c>mentions</c>", JSON numbers (src/SwitchTag.Output/SCHEMA.md). JSON read and written with
/// System.Text.Json as the reference.</summary>
public class MentionIdTests
{
    [Fact]
    public void Equal_positions_are_the_same_mention()
    {
        Assert.Equal(new MentionId(0), new MentionId(0));
        Assert.True(new MentionId(4) != new MentionId(5));
        Assert.Single(new HashSet<MentionId> { new(9), new(9) });
    }

    [Fact]
    public void Mentions_order_by_their_place_in_the_index()
    {
        // SCHEMA.md: "mentions: every name found ..., in transcript order", so mention 9 comes before mention 10.
        Assert.Equal([new MentionId(1), new MentionId(9), new MentionId(10)], new[] { new MentionId(10), new MentionId(1), new MentionId(9) }.Order());
        Assert.True(new MentionId(9) < new MentionId(10));
        Assert.True(new MentionId(9) <= new MentionId(9));
    }

    [Fact]
    public void It_is_written_as_the_plain_index_into_mentions()
    {
        // index.json "mentions": [0, 3, 17] under a heading, "mention": 17 in review (SCHEMA.md).
        Assert.Equal("17", new MentionId(17).ToString());
        Assert.Equal("[0,3,17]", JsonSerializer.Serialize(new[] { new MentionId(0), new MentionId(3), new MentionId(17) }));
        Assert.Equal(new MentionId(17), JsonSerializer.Deserialize<MentionId>("17"));
    }

    [Fact]
    public void A_negative_index_is_refused() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => new MentionId(-1));
}
