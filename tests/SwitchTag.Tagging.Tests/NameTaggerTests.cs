using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Lexicon;
using SwitchTag.Tagging;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Tagging.Tests;

/// <summary>Authority lists win over the model and the gazetteer. The names and sentences are
/// invented; what they check is the rule of the issue, not a score.</summary>
public class NameTaggerTests
{
    private static AuthorityList Authority(string csv) => AuthorityList.Parse(csv, "test.csv").List;

    private static ImmutableArray<LanguageSpan> English(string text) => [new LanguageSpan(new CharSpan(0, text.Length), new LanguageCode("en"), 1.0)];

    [Fact]
    public void ListedPersonIsNeverAPlaceOrOrganisation()
    {
        // "Washington" and "Georgia" are places to any model that saw US news; here both are people.
        var list = Authority("label,name,variants\nPER,Washington,\nPER,Georgia Brown,Georgia\n");
        var tagger = NameTagger.Create(Models.Ner, list);
        const string text = "Washington said that Georgia moved to Washington with the Red Cross.";
        var mentions = tagger.Tag(new TurnId(0), text, English(text));
        var listed = mentions.Where(m => m.Text is "Washington" or "Georgia").ToList();
        Assert.Equal(3, listed.Count);
        Assert.All(listed, m => { Assert.Equal(NameLabel.PER, m.Label); Assert.Equal(MentionSource.Authority, m.Source); });
        Assert.DoesNotContain(mentions, m => m.Source == MentionSource.Model && listed.Any(a => a.CharStart < m.CharEnd && m.CharStart < a.CharEnd));
    }

    [Fact]
    public void ListedPlaceIsNeverAPerson()
    {
        var list = Authority("label,name,variants\nLOC,Paris,\nORG,Ford,\n");
        var tagger = NameTagger.Create(Models.Ner, list);
        const string text = "Paris Hilton told Henry Ford about Paris.";
        var mentions = tagger.Tag(new TurnId(3), text, English(text));
        Assert.All(mentions.Where(m => text[m.CharStart..m.CharEnd].Contains("Paris")), m => Assert.Equal(NameLabel.LOC, m.Label));
        Assert.All(mentions.Where(m => text[m.CharStart..m.CharEnd].Contains("Ford")), m => Assert.Equal(NameLabel.ORG, m.Label));
        // The model may not widen a protected match: no mention covers "Paris Hilton" or "Henry Ford".
        Assert.DoesNotContain(mentions, m => m.Text is "Paris Hilton" or "Henry Ford");
        Assert.All(mentions, m => Assert.Equal(new TurnId(3), m.Turn));
    }

    [Fact]
    public void RulesOnlyUsesOnlyListsAndGazetteer()
    {
        var list = Authority("label,name,variants\nPER,Maria Kowalska,\n");
        var tagger = NameTagger.Create(Models.Ner, list, mode: TaggingMode.RulesOnly);
        const string text = "Maria Kowalska met John Smith in Chicago.";
        var mentions = tagger.Tag(new TurnId(0), text, English(text));
        var only = Assert.Single(mentions);
        Assert.Equal((0, 14, MentionSource.Authority), (only.CharStart, only.CharEnd, only.Source));
    }

    [Fact]
    public void ModelMentionsCarryOffsetsConfidenceAndSpanLanguage()
    {
        var tagger = NameTagger.Create(Models.Ner);
        const string text = "My father worked in Chicago, and then jsme se vrátili do Prahy.";
        ImmutableArray<LanguageSpan> spans = [new(new CharSpan(0, 36), new LanguageCode("en"), 0.9), new(new CharSpan(36, text.Length), new LanguageCode("cs"), 0.8)];
        var mentions = tagger.Tag(new TurnId(0), text, spans);
        Assert.NotEmpty(mentions);
        foreach (var m in mentions)
        {
            Assert.Equal(text[m.CharStart..m.CharEnd], m.Text);
            Assert.InRange(m.Confidence, 0, 1);
            Assert.Equal(m.CharStart < 36 ? "en" : "cs", m.Language);
        }
    }

    [Theory]
    // Cyrillic and Hebrew script are trained scripts now (TrainedScripts; models/ner.md: WikiNER and
    // FactRuEval Russian, EHRI-NER Yiddish), so the model's mentions there are kept. Invented sentences.
    [InlineData("Мы жили в Москве у Ивана Петровича до войны.", "ru", "Москве")]
    [InlineData("מיר זײַנען געקומען קיין ווילנע מיט משה ראָזענבערג.", "yi", "ווילנע")]
    public void ModelMentionsInCyrillicAndHebrewAreKept(string text, string language, string name)
    {
        var mentions = NameTagger.Create(Models.Ner).Tag(new TurnId(0), text, [new LanguageSpan(new CharSpan(0, text.Length), new LanguageCode(language), 1.0)]);
        Assert.Contains(mentions, m => m.Source == MentionSource.Model && m.Text.Contains(name));
    }
}
