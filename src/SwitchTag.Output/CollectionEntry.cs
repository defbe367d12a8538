using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Output;

/// <summary>What the collection index keeps of one interview (small, so a long run holds little).</summary>
public sealed record CollectionEntry(string Interview, string Folder, string MainLanguage, Duration Duration, ImmutableArray<CollectionHeading> Headings)
{
    public static CollectionEntry From(InterviewIndex index, string folder) => new(
        index.Transcript.Name, folder, index.MainLanguage, index.Duration,
        index.Headings.Select(h => new CollectionHeading(h.Id, h.Label, h.Name, h.Place,
            h.Mentions.Select(i => index.Mentions[i].Time.Start).ToImmutableArray())).ToImmutableArray());
}

public sealed record CollectionHeading(string Id, NameLabel Label, string Name, PlaceLink? Place, ImmutableArray<Timecode> Times);
