using SwitchTag.Core.Text;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Half-open char offsets, checked against .NET's own slicing: the C# range <c>text[a..b]</c>
/// excludes b and <see cref="string.Substring(int, int)"/> takes a length (C# language reference,
/// "Ranges").</summary>
public class CharSpanTests
{
    private const string Text = "Zażółć gęślą jaźń";

    [Fact]
    public void Its_length_is_what_a_csharp_range_slices()
    {
        var (start, end) = new CharSpan(7, 12);
        Assert.Equal("gęślą", Text[start..end]);
        Assert.Equal(Text.Substring(7, 5), Text[start..end]);
        Assert.Equal(5, new CharSpan(7, 12).Length);
        Assert.True(new CharSpan(3, 3).IsEmpty); // Text[3..3] is ""
    }

    [Fact]
    public void It_contains_its_start_but_not_its_end()
    {
        // Range 7..12 holds indices 7 to 11 (C# ranges: end exclusive).
        var span = new CharSpan(7, 12);
        Assert.True(span.Contains(7));
        Assert.True(span.Contains(11));
        Assert.False(span.Contains(12));
        Assert.False(span.Contains(6));
        // Spans that meet share no offset: "Zażółć" is [0, 6), " " [6, 7).
        Assert.False(new CharSpan(0, Text.IndexOf(' ')).Contains(6));
        Assert.False(new CharSpan(3, 3).Contains(3));
    }

    [Fact]
    public void A_negative_start_or_an_end_before_the_start_is_refused()
    {
        // string.Substring throws ArgumentOutOfRangeException for the same inputs (.NET API reference).
        Assert.Throws<ArgumentOutOfRangeException>(() => Text.Substring(-1, 2));
        Assert.Throws<ArgumentOutOfRangeException>(() => new CharSpan(-1, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new CharSpan(5, 4));
    }
}
