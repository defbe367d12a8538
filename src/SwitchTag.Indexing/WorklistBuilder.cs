using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing;

/// <summary>The translators' worklist: every stretch outside the main language (<c>und</c> excluded),
/// consecutive spans of one language inside a turn merged into one item, surrounding spaces trimmed.</summary>
public static class WorklistBuilder
{
    public static ImmutableArray<WorklistItem> Build(
        ImmutableArray<Turn> turns,
        ImmutableArray<ImmutableArray<LanguageSpan>> spans,
        string mainLanguage,
        TimeAligner aligner)
    {
        var items = ImmutableArray.CreateBuilder<WorklistItem>();
        for (int t = 0; t < turns.Length; t++)
        {
            var turn = turns[t];
            var list = t < spans.Length && !spans[t].IsDefault ? spans[t] : [];
            int i = 0;
            while (i < list.Length)
            {
                var span = list[i];
                if (!IsForeign(span.Language, mainLanguage)) { i++; continue; }
                int j = i;
                double weighted = span.Confidence * (span.CharEnd - span.CharStart);
                while (j + 1 < list.Length && list[j + 1].Language == span.Language)
                {
                    j++;
                    weighted += list[j].Confidence * (list[j].CharEnd - list[j].CharStart);
                }
                int start = span.CharStart, end = list[j].CharEnd;
                double confidence = end > start ? weighted / (end - start) : span.Confidence;
                // Spans carry the spaces after their last word; a translator's stretch does not.
                while (start < end && char.IsWhiteSpace(turn.Text[start])) start++;
                while (end > start && char.IsWhiteSpace(turn.Text[end - 1])) end--;
                if (end == start) { i = j + 1; continue; }
                items.Add(new WorklistItem(
                    aligner.Align(turn, start, end), turn.Speaker, span.Language, Math.Round(confidence, 4),
                    turn.Text[start..end], t, start, end, WordCount.Of(turn.Text, start, end)));
                i = j + 1;
            }
        }
        return items.ToImmutable();
    }

    public static bool IsForeign(string language, string mainLanguage) =>
        language != MainLanguage.Undetermined && !string.Equals(language, mainLanguage, StringComparison.Ordinal);
}
