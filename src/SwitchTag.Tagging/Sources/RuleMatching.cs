using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Lexicon;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources;

/// <summary>Matching a list of names in a turn: once per language of the turn's spans (inflection
/// follows the language), a match counting for the language of the span it starts in; longest
/// matches first, non-overlapping; each found with confidence 1.</summary>
public static class RuleMatching
{
    public static ImmutableArray<Mention> Find(TurnId turn, string text, ImmutableArray<LanguageSpan> spans,
        Func<string, LanguageCode, ImmutableArray<NameMatch>> find)
    {
        if (string.IsNullOrEmpty(text)) return [];
        if (spans.IsDefault) spans = [];
        var languages = spans.Select(s => s.Language).Distinct().DefaultIfEmpty(LanguageCode.Undetermined);
        var matches = new List<NameMatch>();
        foreach (var language in languages)
            matches.AddRange(find(text, language).Where(m => spans.IsEmpty || SpanLanguage.At(spans, m.CharStart) == language));
        return [.. NameMatchSelection.LongestFirst(matches).Select(r => new Mention(turn, new CharSpan(r.CharStart, r.CharEnd), SharedStrings.Of(text.AsSpan(r.CharStart, r.CharEnd - r.CharStart)),
            r.Label, SpanLanguage.At(spans, r.CharStart), 1.0, r.Source))];
    }
}
