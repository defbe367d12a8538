using System.Collections.Immutable;
using System.Runtime.InteropServices;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
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

    /// <summary>Rejected mentions removed, relabelled ones changed; <c>Accepted</c> holds the ids
    /// (positions in the returned list) of every mention a decision touched.</summary>
    public (ImmutableArray<Mention> Mentions, IReadOnlySet<MentionId> Accepted, ImmutableArray<DecisionOutcome> Applied) ApplyToMentions(
        ImmutableArray<Mention> mentions, Func<Mention, TimeRange> timeOf)
    {
        var counts = new int[Mine.Length];
        var accepted = new HashSet<MentionId>();
        // Without mention decisions the list stands as it is: no copy, no time per mention.
        if (!Mine.Any(d => d is MentionDecision)) return (mentions, accepted, Outcomes(counts));
        var kept = ImmutableArray.CreateBuilder<Mention>();
        var times = mentions.Select(timeOf).ToArray();
        // A decision looks only at the mentions of its own text (any case), so many decisions on
        // many mentions cost no scan of every mention per decision.
        var byText = new Dictionary<string, List<int>>(StringComparer.OrdinalIgnoreCase);
        for (int i = 0; i < mentions.Length; i++)
        {
            if (!byText.TryGetValue(mentions[i].Text, out var same)) byText[mentions[i].Text] = same = [];
            same.Add(i);
        }
        // Per mention, the decisions that picked it, in file order.
        var pickedBy = new List<int>?[mentions.Length];
        for (int d = 0; d < Mine.Length; d++)
            if (Mine[d] is MentionDecision md && byText.TryGetValue(md.Name, out var same))
                foreach (int i in md.Pick(same, mentions, times)) (pickedBy[i] ??= []).Add(d);
        for (int i = 0; i < mentions.Length; i++)
        {
            var current = mentions[i];
            bool decided = false, rejected = false;
            foreach (int d in pickedBy[i] ?? [])
            {
                counts[d]++;
                decided = true;
                if (((MentionDecision)Mine[d]).Apply(current) is { } next) current = next; else rejected = true;
            }
            if (rejected) continue;
            if (decided) accepted.Add(new MentionId(kept.Count));
            kept.Add(current);
        }
        return (kept.ToImmutable(), accepted, Outcomes(counts));
    }

    /// <summary>Applies the heading decisions; returns the final mentions (those of rejected headings
    /// dropped), their times, headings and review items, every mention id renumbered to match
    /// (<see cref="MentionRenumbering"/>).</summary>
    public (ImmutableArray<Mention> Mentions, ImmutableArray<TimeRange> Times, HeadingResult Headings, ImmutableArray<DecisionOutcome> Applied) ApplyToHeadings(
        ImmutableArray<Mention> mentions, ImmutableArray<TimeRange> times, HeadingResult result)
    {
        var counts = new int[Mine.Length];
        var drafts = result.Headings.Select(h => new HeadingDraft(h)).ToList();
        var draftOf = drafts.ToDictionary(h => h.Id);
        foreach (var (draft, heading) in drafts.Zip(result.Headings))
            draft.PossiblySame.AddRange(heading.PossiblySame.Select(id => draftOf[id]));
        var edit = new HeadingEdit(drafts, new bool[mentions.Length], mentions.Select(m => m.Label).ToArray(), times);
        Dictionary<string, List<HeadingDraft>>? byName = null;
        for (int d = 0; d < Mine.Length; d++)
        {
            if (Mine[d] is not HeadingDecision decision) continue;
            byName ??= DraftsByName(edit.Drafts);
            if (!byName.TryGetValue(decision.Name, out var named)) continue;
            var targets = named.Where(h => h.Answers(decision.Label, decision.Name)).ToList();
            foreach (var h in targets)
                if (decision.Apply(h, edit)) counts[d]++;
            // Applying may rename, relabel, merge or remove drafts: look them up afresh.
            if (targets.Count > 0) byName = null;
        }

        var renumbering = new MentionRenumbering(edit.Dropped);
        var (keptMentions, keptTimes) = Kept(mentions, times, edit, renumbering.KeptCount);
        var headingOf = new HeadingId?[renumbering.KeptCount];
        var live = edit.Drafts.ToHashSet();
        var headings = HeadingOrder.Sort(edit.Drafts.Select(h => h.ToHeading(renumbering, live)));
        foreach (var h in headings)
            foreach (var m in h.Mentions) headingOf[m.Index] = h.Id;
        var review = ImmutableArray.CreateBuilder<ReviewItem>();
        foreach (var r in result.Review)
            if (renumbering.Map(r.Mention) is { } kept) review.Add(r with { Mention = kept });
        return (keptMentions, keptTimes, new HeadingResult(headings, ImmutableCollectionsMarshal.AsImmutableArray(headingOf), review.ToImmutable()), Outcomes(counts));
    }

    /// <summary>The mentions and times the heading decisions left, relabelled where they relabelled.
    /// Where they dropped and relabelled none (always without heading decisions) the lists stand as
    /// they are: one long turn holds hundreds of thousands of mentions, and a copy of both lists is
    /// some 14 MB of large arrays.</summary>
    private static (ImmutableArray<Mention> Mentions, ImmutableArray<TimeRange> Times) Kept(
        ImmutableArray<Mention> mentions, ImmutableArray<TimeRange> times, HeadingEdit edit, int keptCount)
    {
        bool relabelled = false;
        for (int i = 0; i < mentions.Length && !relabelled; i++) relabelled = mentions[i].Label != edit.Labels[i];
        if (keptCount == mentions.Length && !relabelled) return (mentions, times);
        var keptMentions = ImmutableArray.CreateBuilder<Mention>(keptCount);
        var keptTimes = ImmutableArray.CreateBuilder<TimeRange>(keptCount);
        for (int i = 0; i < mentions.Length; i++)
        {
            if (edit.Dropped[i]) continue;
            // A copy only where a decision relabelled the mention.
            keptMentions.Add(mentions[i].Label == edit.Labels[i] ? mentions[i] : mentions[i] with { Label = edit.Labels[i] });
            keptTimes.Add(times[i]);
        }
        return (keptMentions.MoveToImmutable(), keptTimes.MoveToImmutable());
    }

    /// <summary>The drafts under each of their names (id, name, variants; any case), each list in
    /// draft order, so a heading decision finds its headings without a scan of all of them.</summary>
    private static Dictionary<string, List<HeadingDraft>> DraftsByName(List<HeadingDraft> drafts)
    {
        var byName = new Dictionary<string, List<HeadingDraft>>(StringComparer.OrdinalIgnoreCase);
        foreach (var h in drafts)
            foreach (var name in h.Variants.Prepend(h.Name).Prepend(h.Id.Value))
            {
                if (!byName.TryGetValue(name, out var list)) byName[name] = list = [];
                if (list.Count == 0 || list[^1] != h) list.Add(h);
            }
        return byName;
    }

    private ImmutableArray<DecisionOutcome> Outcomes(int[] counts) =>
        Mine.Select((d, i) => new DecisionOutcome(d, counts[i])).ToImmutableArray();
}
