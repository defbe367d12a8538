using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing.Decisions;

/// <summary>A heading while heading decisions change it; <see cref="Members"/> are ids of the mentions
/// as grouped, before rejected ones are dropped.</summary>
internal sealed class HeadingDraft(Heading h)
{
    public HeadingId Id { get; set; } = h.Id;
    public NameLabel Label { get; set; } = h.Label;
    public string Name { get; set; } = h.Name;
    public List<string> Variants { get; } = [.. h.Variants];
    public PlaceLink? Place { get; private set; } = h.Place;
    public bool PlaceFromContext { get; private set; } = h.PlaceFromContext;
    public List<PlaceLink> Alternatives { get; } = [.. h.Alternatives];
    public List<MentionId> Members { get; private set; } = [.. h.Mentions];
    public List<string> Speakers { get; } = [.. h.Speakers];
    public double Confidence { get; private set; } = h.Confidence;
    public MentionSource Source { get; } = h.Source;

    /// <summary>The drafts this one is possibly the same person as (<see cref="Heading.PossiblySame"/>),
    /// held as drafts so renames and merges by decisions carry over.</summary>
    public List<HeadingDraft> PossiblySame { get; } = [];

    /// <summary>Whether a decision naming <paramref name="name"/> (id, name or variant, any case) and
    /// <paramref name="label"/> (null: any) means this heading.</summary>
    public bool Answers(NameLabel? label, string name) =>
        (label is null || Label == label) &&
        (string.Equals(Id.Value, name, StringComparison.OrdinalIgnoreCase) ||
         string.Equals(Name, name, StringComparison.OrdinalIgnoreCase) ||
         Variants.Any(v => string.Equals(v, name, StringComparison.OrdinalIgnoreCase)));

    public void Absorb(HeadingDraft other, ImmutableArray<TimeRange> times)
    {
        Confidence = Math.Round((Confidence * Members.Count + other.Confidence * other.Members.Count) / (Members.Count + other.Members.Count), 4);
        Members = Members.Concat(other.Members).OrderBy(m => times[m.Index].Start).ThenBy(m => m).ToList();
        foreach (var v in other.Variants) if (!Variants.Contains(v)) Variants.Add(v);
        foreach (var s in other.Speakers) if (!Speakers.Contains(s)) Speakers.Add(s);
        if (Place is null && other.Place is not null) (Place, PlaceFromContext) = (other.Place, other.PlaceFromContext);
        else if (other.Place is not null && other.Place.GeonameId != Place!.GeonameId) Alternatives.Add(other.Place);
        foreach (var a in other.Alternatives)
            if (a.GeonameId != Place?.GeonameId && Alternatives.All(x => x.GeonameId != a.GeonameId)) Alternatives.Add(a);
        foreach (var p in other.PossiblySame) if (p != this && !PossiblySame.Contains(p)) PossiblySame.Add(p);
        PossiblySame.Remove(other);
    }

    /// <summary>The finished heading; a kept heading never holds a dropped mention (rejecting a heading
    /// drops it with its mentions). <paramref name="live"/> are the drafts still standing, the only
    /// ones a "possibly the same" link may name.</summary>
    public Heading ToHeading(MentionRenumbering renumbering, IReadOnlySet<HeadingDraft> live) => new(Id, Label, Name, [.. Variants], Place, [.. Alternatives],
        [.. Members.Select(m => renumbering.Map(m) ?? throw new InvalidOperationException($"heading {Id} holds the dropped mention {m}"))],
        [.. Speakers], Confidence, Source)
    {
        PossiblySame = [.. PossiblySame.Where(p => p != this && live.Contains(p) && p.Label == NameLabel.PER && Label == NameLabel.PER)
            .Select(p => p.Id).Distinct().Order()],
        PlaceFromContext = PlaceFromContext,
    };
}

/// <summary>What heading decisions work on: the drafts, and per grouped mention whether it is
/// dropped and its label.</summary>
internal sealed class HeadingEdit(List<HeadingDraft> drafts, bool[] dropped, NameLabel[] labels, ImmutableArray<TimeRange> times)
{
    public List<HeadingDraft> Drafts { get; } = drafts;
    public bool[] Dropped { get; } = dropped;
    public NameLabel[] Labels { get; } = labels;
    public ImmutableArray<TimeRange> Times { get; } = times;
}
