using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing;

/// <summary>The translators' worklist: every stretch outside the main language (<c>und</c> excluded),
/// consecutive spans of one language inside a turn merged, then cut at the turn's cue boundaries (a
/// translator's stretch belongs to one cue and its times), surrounding spaces trimmed, and pieces
/// without a word dropped. A stretch whose confidence is below <c>checkBelow</c> is marked
/// <see cref="WorklistItem.Check"/>: its language should be checked, not claimed.</summary>
public static class WorklistBuilder
{
    public static ImmutableArray<WorklistItem> Build(
        ImmutableArray<Turn> turns,
        ImmutableArray<ImmutableArray<LanguageSpan>> spans,
        LanguageCode mainLanguage,
        TimeAligner aligner,
        double checkBelow = 0)
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
                while (j + 1 < list.Length && list[j + 1].Language == span.Language) j++;
                foreach (var (start, end) in CuePieces(turn, span.CharStart, list[j].CharEnd))
                {
                    double confidence = Math.Round(ConfidenceOver(list, i, j, start, end), 4);
                    items.Add(new WorklistItem(
                        aligner.Align(turn, start, end), turn.Speaker, span.Language, confidence,
                        turn.Text[start..end], new TurnId(t), new CharSpan(start, end), WordCount.Of(turn.Text, start, end), confidence < checkBelow));
                }
                i = j + 1;
            }
        }
        return items.ToImmutable();
    }

    public static bool IsForeign(LanguageCode language, LanguageCode mainLanguage) =>
        !language.IsUndetermined && language != mainLanguage;

    /// <summary>[start, end) cut at the turn's cue boundaries, each piece trimmed of spaces (spans
    /// carry the spaces after their last word), pieces holding no word left out. Only the cues that
    /// overlap [start, end) are visited (found by binary search), so a turn of hundreds of thousands
    /// of cues with many foreign stretches costs no scan of all its cues per stretch.</summary>
    private static IEnumerable<(int Start, int End)> CuePieces(Turn turn, int start, int end)
    {
        var cues = turn.Cues.IsDefaultOrEmpty ? [new TurnCue(-1, new CharSpan(0, turn.Text.Length))] : turn.Cues;
        // The first cue ending after start; cues before it cannot overlap [start, end).
        int lo = 0, hi = cues.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (cues[mid].CharEnd <= start) lo = mid + 1; else hi = mid;
        }
        for (int c = lo; c < cues.Length && cues[c].CharStart < end; c++)
        {
            var cue = cues[c];
            int s = Math.Max(start, cue.CharStart), e = Math.Min(end, cue.CharEnd);
            while (s < e && char.IsWhiteSpace(turn.Text[s])) s++;
            while (e > s && char.IsWhiteSpace(turn.Text[e - 1])) e--;
            if (e > s && WordCount.Of(turn.Text, s, e) > 0) yield return (s, e);
        }
    }

    /// <summary>The spans' confidences i..j averaged over their chars inside [start, end).</summary>
    private static double ConfidenceOver(ImmutableArray<LanguageSpan> list, int i, int j, int start, int end)
    {
        double weighted = 0;
        int chars = 0;
        for (int k = i; k <= j; k++)
        {
            int overlap = Math.Min(end, list[k].CharEnd) - Math.Max(start, list[k].CharStart);
            if (overlap <= 0) continue;
            weighted += list[k].Confidence * overlap;
            chars += overlap;
        }
        return chars > 0 ? weighted / chars : list[i].Confidence;
    }
}
