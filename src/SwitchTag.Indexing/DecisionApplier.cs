using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing;

/// <summary>Applies reviewer decisions to one interview. Mention decisions act on the tagged mentions
/// before grouping (a decided mention skips the review section: a person has looked at it); heading
/// decisions act on the grouped headings, in file order. Each run starts from the fresh pipeline
/// output, so applying the same file again gives the same index.</summary>
public sealed class DecisionApplier(ImmutableArray<Decision> decisions, string interview)
{
    private readonly ImmutableArray<Decision> _mine = decisions.IsDefault ? [] :
        decisions.Where(d => d.Interview is null || string.Equals(d.Interview, interview, StringComparison.OrdinalIgnoreCase)).ToImmutableArray();

    private readonly Dictionary<Decision, int> _applied = new(ReferenceEqualityComparer.Instance);

    public ImmutableArray<DecisionOutcome> Outcomes =>
        _mine.Select(d => new DecisionOutcome(d, interview, _applied.GetValueOrDefault(d))).ToImmutableArray();

    /// <summary>Rejected mentions removed, relabelled ones changed; <c>Accepted</c> holds the indices
    /// (into the returned list) of every mention a decision touched.</summary>
    public (ImmutableArray<Mention> Mentions, IReadOnlySet<int> Accepted) ApplyToMentions(ImmutableArray<Mention> mentions)
    {
        var kept = ImmutableArray.CreateBuilder<Mention>();
        var accepted = new HashSet<int>();
        foreach (var m in mentions)
        {
            var current = m;
            bool decided = false, rejected = false;
            foreach (var d in _mine)
            {
                if (!d.IsMentionDecision || d.Turn != m.Turn || d.Char != m.CharStart || !string.Equals(d.Name, m.Text, StringComparison.Ordinal))
                    continue;
                Count(d);
                decided = true;
                switch (d.Action)
                {
                    case DecisionAction.RejectMention: rejected = true; break;
                    case DecisionAction.RelabelMention: current = current with { Label = Enum.Parse<NameLabel>(d.Value!, ignoreCase: true) }; break;
                }
            }
            if (rejected) continue;
            if (decided) accepted.Add(kept.Count);
            kept.Add(current);
        }
        return (kept.ToImmutable(), accepted);
    }

    /// <summary>Applies the heading decisions; returns the final mentions (those of rejected headings
    /// dropped), their times, headings and review items, every index renumbered to match.</summary>
    public (ImmutableArray<Mention> Mentions, ImmutableArray<TimeRange> Times, HeadingResult Headings) ApplyToHeadings(
        ImmutableArray<Mention> mentions, ImmutableArray<TimeRange> times, HeadingResult result)
    {
        var drafts = result.Headings.Select(h => new Draft(h)).ToList();
        var labels = mentions.Select(m => m.Label).ToArray();
        var dropped = new bool[mentions.Length];
        foreach (var d in _mine)
        {
            if (d.IsMentionDecision) continue;
            var matches = drafts.Where(h => Matches(h, d.Label, d.Name)).ToList();
            foreach (var h in matches)
            {
                switch (d.Action)
                {
                    case DecisionAction.RejectHeading:
                        foreach (int i in h.Members) dropped[i] = true;
                        drafts.Remove(h);
                        break;
                    case DecisionAction.RelabelHeading:
                        var label = Enum.Parse<NameLabel>(d.Value!, ignoreCase: true);
                        if (h.Label == label) continue;
                        h.Label = label;
                        h.Id = HeadingBuilder.IdPrefix(label) + h.Id[h.Id.IndexOf('-')..];
                        foreach (int i in h.Members) labels[i] = label;
                        break;
                    case DecisionAction.RenameHeading:
                        if (h.Name == d.Value) continue;
                        h.Name = d.Value!;
                        break;
                    case DecisionAction.MergeHeadings:
                        var into = drafts.FirstOrDefault(t => t != h && t.Label == h.Label && Matches(t, d.Label, d.Value!));
                        if (into is null) continue;
                        into.Absorb(h, times);
                        drafts.Remove(h);
                        break;
                }
                Count(d);
            }
        }

        var newIndex = new int[mentions.Length];
        var keptMentions = ImmutableArray.CreateBuilder<Mention>();
        var keptTimes = ImmutableArray.CreateBuilder<TimeRange>();
        for (int i = 0; i < mentions.Length; i++)
        {
            if (dropped[i]) { newIndex[i] = -1; continue; }
            newIndex[i] = keptMentions.Count;
            keptMentions.Add(mentions[i] with { Label = labels[i] });
            keptTimes.Add(times[i]);
        }
        var headingOf = new string?[keptMentions.Count];
        var headings = drafts
            .Select(h => h.ToHeading(newIndex))
            .OrderBy(h => h.Label).ThenBy(h => h.Name, StringComparer.InvariantCultureIgnoreCase).ThenBy(h => h.Id, StringComparer.Ordinal)
            .ToImmutableArray();
        foreach (var h in headings)
            foreach (int i in h.Mentions) headingOf[i] = h.Id;
        var review = result.Review.Where(r => !dropped[r.Mention]).Select(r => r with { Mention = newIndex[r.Mention] }).ToImmutableArray();
        return (keptMentions.ToImmutable(), keptTimes.ToImmutable(), new HeadingResult(headings, [.. headingOf], review));
    }

    private void Count(Decision d) => _applied[d] = _applied.GetValueOrDefault(d) + 1;

    private static bool Matches(Draft h, NameLabel? label, string name) =>
        (label is null || h.Label == label) &&
        (string.Equals(h.Id, name, StringComparison.OrdinalIgnoreCase) ||
         string.Equals(h.Name, name, StringComparison.OrdinalIgnoreCase) ||
         h.Variants.Any(v => string.Equals(v, name, StringComparison.OrdinalIgnoreCase)));

    private sealed class Draft(Heading h)
    {
        public string Id { get; set; } = h.Id;
        public NameLabel Label { get; set; } = h.Label;
        public string Name { get; set; } = h.Name;
        public List<string> Variants { get; } = [.. h.Variants];
        public PlaceLink? Place { get; private set; } = h.Place;
        public List<PlaceLink> Alternatives { get; } = [.. h.Alternatives];
        public List<int> Members { get; private set; } = [.. h.Mentions];
        public List<string> Speakers { get; } = [.. h.Speakers];
        public double Confidence { get; private set; } = h.Confidence;
        public MentionSource Source { get; } = h.Source;

        public void Absorb(Draft other, ImmutableArray<TimeRange> times)
        {
            Confidence = Math.Round((Confidence * Members.Count + other.Confidence * other.Members.Count) / (Members.Count + other.Members.Count), 4);
            Members = Members.Concat(other.Members).OrderBy(i => times[i].Start).ThenBy(i => i).ToList();
            foreach (var v in other.Variants) if (!Variants.Contains(v)) Variants.Add(v);
            foreach (var s in other.Speakers) if (!Speakers.Contains(s)) Speakers.Add(s);
            if (Place is null && other.Place is not null) Place = other.Place;
            else if (other.Place is not null && other.Place.GeonameId != Place!.GeonameId) Alternatives.Add(other.Place);
            foreach (var a in other.Alternatives)
                if (a.GeonameId != Place?.GeonameId && Alternatives.All(x => x.GeonameId != a.GeonameId)) Alternatives.Add(a);
        }

        public Heading ToHeading(int[] newIndex) => new(Id, Label, Name, [.. Variants], Place, [.. Alternatives],
            Members.Select(i => newIndex[i]).ToImmutableArray(), [.. Speakers], Confidence, Source);
    }
}
