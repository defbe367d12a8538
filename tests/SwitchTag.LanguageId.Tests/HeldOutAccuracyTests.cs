using SwitchTag.LanguageId.Training;

namespace SwitchTag.LanguageId.Tests;

/// <summary>Checks against the held-out split of ../shared/data/lid (Universal Dependencies
/// sentences, see lid/SOURCES.md), Universal NER train text and NerKor (Hungarian).</summary>
[Collection(nameof(ModelCollection))]
public sealed class HeldOutAccuracyTests(ModelFixture fixture)
{
    [Fact]
    public void HoldOutIsAFixedFunctionOfTheText()
    {
        // The split depends only on the line text, so evaluation never sees a training line.
        var line = fixture.Corpus.First(l => l.Split == Split.Evaluation);
        Assert.Equal(Split.Evaluation, HoldOut.Of(line.Text));
        var training = fixture.Corpus.Where(l => l.Split == Split.Training).Select(l => (l.Class, l.Text)).ToHashSet();
        Assert.DoesNotContain(fixture.Corpus.Where(l => l.Split == Split.Evaluation), l => training.Contains((l.Class, l.Text)));
    }

    [Fact]
    public void HeldOutSplitIsAboutTenPercentPerLanguage()
    {
        foreach (var g in fixture.Corpus.Where(l => l.Text.Length > 0).GroupBy(l => l.Class).Where(g => g.Count() >= 1000))
        {
            double share = g.Count(l => l.Split == Split.Evaluation) / (double)g.Count();
            Assert.InRange(share, 0.07, 0.13);
        }
    }

    [Fact]
    public void MeanHeldOutLineAccuracyIsHigh()
    {
        // Held-out lines of every class in the UD / UNER / NerKor corpora; scripts/eval-langid prints
        // the full table (measured mean about 0.97, so 0.95 leaves room for retraining noise).
        var perClass = fixture.Corpus.Where(l => l.Split == Split.Evaluation)
            .GroupBy(l => l.Class)
            .Select(g => g.Take(150).Count(l => fixture.Segmenter.Identify(l.Text).Language == l.Code) / (double)Math.Min(150, g.Count()))
            .ToList();
        Assert.True(perClass.Average() >= 0.95, $"mean held-out line accuracy {perClass.Average():F3}");
    }

    [Theory]
    [InlineData("it")]
    [InlineData("pl")]
    [InlineData("hu")]
    [InlineData("ru")]
    [InlineData("de")]
    public void DistinctLanguagesAreNearlyPerfect(string code)
    {
        // Held-out lines of lid/<code>.txt (Universal Dependencies) or NerKor for hu.
        var lines = fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == code).Take(200).ToList();
        double accuracy = lines.Count(l => fixture.Segmenter.Identify(l.Text).Language == code) / (double)lines.Count;
        Assert.True(accuracy >= 0.97, $"{code}: {accuracy:F3}");
    }

    [Fact]
    public void SerbianIsRecognisedInBothScripts()
    {
        // Held-out Serbian lines of lid/sr.txt and their standard Latin-to-Cyrillic transliteration.
        foreach (var cls in new[] { "sr-Latn", "sr-Cyrl" })
        {
            var lines = fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Class == cls).Take(100).ToList();
            int right = lines.Count(l => fixture.Segmenter.Identify(l.Text).Language == "sr");
            Assert.True(right >= lines.Count * 0.6, $"{cls}: {right}/{lines.Count}");
        }
    }
}
