using SwitchTag.Core.Text;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>Char flags held as bits, checked against a bool per char (what they replace) over ranges
/// that cross the 64-char words the bits are stored in.</summary>
public class CharFlagsTests
{
    [Fact]
    public void It_answers_as_a_bool_per_char_would()
    {
        const int length = 300;
        var flags = new CharFlags(length);
        var bools = new bool[length];
        var random = new Random(11);
        for (int round = 0; round < 200; round++)
        {
            int start = random.Next(length), count = random.Next(Math.Min(80, length - start) + 1);
            Assert.Equal(bools.AsSpan(start, count).Contains(true), flags.Any(start, count));
            if (round % 3 != 0) continue;
            flags.Set(start, count);
            bools.AsSpan(start, count).Fill(true);
        }
    }

    [Fact]
    public void A_range_touching_a_set_one_is_free_and_an_overlapping_one_is_not()
    {
        var flags = new CharFlags(130);
        flags.Set(60, 10); // chars 60..69, across the first word boundary (64)
        Assert.False(flags.Any(50, 10));
        Assert.False(flags.Any(70, 60));
        Assert.True(flags.Any(69, 1));
        Assert.True(flags.Any(0, 61));
        Assert.False(flags.Any(129, 1));
        Assert.False(flags.Any(65, 0));
    }
}
