using System.Globalization;
using System.Text.Json;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Turn ids as the output contract writes them: index.json <c>mentions[].turn</c> and
/// <c>worklist[].turn</c> are "index into <c>turns</c>", a JSON number (src/SwitchTag.Output/SCHEMA.md;
/// ../shared/DESIGN.md: <c>turn</c> (index into turns)); mentions.csv and worklist.csv carry it in their
/// <c>turn</c> column (SCHEMA.md). JSON read and written with System.Text.Json as the reference.</summary>
public class TurnIdTests
{
    [Fact]
    public void Equal_positions_are_the_same_turn()
    {
        Assert.Equal(new TurnId(3), new TurnId(3));
        Assert.True(new TurnId(3) == new TurnId(3));
        Assert.NotEqual(new TurnId(3), new TurnId(4));
        Assert.Single(new HashSet<TurnId> { new(7), new(7) });
    }

    [Fact]
    public void Turns_order_by_their_place_in_the_interview()
    {
        // SCHEMA.md: "turns: speaker turns, in order", so turn 2 comes before turn 10 (not as text: "10" < "2").
        Assert.Equal([new TurnId(0), new TurnId(2), new TurnId(10)], new[] { new TurnId(10), new TurnId(0), new TurnId(2) }.Order());
        Assert.True(new TurnId(2) < new TurnId(10));
        Assert.True(new TurnId(10) >= new TurnId(10));
        Assert.Equal(0, new TurnId(5).CompareTo(new TurnId(5)));
    }

    [Fact]
    public void It_is_written_as_the_plain_index_into_turns()
    {
        // SCHEMA.md mentions.csv "...,turn,char,char_end": the turn cell is the decimal index, as index.json's number.
        Assert.Equal("12", new TurnId(12).ToString());
        var before = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("ar-SA");
            Assert.Equal("12", new TurnId(12).ToString());
        }
        finally { CultureInfo.CurrentCulture = before; }
        // index.json: "turn": 12, a JSON number (RFC 8259 section 6), not an object or a string.
        Assert.Equal("12", JsonSerializer.Serialize(new TurnId(12)));
        Assert.Equal(new TurnId(12), JsonSerializer.Deserialize<TurnId>("12"));
    }

    [Fact]
    public void A_negative_index_is_refused()
    {
        // An index into a list is never negative (ImmutableArray throws for -1 too, .NET API reference).
        Assert.Throws<ArgumentOutOfRangeException>(() => new TurnId(-1));
    }
}
