using System.Collections.Immutable;

namespace SwitchTag.Core.Languages;

/// <summary>What the stages know about one language, read from its folder under Languages/:
/// <c>aliases.txt</c> (other ISO 639 codes), <c>stopwords.txt</c> (capitalised words that are rarely
/// names), <c>titles.txt</c> (words before a person's name), <c>particles.txt</c> (lower-case words
/// inside names), <c>stemming.txt</c> (case endings) and <c>patronymics.txt</c> (endings of a
/// patronymic, lower case, in every script the language is written in) and <c>organisations.txt</c>
/// (<c>heads:</c> words that make a capitalised run an organisation's name, <c>joins:</c> small
/// words that may stand inside one) and <c>demonym-endings.txt</c> (endings of words for the people of
/// a place: "Neapolitan", "Viennese"); for language identification of speech, <c>hesitations.txt</c>
/// (filled pauses and backchannels), <c>tags.txt</c> (transcriber notes written without brackets),
/// <c>loanwords.txt</c> (foreign words in everyday use) and <c>interviewer-labels.txt</c> (speaker
/// labels that mark the interviewer). The folder <c>mul</c> (ISO 639-2 "multiple languages") holds
/// what holds in every language. Every file is optional; README.md in Languages/ says more.</summary>
public sealed record LanguageProfile(
    LanguageCode Code,
    ImmutableArray<LanguageCode> Aliases,
    ImmutableArray<string> StopWords,
    ImmutableArray<string> Titles,
    ImmutableArray<string> NameParticles,
    StemmingData? Stemming,
    ImmutableArray<string> PatronymicEndings,
    ImmutableArray<string> OrganisationHeads,
    ImmutableArray<string> OrganisationJoins,
    ImmutableArray<string> DemonymEndings,
    ImmutableArray<string> Hesitations,
    ImmutableArray<string> TranscriberTags,
    ImmutableArray<string> Loanwords,
    ImmutableArray<string> InterviewerLabels);

/// <summary>A language's case endings as <c>stemming.txt</c> writes them (<c>key: values</c> lines):
/// <c>endings</c> a name may carry in running text, <c>nominative</c> endings of a dictionary form,
/// <c>replace</c> sound changes undone on a stem (<c>from&gt;to</c>), then named
/// <c>alternations</c>, a <c>normalise</c> step and an <c>allows</c> test, all three implemented in
/// SwitchTag.Lexicon's StemOperations; <c>fallback-rank</c> orders the rules tried for a text of
/// unknown language.</summary>
public sealed record StemmingData(
    ImmutableArray<string> Endings,
    ImmutableArray<string> Nominative,
    ImmutableArray<(string From, string To)> Replacements,
    ImmutableArray<string> Alternations,
    string? Normalise,
    string? Allows,
    int FallbackRank);
