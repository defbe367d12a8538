using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;
using SwitchTag.Output.Report;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output;

/// <summary>What the collection pages keep of one interview: its headings, and for the review page its
/// mentions (each with its turn's text, to cut its sentence from) and the decisions already applied to it.</summary>
public sealed record CollectionEntry(string Interview, string Folder, LanguageCode MainLanguage, Duration Duration, ImmutableArray<CollectionHeading> Headings,
    ImmutableArray<CollectionMention> Mentions = default, ImmutableArray<Decision> Decisions = default)
{
    public static CollectionEntry From(InterviewIndex index, string folder)
    {
        var reasons = index.Review.ToDictionary(r => r.Mention, r => r.Reason);
        return new(
            index.Transcript.Id, folder, index.MainLanguage, index.Duration,
            index.Headings.Select(h => new CollectionHeading(h.Id, h.Label, h.Name, h.Place,
                h.Mentions.Select(m => index.MentionAt(m).Time.Start).ToImmutableArray(), h.Variants)).ToImmutableArray(),
            index.Mentions.Select((m, i) => new CollectionMention(m.Time.Start, m.Mention, index.TurnAt(m.Mention.Turn).Speaker, m.HeadingId,
                reasons.GetValueOrDefault(new MentionId(i)), index.TurnAt(m.Mention.Turn).Text)).ToImmutableArray(),
            index.Decisions.Select(o => o.Decision).ToImmutableArray());
    }
}

public sealed record CollectionHeading(HeadingId Id, NameLabel Label, string Name, PlaceLink? Place, ImmutableArray<Timecode> Times,
    ImmutableArray<string> Variants = default);

/// <summary>One mention as the review page shows it: under a heading, or held for review with the reason.
/// Its sentence is cut from the turn's text when the page is written (<see cref="Context"/>): kept as two
/// strings per mention, the sentences of one 200k-cue turn took some 300 MB until the run's end.</summary>
public sealed record CollectionMention(Timecode Time, Mention Mention, string? Speaker, HeadingId? HeadingId, string? ReviewReason, string TurnText)
{
    public string Text => Mention.Text;

    public NameLabel Label => Mention.Label;

    /// <summary>The sentence around the mention (<see cref="MentionContext"/>).</summary>
    public MentionContext Context => MentionContext.Of(TurnText, Mention);
}
