using System.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Tests;

/// <summary>Bad input yields a defined result and never throws.</summary>
[Collection(nameof(ModelCollection))]
public sealed class BadInputTests(ModelFixture fixture)
{
    [Fact]
    public void EmptyTextIsUndeterminedWithNoSpans()
    {
        var guess = fixture.Segmenter.Identify("");
        Assert.Equal((LanguageCode.Undetermined, 0.0), (guess.Language, guess.Confidence));
        Assert.Empty(fixture.Segmenter.Segment("", new LanguageCode("en")));
    }

    [Theory]
    [InlineData("...!?;:—")]
    [InlineData("1944 - 1945, 10:30")]
    [InlineData("   \t ")]
    [InlineData("\u0301\u0308")]
    public void PunctuationDigitsOrMarksAloneAreOneUndeterminedSpan(string text)
    {
        Assert.Equal("und", fixture.Segmenter.Identify(text).Language);
        var spans = fixture.Segmenter.Segment(text, new LanguageCode("en"));
        Assert.Equal((0, text.Length, LanguageCode.Undetermined), (spans.Single().CharStart, spans.Single().CharEnd, spans.Single().Language));
    }

    [Fact]
    public void MixedScriptsGiveBothLanguages()
    {
        const string text = "We always said добрый вечер and sat down at the table";
        var languages = fixture.Segmenter.Segment(text, new LanguageCode("en")).Select(s => s.Language).ToHashSet();
        Assert.Contains(new LanguageCode("en"), languages);
        Assert.Contains(new LanguageCode("ru"), languages);
    }

    [Fact]
    public void OneMegabyteLineIsHandled()
    {
        var sb = new StringBuilder();
        while (sb.Length < 1 << 20) sb.Append("We walked along the river every evening after supper. ");
        var text = sb.ToString();
        Assert.Equal("en", fixture.Segmenter.Identify(text).Language);
        var spans = fixture.Segmenter.Segment(text, new LanguageCode("en"));
        Assert.Equal(text.Length, spans[^1].CharEnd);
    }

    [Theory]
    [InlineData("\uD800 hello there my friend")]
    [InlineData("good morning \uDC00\uDC00 to you all")]
    [InlineData("\uDBFF")]
    [InlineData("emoji \uD83D\uDE00 in the middle of an English sentence")]
    public void LoneSurrogatesAndEmojiDoNotThrow(string text)
    {
        var guess = fixture.Segmenter.Identify(text);
        Assert.InRange(guess.Confidence, 0, 1);
        var spans = fixture.Segmenter.Segment(text, new LanguageCode("en"));
        Assert.Equal(text.Length, spans[^1].CharEnd);
    }

    [Theory]
    [InlineData("Příliš žluťoučký kůň úpěl ďábelské ódy")]            // Czech pangram (from memory)
    [InlineData("Árvíztűrő tükörfúrógép")]                            // Hungarian test phrase (from memory)
    [InlineData("Ça m'a été très utile, à vrai dire")]
    [InlineData("한국어 문장입니다")]
    public void NfcAndNfdGiveTheSameAnswer(string text)
    {
        var nfc = text.Normalize(NormalizationForm.FormC);
        var nfd = text.Normalize(NormalizationForm.FormD);
        Assert.NotEqual(nfc.Length, nfd.Length);
        var a = fixture.Segmenter.Identify(nfc);
        var b = fixture.Segmenter.Identify(nfd);
        Assert.Equal(a.Language, b.Language);
        Assert.Equal(a.Confidence, b.Confidence, 3);
        Assert.Equal(fixture.Segmenter.Segment(nfc, new LanguageCode("en")).Select(s => s.Language), fixture.Segmenter.Segment(nfd, new LanguageCode("en")).Select(s => s.Language));
        Assert.Equal(nfd.Length, fixture.Segmenter.Segment(nfd, new LanguageCode("en"))[^1].CharEnd);
    }

    [Fact]
    public void CombiningMarksAfterPunctuationDoNotThrow()
    {
        const string text = ", \u0301\u0301 word\u20DD and \u200D\u200C more";
        Assert.InRange(fixture.Segmenter.Identify(text).Confidence, 0, 1);
        Assert.Equal(text.Length, fixture.Segmenter.Segment(text, new LanguageCode("xx"))[^1].CharEnd);
    }
}
