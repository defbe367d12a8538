using SwitchTag.LanguageId.Text;

namespace SwitchTag.LanguageId.Tests;

/// <summary>Fillers as per-language data. The usages are general knowledge (from memory): English
/// writes a filled pause "er"/"erm", where German "er" is the pronoun "he"; "um", "mhm" are written
/// fillers in many languages.</summary>
[Collection(nameof(ModelCollection))]
public sealed class NeutralWordsTests(ModelFixture fixture)
{
    [Fact]
    public void TheShippedListsMarkErAsAnEnglishFillerOnly()
    {
        var words = NeutralWords.Default;
        Assert.Equal(["en"], words.NeutralIn("er").ToArray());
        Assert.False(words.IsNeutralEverywhere("er"));
        Assert.True(words.IsNeutralEverywhere("um"));
        Assert.True(words.IsNeutralEverywhere("MHM"));
    }

    [Fact]
    public void GermanErIsAWordAndEnglishErIsAPause()
    {
        const string german = "Mein Vater arbeitete in der Fabrik. Er war immer sehr müde.";
        var spans = fixture.Segmenter.SegmentInterview([german]).Spans[0];
        Assert.All(spans, s => Assert.Equal("de", s.Language));
        Assert.Equal("de", fixture.Segmenter.SegmentInterview(["Er war immer sehr müde."]).TurnLanguages[0].Language);

        const string english = "I was er born in a small village er near the river";
        Assert.All(fixture.Segmenter.SegmentInterview([english]).Spans[0], s => Assert.Equal("en", s.Language));
    }
}
