using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Tests;

/// <summary>Switch segmentation inside a turn. The sentences are invented for these tests; the
/// language of each foreign phrase is ordinary vocabulary (from memory).</summary>
[Collection(nameof(ModelCollection))]
public sealed class SegmentationTests(ModelFixture fixture)
{
    private ImmutableArray<LanguageSpan> Segment(string text, INameLexicon? names = null) =>
        (names is null ? fixture.Segmenter : new Segmentation.CodeSwitchSegmenter(fixture.Segmenter.Model, names)).Segment(text, new LanguageCode("en"));

    private static string LanguageOf(ImmutableArray<LanguageSpan> spans, string text, string word)
    {
        int at = text.IndexOf(word, StringComparison.Ordinal);
        return spans.Single(s => at >= s.CharStart && at < s.CharEnd).Language;
    }

    [Theory]
    [InlineData("And then my grandmother would always say nie ma tego złego and we laughed about it", "nie ma tego złego", "pl")]
    [InlineData("We lived near the station, muy cerca de la estación, for many years", "muy cerca de la estación", "es")]
    [InlineData("My father worked at the factory und er war immer sehr müde", "und er war immer sehr müde", "de")]
    [InlineData("She told me that она всегда была дома and that was all", "она всегда была дома", "ru")]
    public void FindsASwitchOfSeveralWords(string text, string foreign, string code)
    {
        var spans = Segment(text);
        Assert.Equal(code, LanguageOf(spans, text, foreign.Split(' ')[0]));
        Assert.Equal(code, LanguageOf(spans, text, foreign.Split(' ')[^1]));
        Assert.Equal("en", LanguageOf(spans, text, text.Split(' ')[0]));
    }

    [Fact]
    public void FindsATwoWordSwitch()
    {
        const string text = "When we arrived my mother just said dzięki Bogu and started to cry";
        var spans = Segment(text);
        Assert.Equal("pl", LanguageOf(spans, text, "dzięki"));
        Assert.Equal("en", LanguageOf(spans, text, "started"));
    }

    [Theory]
    [InlineData("Yes ich weiß nicht mehr, wo er gewohnt hat", "Yes", "weiß", "de")]
    [InlineData("Anyway nie pamiętam już, gdzie on mieszkał", "Anyway", "pamiętam", "pl")]
    [InlineData("Well sabe usted, mi padre nunca hablaba de eso", "Well", "padre", "es")]
    public void OneWordOfTheMainLanguageOpeningATurnStaysItsOwn(string text, string opening, string foreign, string code)
    {
        // A turn that opens with one English word and goes on in another language switches after
        // that word: the word is not merged into the foreign run as if it were a loanword there.
        var spans = Segment(text);
        Assert.Equal("en", LanguageOf(spans, text, opening));
        Assert.Equal(code, LanguageOf(spans, text, foreign));
    }

    [Theory]
    [InlineData("We moved to Szczebrzeszyn when I was seven years old")]
    [InlineData("My uncle Wojciech Przybylski worked in the mine for twenty years")]
    [InlineData("After the war we took the train through Székesfehérvár and then further west")]
    public void DoesNotSwitchOnANameInsideAnEnglishSentence(string text)
    {
        var spans = Segment(text);
        Assert.Single(spans);
        Assert.Equal("en", spans[0].Language);
    }

    [Theory]
    [InlineData("I was born in 1950 in Szczebrzeszyn")]
    [InlineData("Then we went to see Grzegorz Brzęczyszczykiewicz in Łódź")]
    public void IdentifyIgnoresNamesInsideASentence(string text) =>
        Assert.Equal("en", fixture.Segmenter.Identify(text).Language);

    [Fact]
    public void KnownNamesFromTheLexiconAreNeutralEvenSentenceInitially()
    {
        const string text = "Częstochowa was where we lived before the war started";
        var spans = Segment(text, new FixedNames("Częstochowa"));
        Assert.Single(spans);
        Assert.Equal("en", spans[0].Language);
    }

    [Theory]
    [InlineData("I was uh [laughs] born in um 1950 in a small house [inaudible] near the river")]
    [InlineData("I w- I went to school there, mhm, er, hmm, for about six years [pause] and then we left")]
    [InlineData("[crosstalk] Yes, yes, we had uh 3 children, 2 boys and 1 girl.")]
    public void HesitationsTagsNumbersAndFalseStartsAreNeutral(string text)
    {
        var spans = Segment(text);
        Assert.Single(spans);
        Assert.Equal("en", spans[0].Language);
    }

    [Fact]
    public void SpansCoverTheTextWithoutGaps()
    {
        const string text = "  And then she said: «nie ma tego złego, co by na dobre nie wyszło» — and left.  ";
        var spans = Segment(text);
        Assert.Equal(0, spans[0].CharStart);
        Assert.Equal(text.Length, spans[^1].CharEnd);
        for (int i = 1; i < spans.Length; i++) Assert.Equal(spans[i - 1].CharEnd, spans[i].CharStart);
        Assert.All(spans, s => Assert.InRange(s.Confidence, 0, 1));
    }

    [Fact]
    public void LoneNameOrHesitationIsUndetermined()
    {
        Assert.Equal("und", fixture.Segmenter.Identify("um").Language);
        Assert.Equal("und", fixture.Segmenter.Identify("[laughs]").Language);
        var withNames = new Segmentation.CodeSwitchSegmenter(fixture.Segmenter.Model, new FixedNames("Warszawa"));
        Assert.Equal("und", withNames.Identify("Warszawa").Language);
    }

    private sealed class FixedNames(params string[] names) : INameLexicon
    {
        public bool IsKnownName(ReadOnlySpan<char> word)
        {
            foreach (var n in names) if (word.SequenceEqual(n)) return true;
            return false;
        }
    }
}
