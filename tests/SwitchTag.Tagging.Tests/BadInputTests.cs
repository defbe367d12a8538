using System.Collections.Immutable;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Tagging;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Tagging.Tests;

/// <summary>Bad input gives a defined result, never an exception. Sentences are invented.</summary>
public class BadInputTests
{
    private static readonly NameTagger Tagger = NameTagger.Create(Models.Ner);

    private static ImmutableArray<Mention> Tag(string text) =>
        Tagger.Tag(new TurnId(0), text, [new LanguageSpan(new CharSpan(0, text.Length), new LanguageCode("und"), 0.5)]);

    private static void AssertWellFormed(string text, ImmutableArray<Mention> mentions)
    {
        int last = -1;
        foreach (var m in mentions)
        {
            Assert.InRange(m.CharStart, 0, text.Length);
            Assert.InRange(m.CharEnd, m.CharStart + 1, text.Length);
            Assert.Equal(text[m.CharStart..m.CharEnd], m.Text);
            Assert.True(m.CharStart >= last, "mentions overlap or are out of order");
            last = m.CharEnd;
        }
    }

    [Fact]
    public void EmptyAndWhitespaceGiveNoMentions()
    {
        Assert.Empty(Tagger.Tag(new TurnId(0), "", []));
        Assert.Empty(Tagger.Tag(new TurnId(0), " \t\r\n", []));
        Assert.Empty(Tagger.Tag(new TurnId(0), null!, default));
    }

    [Fact]
    public void HundredThousandTokenLineIsTagged()
    {
        var sb = new StringBuilder();
        for (int i = 0; i < 10_000; i++) sb.Append("Then Anna Novak went to Vienna and Graz again . ");
        var text = sb.ToString();
        Assert.Equal(100_000, WordTokenizer.Tokenize(text).Count);
        var mentions = Tag(text);
        AssertWellFormed(text, mentions);
        Assert.True(mentions.Length > 10_000);
    }

    [Fact]
    public void ControlCharactersAndMixedScripts()
    {
        const string text = "Ivan\u0000 Petrov\u0007 из Москвы met 王芳 in Zürich\u001B; שלום Tel Aviv \uFFFD\uD83D\uDE00 end";
        AssertWellFormed(text, Tag(text));
        AssertWellFormed("\uD800 lone surrogate \uDC00", Tag("\uD800 lone surrogate \uDC00"));
    }

    [Fact]
    public void AllCapitalsAndAllLowerCase()
    {
        const string text = "my grandmother was born in warsaw and worked for siemens in berlin";
        var lower = Tag(text);
        var upper = Tag(text.ToUpperInvariant());
        AssertWellFormed(text, lower);
        AssertWellFormed(text.ToUpperInvariant(), upper);
        // Trained with case augmentation: capitals still find some name.
        Assert.NotEmpty(upper);
    }
}
