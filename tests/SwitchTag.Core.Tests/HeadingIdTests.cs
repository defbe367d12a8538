using System.Text.Json;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Heading ids as the output contract writes them: index.json <c>headings[].id</c> is "label and
/// GeoNames id (<c>loc-g756135</c>), ISO 3166-2 region code (<c>loc-r-it-78</c>) or folded key
/// (<c>per-anna-nowak</c>)", <c>mentions[].heading</c> and <c>possiblySame</c> carry the same strings
/// (src/SwitchTag.Output/SCHEMA.md; ../shared/DESIGN.md lists <c>headings[].id</c> and
/// <c>mentions[].heading</c>). Ordinal comparison is .NET's <see cref="string.CompareOrdinal(string, string)"/>.</summary>
public class HeadingIdTests
{
    [Theory]
    // The three examples of SCHEMA.md headings[].id.
    [InlineData(NameLabel.LOC, "g756135", "loc-g756135")]
    [InlineData(NameLabel.LOC, "r-it-78", "loc-r-it-78")]
    [InlineData(NameLabel.PER, "anna-nowak", "per-anna-nowak")]
    public void It_is_the_label_in_lower_case_then_the_key(NameLabel label, string key, string written)
    {
        Assert.Equal(written, HeadingId.For(label, key).Value);
        Assert.Equal(written, HeadingId.For(label, key).ToString());
    }

    [Fact]
    public void Equality_is_ordinal()
    {
        // SCHEMA.md: ids are "equal across interviews for the same place or key", compared as written.
        Assert.Equal(new HeadingId("loc-g756135"), HeadingId.For(NameLabel.LOC, "g756135"));
        Assert.NotEqual(new HeadingId("loc-g756135"), new HeadingId("LOC-g756135"));
        Assert.Single(new HashSet<HeadingId> { new("per-anna-nowak"), new("per-anna-nowak") });
    }

    [Fact]
    public void Order_is_ordinal()
    {
        // string.CompareOrdinal compares UTF-16 code units: 'g' (U+0067) < 'r' (U+0072), a prefix first,
        // and "per-x-10" before "per-x-2" since '1' < '2'; HeadingOrder breaks name ties by this order.
        string[] written = ["loc-r-it-78", "per-anna-nowak-2", "loc-g756135", "per-anna-nowak", "per-x-2", "per-x-10"];
        var expected = written.Order(StringComparer.Ordinal).ToList();
        Assert.Equal(["loc-g756135", "loc-r-it-78", "per-anna-nowak", "per-anna-nowak-2", "per-x-10", "per-x-2"], expected);
        Assert.Equal(expected, written.Select(w => new HeadingId(w)).Order().Select(h => h.Value));
        Assert.True(new HeadingId("loc-g756135") < new HeadingId("loc-r-it-78"));
        // Upper case sorts before lower case in code-unit order ('L' U+004C < 'l' U+006C), unlike a culture's order.
        Assert.True(new HeadingId("LOC-x") < new HeadingId("loc-x"));
    }

    [Fact]
    public void A_relabelled_heading_keeps_its_key_under_the_new_prefix()
    {
        // SCHEMA.md relabel-heading: "its id takes the new label's prefix".
        Assert.Equal(new HeadingId("org-anna-nowak"), new HeadingId("per-anna-nowak").WithLabel(NameLabel.ORG));
        Assert.Equal(new HeadingId("per-r-it-78"), new HeadingId("loc-r-it-78").WithLabel(NameLabel.PER));
    }

    [Fact]
    public void Json_carries_the_plain_string()
    {
        // index.json "id": "loc-g756135" and "possiblySame": ["per-stanley-kowalczyk"] (SCHEMA.md).
        Assert.Equal("\"loc-g756135\"", JsonSerializer.Serialize(new HeadingId("loc-g756135")));
        Assert.Equal("[\"per-stanley-kowalczyk\"]", JsonSerializer.Serialize(new[] { new HeadingId("per-stanley-kowalczyk") }));
        Assert.Equal(new HeadingId("loc-r-it-78"), JsonSerializer.Deserialize<HeadingId>("\"loc-r-it-78\""));
    }

    [Fact]
    public void An_empty_id_is_refused()
    {
        Assert.Throws<ArgumentException>(() => new HeadingId(""));
        Assert.Throws<ArgumentNullException>(() => new HeadingId(null!));
    }
}
