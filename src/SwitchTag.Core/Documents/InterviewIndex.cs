using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;

namespace SwitchTag.Core.Documents;

/// <summary>A gazetteer place a heading is linked to. Countries come from an ISO 3166 list rather
/// than GeoNames and carry a non-positive id (minus the ISO numeric code) that is no GeoNames id. A
/// first-level region (<paramref name="Region"/>, its ISO 3166-2 code) has id 0 and no coordinates:
/// no list with region centres could ship (models/namelists.md).</summary>
public sealed record PlaceLink(long GeonameId, string Name, double? Latitude, double? Longitude, string Country, long Population, string? Region = null)
{
    public bool HasGeonameId => GeonameId > 0;

    public bool HasCoordinates => Latitude is not null && Longitude is not null;

    /// <summary>One key per distinct place: "g" + the id, or "r-" + the region code in lower case.</summary>
    public string Key => Region is null ? "g" + GeonameId.ToString(System.Globalization.CultureInfo.InvariantCulture) : "r-" + Region.ToLowerInvariant();
}

/// <summary>One index entry: every mention of one person, place or organisation.</summary>
/// <param name="Mentions">Mentions of <see cref="InterviewIndex.Mentions"/>, in time order.</param>
/// <param name="Alternatives">Other gazetteer places the name could mean, kept for the reviewer.</param>
public sealed record Heading(
    HeadingId Id,
    NameLabel Label,
    string Name,
    ImmutableArray<string> Variants,
    PlaceLink? Place,
    ImmutableArray<PlaceLink> Alternatives,
    ImmutableArray<MentionId> Mentions,
    ImmutableArray<string> Speakers,
    double Confidence,
    MentionSource Source)
{
    /// <summary>Ids of person headings that are probably the same person (a cross-language equivalent
    /// or a spelling fold without other evidence), shown to the reviewer, never merged silently.</summary>
    public ImmutableArray<HeadingId> PossiblySame { get; init; } = [];

    /// <summary>The place is not the name's own gazetteer entry but the town the talk was at when the
    /// name was said (a district, street or village the gazetteer lacks): a guess for the reviewer.</summary>
    public bool PlaceFromContext { get; init; }
}

/// <summary>A mention placed in time and filed under a heading (null while under review). A value, not
/// an object: an interview holds one per mention (571k for a 200k-cue turn) to its last output.</summary>
public readonly record struct IndexedMention(Mention Mention, TimeRange Time, HeadingId? HeadingId);

/// <summary>A stretch outside the interview's main language, for the translators. <see cref="Check"/>:
/// its language is too uncertain to claim, so a person should check the language first.</summary>
public sealed record WorklistItem(
    TimeRange Time,
    string? Speaker,
    LanguageCode Language,
    double Confidence,
    string Text,
    TurnId Turn,
    CharSpan Chars,
    int Words,
    bool Check = false)
{
    public int CharStart => Chars.Start;
    public int CharEnd => Chars.End;
}

/// <summary>How much of the interview is in one language: seconds of recording and words.</summary>
public sealed record LanguageShare(LanguageCode Language, double Seconds, int Words);

/// <summary>A language span outside the interview's main language (<c>und</c> excluded), offsets into
/// its turn's text: what the annotated transcript marks.</summary>
public sealed record ForeignSpan(TurnId Turn, CharSpan Chars, LanguageCode Language)
{
    public int CharStart => Chars.Start;
    public int CharEnd => Chars.End;
}

/// <summary>A mention held back from the index for a person to decide.</summary>
public sealed record ReviewItem(MentionId Mention, string Reason);

/// <summary>Everything known about one interview after the whole pipeline has run.</summary>
/// <param name="Languages">Seconds and words per language, most seconds first.</param>
/// <param name="ForeignSpans">The spans outside the main language, in turn and text order.</param>
/// <param name="Decisions">Every reviewer decision meant for this interview and how often it took effect.</param>
/// <param name="Media">Where the recording is (URL or relative path), so a report can open it at a time; null when not given.</param>
public sealed record InterviewIndex(
    Transcript Transcript,
    LanguageCode MainLanguage,
    Duration Duration,
    ImmutableArray<Turn> Turns,
    ImmutableArray<ImmutableArray<Timed<LanguageSpan>>> Spans,
    ImmutableArray<LanguageShare> Languages,
    ImmutableArray<ForeignSpan> ForeignSpans,
    ImmutableArray<IndexedMention> Mentions,
    ImmutableArray<Heading> Headings,
    ImmutableArray<WorklistItem> Worklist,
    ImmutableArray<ReviewItem> Review,
    ImmutableArray<Diagnostic> Diagnostics,
    ImmutableArray<DecisionOutcome> Decisions,
    string? Media = null)
{
    /// <summary>The languages the interview is spoken in with their shares of its words, largest
    /// first; empty when the language stage finds no profile.</summary>
    public ImmutableArray<LanguageFraction> LanguageProfile { get; init; } = [];

    /// <summary>How <see cref="MainLanguage"/> was chosen; null when not recorded.</summary>
    public MainLanguageDecision? MainLanguageDecision { get; init; }

    public Turn TurnAt(TurnId turn) => Turns[turn.Index];

    public IndexedMention MentionAt(MentionId mention) => Mentions[mention.Index];
}
