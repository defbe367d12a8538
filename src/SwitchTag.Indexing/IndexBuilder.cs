using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Time;
using SwitchTag.Indexing.Decisions;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Indexing;

/// <summary>The time and index stages: places mentions and language spans in time, applies the
/// reviewers' decisions (their outcomes go on the index), groups headings, and builds the
/// translators' worklist.</summary>
/// <param name="checkLanguageBelow">worklist stretches below this confidence are marked for a person to check their language (0: none)</param>
public sealed class IndexBuilder(IHeadingLexicon lexicon, ImmutableArray<Decision> decisions = default,
    double reviewBelow = HeadingBuilder.DefaultReviewBelow, double checkLanguageBelow = 0) : IIndexBuilder
{
    public InterviewIndex Build(Transcript transcript, ImmutableArray<Turn> turns, LanguageCode mainLanguage,
        ImmutableArray<ImmutableArray<LanguageSpan>> spans, ImmutableArray<Mention> mentions)
    {
        var diagnostics = ImmutableArray.CreateBuilder<Diagnostic>();
        diagnostics.AddRange(transcript.Diagnostics);
        var aligner = new TimeAligner(transcript);

        mentions = mentions.IsDefault ? [] : mentions;
        var valid = ImmutableArray.CreateBuilder<Mention>(mentions.Length);
        foreach (var m in mentions)
        {
            if (m.Turn.Index < turns.Length && m.CharEnd > m.CharStart && m.CharEnd <= turns[m.Turn.Index].Text.Length)
                valid.Add(m);
            else
                diagnostics.Add(new Diagnostic(At(transcript, turns, m.Turn), Severity.Warning,
                    $"a name \"{m.Text}\" points outside its turn (turn {m.Turn}, chars {m.CharStart}-{m.CharEnd}) and was left out"));
        }
        var ordered = InTextOrder(valid.DrainToImmutable());

        var decisionStage = new DecisionStage(decisions, transcript.Id);
        var (decided, accepted, mentionOutcomes) = decisionStage.ApplyToMentions(ordered, m => aligner.Align(turns[m.Turn.Index], m.CharStart, m.CharEnd));
        var times = ImmutableArray.CreateRange(decided, m => aligner.Align(turns[m.Turn.Index], m.CharStart, m.CharEnd));
        var grouped = new HeadingBuilder(lexicon, reviewBelow).Build(decided, times, turns, accepted);
        var (finalMentions, finalTimes, headings, headingOutcomes) = decisionStage.ApplyToHeadings(grouped.Mentions.IsDefault ? decided : grouped.Mentions, times, grouped);
        // The headings' scratch of a long interview is given back before the index is put together (LongTalk).
        if (LongTalk.IsLong(turns)) LongTalk.Compact();
        var outcomes = mentionOutcomes.Zip(headingOutcomes, (m, h) => m with { Applied = m.Applied + h.Applied }).ToImmutableArray();

        var indexed = ImmutableArray.CreateBuilder<IndexedMention>(finalMentions.Length);
        for (int i = 0; i < finalMentions.Length; i++) indexed.Add(new IndexedMention(finalMentions[i], finalTimes[i], headings.HeadingOf[i]));
        var safeSpans = Enumerable.Range(0, turns.Length)
            .Select(t => t < spans.Length && !spans[t].IsDefault ? spans[t] : ImmutableArray<LanguageSpan>.Empty)
            .ToImmutableArray();
        var timedSpans = safeSpans
            .Select((list, t) => list.Select(s => new Timed<LanguageSpan>(s, aligner.Align(turns[t], s.CharStart, s.CharEnd))).ToImmutableArray())
            .ToImmutableArray();
        var worklist = WorklistBuilder.Build(turns, safeSpans, mainLanguage, aligner, checkLanguageBelow);
        var duration = (transcript.Cues.IsEmpty ? Timecode.Zero : transcript.Cues.Max(c => c.Time.End)) - Timecode.Zero;

        var foreign = safeSpans
            .SelectMany((list, t) => list.Where(s => WorklistBuilder.IsForeign(s.Language, mainLanguage)).Select(s => new ForeignSpan(new TurnId(t), new CharSpan(s.CharStart, s.CharEnd), s.Language)))
            .ToImmutableArray();
        return new InterviewIndex(transcript, mainLanguage, duration, turns, timedSpans, LanguageStatistics.Compute(turns, timedSpans), foreign, indexed.MoveToImmutable(),
            headings.Headings, worklist, headings.Review, diagnostics.ToImmutable(), outcomes);
    }

    /// <summary>The mentions by turn, then start, then end. The tag stage gives them in that order
    /// already, so they are only checked; a sort of a long turn's 571k mentions would put key and
    /// map arrays of all of them through the large object heap.</summary>
    private static ImmutableArray<Mention> InTextOrder(ImmutableArray<Mention> mentions)
    {
        for (int i = 1; i < mentions.Length; i++)
            if (Compare(mentions[i - 1], mentions[i]) > 0)
                return [.. mentions.OrderBy(m => m.Turn).ThenBy(m => m.CharStart).ThenBy(m => m.CharEnd)];
        return mentions;

        static int Compare(Mention a, Mention b) =>
            a.Turn != b.Turn ? a.Turn.CompareTo(b.Turn) : a.CharStart != b.CharStart ? a.CharStart.CompareTo(b.CharStart) : a.CharEnd.CompareTo(b.CharEnd);
    }

    private static SourceLine At(Transcript transcript, ImmutableArray<Turn> turns, TurnId turn) =>
        turn.Index < turns.Length && !turns[turn.Index].Cues.IsEmpty
            ? transcript.Cues[turns[turn.Index].Cues[0].CueIndex].At
            : new SourceLine(transcript.Source.Path, 1);
}
