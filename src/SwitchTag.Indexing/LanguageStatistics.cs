using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;
using SwitchTag.Core.Time;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing;

public static class LanguageStatistics
{
    /// <summary>Per language, ordered by seconds then code. A word (<see cref="WordCount"/>) counts
    /// for the span its first char falls in.</summary>
    public static ImmutableArray<LanguageShare> Compute(
        ImmutableArray<Turn> turns, ImmutableArray<ImmutableArray<Timed<LanguageSpan>>> spans)
    {
        var seconds = new Dictionary<LanguageCode, long>();
        var words = new Dictionary<LanguageCode, int>();
        for (int t = 0; t < turns.Length && t < spans.Length; t++)
        {
            foreach (var timed in spans[t])
            {
                var span = timed.Value;
                seconds[span.Language] = seconds.GetValueOrDefault(span.Language) + timed.Time.Duration.Milliseconds;
                words[span.Language] = words.GetValueOrDefault(span.Language) + WordCount.Of(turns[t].Text, span.CharStart, span.CharEnd);
            }
        }
        return seconds.Keys
            .Select(l => new LanguageShare(l, new Timecode(seconds[l]).TotalSeconds, words[l]))
            .OrderByDescending(s => s.Seconds).ThenBy(s => s.Language)
            .ToImmutableArray();
    }
}
