using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.LanguageId.Interview;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Segmentation;

/// <summary>The language stage of <c>switchtag index</c>: the interview segmented as a whole, and its
/// main language chosen from who speaks what for how long.</summary>
public sealed partial class CodeSwitchSegmenter
{
    /// <summary><see cref="SegmentInterview(IReadOnlyList{string}, InterviewParameters?)"/> over the
    /// turns' texts; the main language is <paramref name="mainLanguage"/> when given, else
    /// <see cref="MainLanguageChooser"/>'s (narrators' talk, interviewer as tie-breaker). The
    /// profile reported is the languages that shaped decoding (share at least
    /// <see cref="InterviewParameters.MinShare"/>).</summary>
    public InterviewLanguageResult SegmentInterview(ImmutableArray<Turn> turns, LanguageCode? mainLanguage)
    {
        var segmentation = SegmentInterview(turns.Select(t => t.Text).ToArray());
        var profile = Fractions(segmentation.Profile.Spoken);
        if (mainLanguage is { } given)
            return new InterviewLanguageResult(profile, segmentation.Spans, given, MainLanguageDecision.Given);
        var choice = MainLanguageChooser.Choose(turns, segmentation.Spans);
        return new InterviewLanguageResult(profile, segmentation.Spans, choice.Language,
            new MainLanguageDecision(choice.BasisName, choice.Unit, Fractions(choice.NarratorShares), Fractions(choice.InterviewerShares), choice.Narrators));
    }

    private static ImmutableArray<LanguageFraction> Fractions(ImmutableArray<SpokenLanguage> shares) =>
        shares.Select(s => new LanguageFraction(s.Language, s.Share)).ToImmutableArray();
}
