using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Output.TeiXml;

/// <summary>The elements laid over one turn's text, as a tree: foreign-language stretches outside,
/// names inside them. A name is language-neutral, so a stretch that only partly covers a name is cut
/// at the name's edges and the name stays outside it; names that overlap an earlier one are left out.
/// Offsets are into the turn's text.</summary>
internal static class TeiInline
{
    /// <summary>A name (its <see cref="Mention"/>) or a foreign stretch (its <see cref="Language"/>). A
    /// value, not an object: a long turn lays 571k of them.</summary>
    public readonly record struct Element(int Start, int End, LanguageCode? Language, MentionId? Mention)
    {
        public bool IsName => Mention is not null;
    }

    /// <param name="mentions">this turn's mentions, in index order</param>
    public static List<Element> Layout(InterviewIndex index, TurnId turn, IEnumerable<MentionId> mentions)
    {
        // One flag per char held by a name already laid: a name is checked over its own chars only,
        // so a turn of many thousand names costs no comparison of every name with every other.
        var ofTurn = mentions.ToList();
        var names = new List<Element>(ofTurn.Count);
        var held = new CharFlags(ofTurn.Select(i => index.MentionAt(i).Mention.CharEnd).Append(index.TurnAt(turn).Text.Length).Max());
        foreach (var i in ofTurn)
        {
            var (m, _, heading) = index.MentionAt(i);
            if (m.Turn != turn || heading is null || m.CharEnd <= m.CharStart) continue;
            if (held.Any(m.CharStart, m.CharEnd - m.CharStart)) continue;
            held.Set(m.CharStart, m.CharEnd - m.CharStart);
            names.Add(new Element(m.CharStart, m.CharEnd, null, i));
        }
        // The names do not overlap, so ordered by start they are ordered by end too; no two start
        // together, so a sort in place (no stable one's key arrays) gives the one order.
        var byStart = new int[names.Count];
        for (int k = 0; k < byStart.Length; k++) byStart[k] = k;
        Array.Sort(byStart, (a, b) => names[a].Start.CompareTo(names[b].Start));
        var foreign = new List<Element>();
        foreach (var (span, _) in index.Spans[turn.Index])
        {
            if (span.Language == index.MainLanguage || span.Language.IsUndetermined) continue;
            var pieces = new List<(int Start, int End)> { (span.CharStart, span.CharEnd) };
            // Only the names overlapping the span can cut it; they cut in the order they were laid.
            foreach (var n in Overlapping(names, byStart, span.CharStart, span.CharEnd))
                pieces = pieces.SelectMany(p => Cut(p, n)).ToList();
            foreach (var (start, end) in pieces)
                if (end > start && index.TurnAt(turn).Text.AsSpan(start, end - start).Trim().Length > 0)
                    foreign.Add(new Element(start, end, span.Language, null));
        }
        // Foreign pieces are disjoint (so are the spans they come from) and so are names, so no two
        // elements tie on start, end and kind, and a sort in place gives the one order without the key
        // and map arrays of a stable sort (a long turn lays 571k names). They join the names' list,
        // in the room its mentions left when it has it, else grown once to size: no second list of them all.
        if (names.Capacity < names.Count + foreign.Count) names.Capacity = names.Count + foreign.Count;
        names.AddRange(foreign);
        names.Sort(Outer);
        return names;
    }

    /// <summary>By start, the longer first, a foreign stretch before a name it equals.</summary>
    private static int Outer(Element a, Element b) =>
        a.Start != b.Start ? a.Start.CompareTo(b.Start)
        : a.End != b.End ? b.End.CompareTo(a.End)
        : a.IsName.CompareTo(b.IsName);

    private static IEnumerable<Element> Overlapping(List<Element> names, int[] byStart, int start, int end)
    {
        int lo = 0, hi = byStart.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (names[byStart[mid]].End <= start) lo = mid + 1; else hi = mid;
        }
        var found = new List<int>();
        for (int k = lo; k < byStart.Length && names[byStart[k]].Start < end; k++) found.Add(byStart[k]);
        found.Sort();
        return found.Select(k => names[k]);
    }

    /// <summary>The piece minus the name when the name straddles one of its edges; whole otherwise.</summary>
    private static IEnumerable<(int, int)> Cut((int Start, int End) piece, Element name)
    {
        bool overlaps = name.Start < piece.End && piece.Start < name.End;
        bool inside = name.Start >= piece.Start && name.End <= piece.End;
        if (!overlaps || inside) return [piece];
        return new[] { (piece.Start, Math.Min(piece.End, name.Start)), (Math.Max(piece.Start, name.End), piece.End) }.Where(p => p.Item2 > p.Item1);
    }
}
