using SwitchTag.LanguageId.Training;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Tests;

/// <summary>The interview profile, checked on "interviews" assembled from held-out Universal
/// Dependencies sentences of ../shared/data/lid (never trained on; see HoldOut).</summary>
[Collection(nameof(ModelCollection))]
public sealed class InterviewProfileTests(ModelFixture fixture)
{
    private List<string> HeldOut(string code, int count) =>
        fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == code).Take(count).Select(l => l.Text).ToList();

    private static List<string> Interleave(List<string> a, List<string> b) =>
        a.Zip(b).SelectMany(p => new[] { p.First, p.Second }).ToList();

    [Fact]
    public void FindsTheTwoLanguagesOfABilingualInterviewWithTheirShares()
    {
        var turns = Interleave(HeldOut("es", 60), HeldOut("en", 60));
        var result = fixture.Segmenter.SegmentInterview(turns);
        Assert.Equal(["en", "es"], result.Profile.Spoken.Select(s => s.Language.Code).Order());
        Assert.All(result.Profile.Spoken, s => Assert.InRange(s.Share, 0.3, 0.7));
    }

    [Fact]
    public void ShortTurnsAreDecidedWithinTheInterviewsLanguages()
    {
        // Two-word turns of held-out Spanish lines alone often come out as gl, pt or ca; inside a
        // Spanish-English interview they must be es.
        var spanish = HeldOut("es", 120);
        var shortTurns = spanish.Skip(60).Select(l => string.Join(' ', l.Split(' ').Take(2))).Where(t => t.Any(char.IsLetter)).ToList();
        var turns = Interleave(spanish.Take(60).ToList(), HeldOut("en", 60)).Concat(shortTurns).ToList();
        var result = fixture.Segmenter.SegmentInterview(turns);
        var guesses = result.TurnLanguages.Skip(120).Select(g => g.Language).ToList();
        int alone = shortTurns.Count(t => fixture.Segmenter.Identify(t).Language == "es");
        int within = guesses.Count(g => g == "es");
        Assert.True(within >= 0.9 * shortTurns.Count, $"{within} of {shortTurns.Count} short Spanish turns es within the interview");
        Assert.True(within > alone, $"within {within}, alone {alone}");
    }

    [Fact]
    public void AThirdLanguageWithEnoughEvidenceStillComesThrough()
    {
        var turns = Interleave(HeldOut("es", 60), HeldOut("en", 60));
        var polish = HeldOut("pl", 40).Where(l => l.Split(' ').Length >= 8).First();
        turns.Insert(50, polish);
        var result = fixture.Segmenter.SegmentInterview(turns);
        Assert.DoesNotContain(result.Profile.Spoken, s => s.Language == "pl");
        Assert.Equal("pl", result.TurnLanguages[50].Language);
        Assert.Contains(result.Spans[50], s => s.Language == "pl" && s.CharEnd - s.CharStart > polish.Length / 2);
    }

    [Fact]
    public void SpansCoverEveryTurnAndEmptyTurnsHaveNone()
    {
        List<string> turns = ["We lived in a small house.", "", "[laughs]", "Vivíamos en una casa pequeña."];
        var result = fixture.Segmenter.SegmentInterview(turns);
        Assert.Equal(turns.Count, result.Spans.Length);
        Assert.Empty(result.Spans[1]);
        Assert.Equal("und", result.TurnLanguages[2].Language);
        for (int t = 0; t < turns.Count; t++)
        {
            if (turns[t].Length == 0) continue;
            Assert.Equal(0, result.Spans[t][0].CharStart);
            Assert.Equal(turns[t].Length, result.Spans[t][^1].CharEnd);
        }
    }
}

/// <summary>What must not switch inside an interview of two languages: a loanword in common use
/// (Profiles/en/loanwords.txt: "café", general knowledge) and a lone foreign name. The surrounding
/// interview is held-out Universal Dependencies text (../shared/data/lid); the test sentences are
/// invented.</summary>
[Collection(nameof(ModelCollection))]
public sealed class NoSwitchTests(ModelFixture fixture)
{
    private List<string> Interview(string other, params string[] extra)
    {
        var a = fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == "en").Take(40).Select(l => l.Text);
        var b = fixture.Corpus.Where(l => l.Split == Split.Evaluation && l.Code == other).Take(40).Select(l => l.Text);
        return a.Zip(b).SelectMany(p => new[] { p.First, p.Second }).Concat(extra).ToList();
    }

    [Theory]
    [InlineData("de", "Sometimes we sat in a café and you heard German at the next table.")]
    [InlineData("pl", "This is an interview with Irena Kowalczyk, recorded at her home.")]
    [InlineData("es", "My father opened a small café on the corner, near the church.")]
    public void StaysInTheSentencesLanguage(string other, string sentence)
    {
        var result = fixture.Segmenter.SegmentInterview(Interview(other, sentence));
        Assert.Contains(result.Profile.Spoken, s => s.Language == other);
        Assert.All(result.Spans[^1], s => Assert.Equal("en", s.Language));
    }

    [Fact]
    public void AStrongOneWordInsertionIsFound()
    {
        // "pero" (Spanish "but") opening an English sentence in a Spanish-English interview, a
        // common pattern in bilingual talk (from memory).
        const string sentence = "pero the first time I went there I did not understand anything.";
        var spans = fixture.Segmenter.SegmentInterview(Interview("es", sentence)).Spans[^1];
        Assert.Equal("es", spans[0].Language);
        Assert.Equal("pero ".Length, spans[0].CharEnd);
        Assert.Equal("en", spans[^1].Language);
    }
}
