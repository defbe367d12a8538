using System.Collections.Immutable;
using System.Runtime.InteropServices;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources;

/// <summary>The name cascade: which proposal stands where name sources overlap. Sources are ranked;
/// a proposal is dropped when it overlaps a standing proposal of a higher-ranked source (never split,
/// shortened or relabelled), and stands otherwise. Protected sources rank above every other: a span
/// from an archive's own list is never overwritten, whatever is inserted later.
/// <see cref="Default"/>, highest first: the authority list (protected); organisation cues (a
/// capitalised run around a head word: "Fiação Santa Rita" is never Santa Rita, BR); person cues (a titled or
/// kin-marked name is a person: "Mr. Roth" is never Roth, DE); place evidence (a gazetteer place after
/// a locative preposition, with a case ending, or a multi-word name matched whole: "w Tarnowie" is never
/// a person); the model (it has seen the context: "Jordan Peterson" is a person, not the country); a
/// listed given name said alone (the model's misses: "Staś", "Beto"); the gazetteer without evidence. A new source takes its place with <see cref="InsertBefore"/> or
/// <see cref="InsertAfter"/>.
/// The one exception the policy makes (<see cref="Yields"/>): place evidence gives way to a person the
/// model found over it with confidence <see cref="SurePerson"/> or more. A preposition or case ending puts a name in a place far less surely than a
/// model reading the whole sentence puts it in a person ("do Petra", "z Kováčom"); on the shared NER
/// test splits, without this exception, place evidence turned more gold persons into places than it
/// saved. Inflected places the model calls persons are then joined to their place by the
/// interview-wide label vote of the index stage.</summary>
public sealed class NamePrecedence
{
    private readonly ImmutableArray<MentionSource> _order;
    private readonly ImmutableHashSet<MentionSource> _protected;

    /// <summary>A proposal of <paramref name="Source"/> is withdrawn where a proposal of
    /// <paramref name="To"/> labelled <paramref name="Label"/>, of confidence <paramref name="AtLeast"/>
    /// or more, overlaps it, whatever their ranks.</summary>
    public sealed record Yield(MentionSource Source, MentionSource To, NameLabel Label, double AtLeast = 0);

    public ImmutableArray<Yield> Yields { get; }

    public NamePrecedence(IEnumerable<MentionSource> order, IEnumerable<MentionSource> protectedSources, IEnumerable<Yield>? yields = null)
    {
        Yields = yields?.ToImmutableArray() ?? [];
        _protected = protectedSources.ToImmutableHashSet();
        var all = order.ToList();
        foreach (var p in _protected)
            if (!all.Contains(p)) throw new ArgumentException($"protected source {p} has no place in the order");
        if (all.Distinct().Count() != all.Count) throw new ArgumentException("a source is ranked twice");
        _order = [.. all.Where(_protected.Contains), .. all.Where(s => !_protected.Contains(s))];
    }

    public static NamePrecedence Default { get; } =
        new([MentionSource.Authority, Organisations.OrganisationCueSource.Organisation, MentionSource.Cue, MentionSource.PlaceEvidence, MentionSource.Model, MentionSource.GivenName, MentionSource.Gazetteer], [MentionSource.Authority],
            [new Yield(MentionSource.PlaceEvidence, MentionSource.Model, NameLabel.PER, SurePerson)]);

    /// <summary>The model confidence from which a person it found overrides place evidence
    /// (<see cref="Yields"/>). Below it the model is unsure, and "from Bobruisk", "В Витебске" stay
    /// places. Chosen on the development interviews (the lowest of 0.7, 0.8, 0.9 that gave their best
    /// figures: places found 269 -> 272 of 280, wrong headings 7 -> 5); README "The index end to end"
    /// gives what it costs on the shared NER test splits.</summary>
    public const double SurePerson = 0.8;

    /// <summary>Highest rank first.</summary>
    public ImmutableArray<MentionSource> Order => _order;

    public bool IsProtected(MentionSource source) => _protected.Contains(source);

    public bool Ranks(MentionSource source) => _order.Contains(source);

    public NamePrecedence InsertBefore(MentionSource existing, MentionSource added) => Insert(existing, added, 0);

    public NamePrecedence InsertAfter(MentionSource existing, MentionSource added) => Insert(existing, added, 1);

