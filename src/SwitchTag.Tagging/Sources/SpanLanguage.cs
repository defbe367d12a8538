using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;

namespace SwitchTag.Tagging.Sources;

/// <summary>The language a mention is routed with: that of the span its first char lies in, else of
/// the nearest span, else <c>und</c>.</summary>
public static class SpanLanguage
{
    public static LanguageCode At(ImmutableArray<LanguageSpan> spans, int charStart)
    {
        // Spans are in text order and disjoint: a binary search finds the one holding charStart.
        int lo = 0, hi = spans.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (spans[mid].CharEnd <= charStart) lo = mid + 1; else hi = mid;
        }
        if (lo < spans.Length && spans[lo].Chars.Contains(charStart)) return spans[lo].Language;
        return spans.IsEmpty ? LanguageCode.Undetermined : spans.MinBy(s => Math.Min(Math.Abs(s.CharStart - charStart), Math.Abs(s.CharEnd - charStart)))!.Language;
    }
}
