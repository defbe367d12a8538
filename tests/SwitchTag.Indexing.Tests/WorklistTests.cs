using SwitchTag.Core.Text;
using SwitchTag.Indexing.Tests.Fakes;
using Xunit;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing.Tests;

public class WorklistTests
{
    [Fact]
    public void Every_stretch_outside_the_main_language_is_listed_with_its_cue_time()
    {
        var index = Fixture.Run();
        // The fixture's Polish and German words (see Fixture.Segmenter), in order; "in" between German
        // words is English, so "Wir waren" ends there.
        Assert.Equal(["<script>alert(1)</script>", "Urodziłam się w Warszawie. Mama mówiła: dziecko.", "Wir waren"], index.Worklist.Select(w => w.Text));
        Assert.Equal(["pl", "pl", "de"], index.Worklist.Select(w => w.Language.Code));
        var polish = index.Worklist[1];
        Assert.Equal("Anna Nowak", polish.Speaker);
        // The whole of cue 3 (11.000-16.000) is Polish.
        Assert.Equal(11_000, polish.Time.Start.Milliseconds);
        Assert.Equal(16_000, polish.Time.End.Milliseconds);
    }

    [Fact]
    public void Seconds_and_words_per_language_add_up()
    {
        var index = Fixture.Run();
        var shares = index.Languages;
        int words = index.Turns.Sum(t => WordCount.Of(t.Text));
        Assert.Equal(words, shares.Sum(s => s.Words));
        Assert.Equal(8, shares.Single(s => s.Language == "pl").Words);
        Assert.Equal(2, shares.Single(s => s.Language == "de").Words);
    }

    [Fact]
    public void Undetermined_and_main_language_stretches_are_not_work()
    {
        Assert.False(WorklistBuilder.IsForeign(new LanguageCode("und"), new LanguageCode("en")));
        Assert.False(WorklistBuilder.IsForeign(new LanguageCode("en"), new LanguageCode("en")));
        Assert.True(WorklistBuilder.IsForeign(new LanguageCode("pl"), new LanguageCode("en")));
    }
}