    /// <summary>The proposals that stand, ordered by start then end.</summary>
    /// <remarks>One long speaker turn brings a million proposals, so this works on one list of them
    /// and per-proposal arrays, without per-rank groups or filtered copies, each of which would be
    /// a large array of the whole turn.</remarks>
    public ImmutableArray<Mention> Resolve(IEnumerable<Mention> proposals)
    {
        var all = new List<Mention>(proposals.TryGetNonEnumeratedCount(out int count) ? count : 0);
        foreach (var m in proposals)
            if (m.CharEnd > m.CharStart && m.CharStart >= 0) all.Add(m);
        if (!Yields.IsEmpty) Withdraw(all);
        if (all.Count == 0) return [];
        var rank = new int[all.Count];
        for (int i = 0; i < all.Count; i++) rank[i] = RankOf(all[i]);
        // One flag per char held by a higher rank: each proposal is checked over its own chars only,
        // so one long speaker turn with many names stays linear, not quadratic.
        var held = new CharFlags(all.Max(m => m.CharEnd));
        var stands = new bool[all.Count];
        var standing = new List<Mention>();
        for (int r = 0; r < _order.Length; r++)
        {
            // Proposals of one rank are checked against higher ranks only, all of them at once.
            for (int i = 0; i < all.Count; i++)
                if (rank[i] == r && !held.Any(all[i].CharStart, all[i].CharEnd - all[i].CharStart)) stands[i] = true;
            for (int i = 0; i < all.Count; i++)
                if (rank[i] == r && stands[i])
                {
                    held.Set(all[i].CharStart, all[i].CharEnd - all[i].CharStart);
                    standing.Add(all[i]);
                }
        }
        // By start, then end, ties in the order they stood (as a stable sort gives them): one index
        // array sorted in place, not a stable sort's key and map arrays of a long turn's 571k.
        var order = new int[standing.Count];
        for (int k = 0; k < order.Length; k++) order[k] = k;
        Array.Sort(order, (a, b) =>
        {
            Mention x = standing[a], y = standing[b];
            return x.CharStart != y.CharStart ? x.CharStart.CompareTo(y.CharStart) : x.CharEnd != y.CharEnd ? x.CharEnd.CompareTo(y.CharEnd) : a.CompareTo(b);
        });
        // Two sources of one rank may propose the very same span ("in Berlin": the city and the
        // city-state, both place evidence): one mention is kept, the first to stand.
        // Counted first, so the result is one array of its exact size.
        int kept = 0;
        for (int k = 0; k < order.Length; k++)
            if (k == 0 || !SameProposal(standing[order[k - 1]], standing[order[k]])) kept++;
        var ordered = new Mention[kept];
        for (int k = 0, n = 0; k < order.Length; k++)
            if (k == 0 || !SameProposal(standing[order[k - 1]], standing[order[k]])) ordered[n++] = standing[order[k]];
        return ImmutableCollectionsMarshal.AsImmutableArray(ordered);
    }

    private static bool SameProposal(Mention a, Mention b) =>
        a.CharStart == b.CharStart && a.CharEnd == b.CharEnd && a.Label == b.Label && a.Source == b.Source;

    /// <summary>Removes, in place, each proposal a <see cref="Yield"/> withdraws; every yield looks at
    /// the proposals as they came.</summary>
    private void Withdraw(List<Mention> all)
    {
        var withdrawn = new bool[all.Count];
        foreach (var y in Yields)
        {
            if (IsProtected(y.Source)) continue;
            var to = new RangeReach(all.Where(q => q.Source == y.To && q.Label == y.Label && q.Confidence >= y.AtLeast).Select(q => (q.CharStart, q.CharEnd)));
            for (int i = 0; i < all.Count; i++)
                if (all[i].Source == y.Source && to.Overlaps(all[i].CharStart, all[i].CharEnd)) withdrawn[i] = true;
        }
        int kept = 0;
        for (int i = 0; i < all.Count; i++)
            if (!withdrawn[i]) all[kept++] = all[i];
        all.RemoveRange(kept, all.Count - kept);
    }

    private int RankOf(Mention m)
    {
        int rank = _order.IndexOf(m.Source);
        return rank >= 0 ? rank : throw new ArgumentException($"name source {m.Source} has no place in the precedence");
    }

    private NamePrecedence Insert(MentionSource existing, MentionSource added, int offset)
    {
        int at = _order.IndexOf(existing);
        if (at < 0) throw new ArgumentException($"{existing} has no place in the precedence");
        return new NamePrecedence(_order.Insert(at + offset, added), _protected, Yields);
    }
}
