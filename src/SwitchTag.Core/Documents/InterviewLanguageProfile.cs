using System.Collections.Immutable;
using SwitchTag.Core.Languages;

namespace SwitchTag.Core.Documents;

/// <summary>One language and its share (0..1) of something: the interview's words, or a side's talk.</summary>
public sealed record LanguageFraction(LanguageCode Language, double Share);

/// <summary>How an interview's main language was chosen, for index.json.</summary>
/// <param name="Basis">"given" (--main), "narrator-talk", "interviewer-tie-break", "all-talk",
/// "largest-share" (a language stage without speaker-aware choice), or "none"</param>
/// <param name="Unit">what the shares measure: "seconds" or "characters"; null when the language was given</param>
/// <param name="NarratorShares">share of the narrators' talk per language, largest first</param>
/// <param name="InterviewerShares">share of the interviewers' talk per language, largest first</param>
/// <param name="Narrators">speaker labels counted as narrators</param>
public sealed record MainLanguageDecision(
    string Basis,
    string? Unit,
    ImmutableArray<LanguageFraction> NarratorShares,
    ImmutableArray<LanguageFraction> InterviewerShares,
    ImmutableArray<string> Narrators)
{
    public static readonly MainLanguageDecision Given = new("given", null, [], [], []);
}

/// <summary>The language stage's result for a whole interview: the languages it is spoken in (its
/// profile, largest share first), each turn's spans, the main language and how it was chosen.</summary>
public sealed record InterviewLanguageResult(
    ImmutableArray<LanguageFraction> Profile,
    ImmutableArray<ImmutableArray<LanguageSpan>> Spans,
    LanguageCode MainLanguage,
    MainLanguageDecision MainBasis);
