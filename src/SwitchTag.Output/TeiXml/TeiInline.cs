using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;

namespace SwitchTag.Output.TeiXml;

/// <summary>The elements laid over one turn's text, as a tree: foreign-language stretches outside,
/// names inside them. A name is language-neutral, so a stretch that only partly covers a name is cut
/// at the name's edges and the name stays outside it; names that overlap an earlier one are left out.
/// Offsets are into the turn's text.</summary>
internal static class TeiInline
{
    public sealed record Element(int Start, int End, string Kind, LanguageCode? Language, int Mention);

    public static List<Element> Layout(InterviewIndex index, int turn)
    {
        var names = new List<Element>();
        for (int i = 0; i < index.Mentions.Length; i++)
        {
            var (m, _, heading) = index.Mentions[i];
            if (m.Turn != turn || heading is null || m.CharEnd <= m.CharStart) continue;
            if (names.Any(n => n.Start < m.CharEnd && m.CharStart < n.End)) continue;
            names.Add(new Element(m.CharStart, m.CharEnd, "name", null, i));
        }
        var foreign = new List<Element>();
        foreach (var (span, _) in index.Spans[turn])
        {
            if (span.Language == index.MainLanguage || span.Language.IsUndetermined) continue;
            var pieces = new List<(int Start, int End)> { (span.CharStart, span.CharEnd) };
            foreach (var n in names)
                pieces = pieces.SelectMany(p => Cut(p, n)).ToList();
            foreach (var (start, end) in pieces)
                if (end > start && index.Turns[turn].Text.AsSpan(start, end - start).Trim().Length > 0)
                    foreign.Add(new Element(start, end, "foreign", span.Language, -1));
        }
        return foreign.Concat(names).OrderBy(e => e.Start).ThenByDescending(e => e.End).ThenBy(e => e.Kind == "name").ToList();
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
