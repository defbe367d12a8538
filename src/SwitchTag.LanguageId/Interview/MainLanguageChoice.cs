using System.Collections.Immutable;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Interview;

/// <summary>What decided an interview's main language.</summary>
public enum MainLanguageBasis
{
    /// <summary>The narrators' talk time: one language clearly ahead.</summary>
    NarratorTalk,
    /// <summary>The narrators' two leading languages were within the tie margin; the interviewer's
    /// talk time between those two decided.</summary>
    InterviewerTieBreak,
    /// <summary>No speaker could be told apart as narrator, so all talk counted.</summary>
    AllTalk,
    /// <summary>No language evidence at all: <c>und</c>.</summary>
    None,
}

/// <summary>The main language, how it was chosen, and the talk it was chosen from.</summary>
/// <param name="Language">ISO 639 code or <c>und</c></param>
/// <param name="Basis">what decided</param>
/// <param name="Unit">"seconds" when every turn with evidence has a duration, else "characters"</param>
/// <param name="NarratorShares">share of the narrators' talk per language, largest first</param>
/// <param name="InterviewerShares">share of the interviewers' talk per language, largest first</param>
/// <param name="Narrators">speaker labels counted as narrators (empty when speakers are unknown)</param>
public sealed record MainLanguageChoice(
    LanguageCode Language,
    MainLanguageBasis Basis,
    string Unit,
    ImmutableArray<SpokenLanguage> NarratorShares,
    ImmutableArray<SpokenLanguage> InterviewerShares,
    ImmutableArray<string> Narrators)
{
    /// <summary>Stable lower-case name of <see cref="Basis"/> for JSON ("narrator-talk",
    /// "interviewer-tie-break", "all-talk", "none").</summary>
    public string BasisName => Basis switch
    {
        MainLanguageBasis.NarratorTalk => "narrator-talk",
        MainLanguageBasis.InterviewerTieBreak => "interviewer-tie-break",
        MainLanguageBasis.AllTalk => "all-talk",
        _ => "none",
    };
}
