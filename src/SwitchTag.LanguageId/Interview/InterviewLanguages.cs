using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Interview;

/// <summary>One language of an interview and its share of the interview's words.</summary>
public sealed record SpokenLanguage(LanguageCode Language, double Share);

/// <summary>The languages an interview is spoken in, found by a first pass over all its turns:
/// every language whose share reaches <see cref="InterviewParameters.MinShare"/>, largest first.
/// <see cref="Shares"/> also lists smaller shares (down to 0.001) for reports.</summary>
public sealed record InterviewLanguages(ImmutableArray<SpokenLanguage> Spoken, ImmutableArray<SpokenLanguage> Shares)
{
    public bool Contains(LanguageCode language) => Spoken.Any(s => s.Language == language);
}

/// <summary>An interview's language profile, each turn's language and each turn's spans (offsets
/// into that turn's text), in turn order.</summary>
public sealed record InterviewSegmentation(
    InterviewLanguages Profile,
    ImmutableArray<LanguageGuess> TurnLanguages,
    ImmutableArray<ImmutableArray<LanguageSpan>> Spans);
