using SwitchTag.Core.Text;
using Xunit;

namespace SwitchTag.Core.Tests;

/// <summary>The shared-string table: equal text, and one object for text met again.</summary>
public class SharedStringsTests
{
    [Fact]
    public void A_name_cut_twice_from_a_turn_is_one_string()
    {
        const string turn = "We went from Warsaw to Paris, and from Warsaw to Lublin.";
        var first = SharedStrings.Of(turn.AsSpan(13, 6));
        var second = SharedStrings.Of(turn.AsSpan(turn.LastIndexOf("Warsaw", StringComparison.Ordinal), 6));
        Assert.Equal("Warsaw", first);
        Assert.Same(first, second);
    }

    [Fact]
    public void A_string_read_again_gives_back_the_one_already_kept()
    {
        var kept = SharedStrings.Of(new string("place-evidence".AsSpan()));
        var copy = new string("place-evidence".AsSpan());
        Assert.NotSame(kept, copy);
        Assert.Same(kept, SharedStrings.Of(copy));
    }

    [Fact]
    public void Long_text_is_copied_and_never_kept()
    {
        var sentence = new string('a', 65);
        Assert.Same(sentence, SharedStrings.Of(sentence));
        Assert.NotSame(SharedStrings.Of(sentence.AsSpan()), SharedStrings.Of(sentence.AsSpan()));
        Assert.Equal(sentence, SharedStrings.Of(sentence.AsSpan()));
    }
}
