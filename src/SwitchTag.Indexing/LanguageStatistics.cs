using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Time;

namespace SwitchTag.Indexing;

/// <summary>How much of the interview is in one language: seconds of recording and words.</summary>
public sealed record LanguageShare(string Language, double Seconds, int Words);

public static class LanguageStatistics
{
    /// <summary>Per language, ordered by seconds then code. A word is a run of non-space characters
    /// holding at least one letter; it counts for the span its first char falls in.</summary>
    public static ImmutableArray<LanguageShare> Compute(
        ImmutableArray<Turn> turns, ImmutableArray<ImmutableArray<Timed<LanguageSpan>>> spans)
    {
        var seconds = new Dictionary<string, long>(StringComparer.Ordinal);
        var words = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int t = 0; t < turns.Length && t < spans.Length; t++)
        {
            foreach (var timed in spans[t])
            {
                var span = timed.Value;
                seconds[span.Language] = seconds.GetValueOrDefault(span.Language) + timed.Time.DurationMilliseconds;
                words[span.Language] = words.GetValueOrDefault(span.Language) + CountWords(turns[t].Text, span.CharStart, span.CharEnd);
            }
        }
        return seconds.Keys
            .Select(l => new LanguageShare(l, new Timecode(seconds[l]).TotalSeconds, words[l]))
            .OrderByDescending(s => s.Seconds).ThenBy(s => s.Language, StringComparer.Ordinal)
            .ToImmutableArray();
    }

    public static int CountWords(string text, int start, int end)
    {
        int count = 0;
        int i = Math.Max(0, start);
        end = Math.Min(end, text.Length);
        while (i < end)
        {
            while (i < end && char.IsWhiteSpace(text[i])) i++;
            bool letter = false;
            while (i < end && !char.IsWhiteSpace(text[i])) { letter |= char.IsLetter(text[i]); i++; }
            if (letter) count++;
        }
        return count;
    }
}
