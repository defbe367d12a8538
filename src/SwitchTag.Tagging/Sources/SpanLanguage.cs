using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Tagging.Sources;

/// <summary>The language a mention is routed with: that of the span its first char lies in, else of
/// the nearest span, else <c>und</c>.</summary>
public static class SpanLanguage
{
    public static string At(ImmutableArray<LanguageSpan> spans, int charStart)
    {
        foreach (var s in spans)
            if (s.CharStart <= charStart && charStart < s.CharEnd) return s.Language;
        return spans.IsEmpty ? "und" : spans.MinBy(s => Math.Min(Math.Abs(s.CharStart - charStart), Math.Abs(s.CharEnd - charStart)))!.Language;
    }
}
