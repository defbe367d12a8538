using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing.Decisions;

/// <summary>The decisions of one interview, applied. Mention decisions act on the tagged mentions
/// before grouping (a decided mention skips the review section: a person has looked at it); heading
/// decisions act on the grouped headings, in file order. Each step returns how often each decision
/// took effect; each run starts from the fresh pipeline output, so applying the same file again gives
/// the same index.</summary>
public sealed class DecisionStage(ImmutableArray<Decision> decisions, string interview)
{
    /// <summary>The decisions meant for this interview (or for every interview), in file order.</summary>
    public ImmutableArray<Decision> Mine { get; } = decisions.IsDefault ? [] :
        decisions.Where(d => d.Interview is null || string.Equals(d.Interview, interview, StringComparison.OrdinalIgnoreCase)).ToImmutableArray();

    /// <summary>Rejected mentions removed, relabelled ones changed; <c>Accepted</c> holds the indices
    /// (into the returned list) of every mention a decision touched.</summary>
    public (ImmutableArray<Mention> Mentions, IReadOnlySet<int> Accepted, ImmutableArray<DecisionOutcome> Applied) ApplyToMentions(
        ImmutableArray<Mention> mentions, Func<Mention, TimeRange> timeOf)
    {
        var counts = new int[Mine.Length];
        var kept = ImmutableArray.CreateBuilder<Mention>();
        var accepted = new HashSet<int>();
        var times = mentions.Select(timeOf).ToArray();
        var picked = Mine.Select(d => d is MentionDecision md ? md.Pick(mentions, times).ToHashSet() : null).ToArray();
        for (int i = 0; i < mentions.Length; i++)
        {
            var current = mentions[i];
            bool decided = false, rejected = false;
            for (int d = 0; d < Mine.Length; d++)
            {
                if (Mine[d] is not MentionDecision decision || !picked[d]!.Contains(i)) continue;
                counts[d]++;
                decided = true;
                if (decision.Apply(current) is { } next) current = next; else rejected = true;
            }
            if (rejected) continue;
            if (decided) accepted.Add(kept.Count);
            kept.Add(current);
        }
        return (kept.ToImmutable(), accepted, Outcomes(counts));
    }

    /// <summary>Applies the heading decisions; returns the final mentions (those of rejected headings
    /// dropped), their times, headings and review items, every index renumbered to match.</summary>
    public (ImmutableArray<Mention> Mentions, ImmutableArray<TimeRange> Times, HeadingResult Headings, ImmutableArray<DecisionOutcome> Applied) ApplyToHeadings(
        ImmutableArray<Mention> mentions, ImmutableArray<TimeRange> times, HeadingResult result)
    {
        var counts = new int[Mine.Length];
        var edit = new HeadingEdit(result.Headings.Select(h => new HeadingDraft(h)).ToList(), new bool[mentions.Length],
            mentions.Select(m => m.Label).ToArray(), times);
        for (int d = 0; d < Mine.Length; d++)
        {
            if (Mine[d] is not HeadingDecision decision) continue;
            foreach (var h in edit.Drafts.Where(h => h.Answers(decision.Label, decision.Name)).ToList())
                if (decision.Apply(h, edit)) counts[d]++;
        }

        var newIndex = new int[mentions.Length];
        var keptMentions = ImmutableArray.CreateBuilder<Mention>();
        var keptTimes = ImmutableArray.CreateBuilder<TimeRange>();
        for (int i = 0; i < mentions.Length; i++)
        {
            if (edit.Dropped[i]) { newIndex[i] = -1; continue; }
            newIndex[i] = keptMentions.Count;
            keptMentions.Add(mentions[i] with { Label = edit.Labels[i] });
            keptTimes.Add(times[i]);
        }
        var headingOf = new string?[keptMentions.Count];
        var headings = HeadingOrder.Sort(edit.Drafts.Select(h => h.ToHeading(newIndex)));
        foreach (var h in headings)
            foreach (int i in h.Mentions) headingOf[i] = h.Id;
        var review = result.Review.Where(r => !edit.Dropped[r.Mention]).Select(r => r with { Mention = newIndex[r.Mention] }).ToImmutableArray();
        return (keptMentions.ToImmutable(), keptTimes.ToImmutable(), new HeadingResult(headings, [.. headingOf], review), Outcomes(counts));
    }

    private ImmutableArray<DecisionOutcome> Outcomes(int[] counts) =>
        Mine.Select((d, i) => new DecisionOutcome(d, counts[i])).ToImmutableArray();
}
