using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.LanguageId.Interview;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Tests;

/// <summary>The main-language rule of issue 14: the narrators' talk time per language decides,
/// the interviewer's talk breaks a tie. Turns are invented; speaker labels follow the usual
/// transcript conventions ("Interviewer", "Q", written from memory).</summary>
public sealed class MainLanguageChooserTests
{
    private static (Turn, ImmutableArray<LanguageSpan>) T(string? speaker, int seconds, params (string Language, int Chars)[] parts)
    {
        var spans = ImmutableArray.CreateBuilder<LanguageSpan>();
        int at = 0;
        foreach (var (language, chars) in parts)
        {
            spans.Add(new LanguageSpan(new CharSpan(at, at + chars), new LanguageCode(language), 0.9));
            at += chars;
        }
        var turn = new Turn(new TurnId(0), speaker, speaker, new TimeRange(Timecode.Zero, new Timecode(seconds * 1000L)), new string('x', at), []);
        return (turn, spans.ToImmutable());
    }

    private static MainLanguageChoice Choose(params (Turn, ImmutableArray<LanguageSpan>)[] turns) =>
        MainLanguageChooser.Choose(turns.Select(t => t.Item1).ToList(), turns.Select(t => t.Item2).ToList());

    [Fact]
    public void NarratorTalkTimeDecidesNotTheInterviewersLongQuestions()
    {
        var choice = Choose(
            T("Interviewer", 300, ("en", 100)),
            T("Anna", 200, ("pl", 100)),
            T("Anna", 60, ("en", 100)));
        Assert.Equal("pl", choice.Language);
        Assert.Equal(MainLanguageBasis.NarratorTalk, choice.Basis);
        Assert.Equal("seconds", choice.Unit);
        Assert.Equal<string>(["Anna"], choice.Narrators);
        Assert.Equal(0.7692, choice.NarratorShares[0].Share, 3);
    }

    [Fact]
    public void TheInterviewerBreaksANearTie()
    {
        var choice = Choose(
            T("Q", 100, ("es", 10)),
            T("Rosa", 100, ("en", 10)),
            T("Rosa", 95, ("es", 10)));
        Assert.Equal("es", choice.Language);
        Assert.Equal(MainLanguageBasis.InterviewerTieBreak, choice.Basis);
        Assert.Equal("interviewer-tie-break", choice.BasisName);
    }

    [Fact]
    public void SpansSplitATurnsTimeAndUndCountsForNothing()
    {
        var choice = Choose(
            T("Interviewer", 10, ("de", 10)),
            T("Kurt", 100, ("de", 30), ("und", 100), ("tr", 70)));
        Assert.Equal("tr", choice.Language);
        Assert.Equal(0.3, choice.NarratorShares.Single(s => s.Language == "de").Share, 3);
    }

    [Fact]
    public void WithoutAnInterviewerLabelTheSpeakerWhoTalksMostNarrates()
    {
        var choice = Choose(
            T("Speaker 1", 30, ("en", 10)),
            T("Speaker 2", 300, ("cy", 10)));
        Assert.Equal("cy", choice.Language);
        Assert.Equal<string>(["Speaker 2"], choice.Narrators);
    }

    [Fact]
    public void WithoutTimesCharactersCountAndWithoutSpeakersAllTalkCounts()
    {
        var choice = Choose(T(null, 0, ("fr", 40)), T(null, 0, ("en", 60)));
        Assert.Equal("en", choice.Language);
        Assert.Equal(MainLanguageBasis.AllTalk, choice.Basis);
        Assert.Equal("characters", choice.Unit);
    }

    [Fact]
    public void NoEvidenceIsUnd()
    {
        var choice = Choose(T("Anna", 10, ("und", 5)));
        Assert.Equal("und", choice.Language);
        Assert.Equal(MainLanguageBasis.None, choice.Basis);
    }

    [Theory]
    [InlineData("Interviewer", true)]
    [InlineData("INTERVIEWER 2:", true)]
    [InlineData("Entrevistadora", true)]
    [InlineData("Q", true)]
    [InlineData("Anna", false)]
    [InlineData(null, false)]
    public void InterviewerLabelsComeFromTheProfileLists(string? label, bool expected) =>
        Assert.Equal(expected, InterviewerLabels.IsInterviewer(label));
}
