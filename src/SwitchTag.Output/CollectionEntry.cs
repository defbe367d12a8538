using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;
using SwitchTag.Output.Report;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output;

/// <summary>What the collection pages keep of one interview: its headings, and for the review page its
/// mentions with their sentences and the decisions already applied to it (small beside the index).</summary>
public sealed record CollectionEntry(string Interview, string Folder, LanguageCode MainLanguage, Duration Duration, ImmutableArray<CollectionHeading> Headings,
    ImmutableArray<CollectionMention> Mentions = default, ImmutableArray<Decision> Decisions = default)
{
    public static CollectionEntry From(InterviewIndex index, string folder)
    {
        var reasons = index.Review.ToDictionary(r => r.Mention, r => r.Reason);
        return new(
            index.Transcript.Id, folder, index.MainLanguage, index.Duration,
            index.Headings.Select(h => new CollectionHeading(h.Id, h.Label, h.Name, h.Place,
                h.Mentions.Select(i => index.Mentions[i].Time.Start).ToImmutableArray(), h.Variants)).ToImmutableArray(),
            index.Mentions.Select((m, i) =>
            {
                var c = MentionContext.Of(index, m);
                return new CollectionMention(m.Time.Start, m.Mention.Text, m.Mention.Label, index.Turns[m.Mention.Turn].Speaker, m.HeadingId,
                    reasons.GetValueOrDefault(i), c.Before, c.After);
            }).ToImmutableArray(),
            index.Decisions.Select(o => o.Decision).ToImmutableArray());
    }
}

public sealed record CollectionHeading(string Id, NameLabel Label, string Name, PlaceLink? Place, ImmutableArray<Timecode> Times,
    ImmutableArray<string> Variants = default);

/// <summary>One mention as the review page shows it: under a heading, or held for review with the reason.</summary>
public sealed record CollectionMention(Timecode Time, string Text, NameLabel Label, string? Speaker, string? HeadingId, string? ReviewReason,
    string Before, string After);
