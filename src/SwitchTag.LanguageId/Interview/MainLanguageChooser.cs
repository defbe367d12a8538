using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Interview;

/// <summary>Chooses an interview's main language from who speaks what for how long. Narrators are
/// the speakers not labelled as interviewers (<see cref="InterviewerLabels"/>); when no label marks
/// an interviewer, the speaker with the most talk is the narrator and the others interview. Each
/// turn's talk (its duration, or its characters when the transcript has no times) is split over its
/// spans by their length; <c>und</c> spans count for nothing. The narrators' leading language wins
/// unless the runner-up is within <see cref="TieMargin"/> of their talk: then the interviewers'
/// talk in those two languages decides (the interviewer usually speaks the language the interview
/// is conducted in), and if they are silent in both, the narrators' leader stays.</summary>
public static class MainLanguageChooser
{
    /// <summary>Two languages within 10 points of the narrators' talk are a tie.</summary>
    public const double TieMargin = 0.10;

    public static MainLanguageChoice Choose(IReadOnlyList<Turn> turns, IReadOnlyList<ImmutableArray<LanguageSpan>> spans,
        Func<string?, bool>? isInterviewer = null)
    {
        isInterviewer ??= InterviewerLabels.IsInterviewer;
        bool timed = Enumerable.Range(0, turns.Count).Where(t => spans[t].Any(s => s.Language != LanguageCode.Undetermined))
            .All(t => turns[t].Time.Duration.Milliseconds > 0);
        var talk = new Dictionary<string, Dictionary<LanguageCode, double>>(StringComparer.Ordinal);
        for (int t = 0; t < turns.Count; t++)
        {
            var turn = turns[t];
            int chars = spans[t].Sum(s => s.CharEnd - s.CharStart);
            if (chars == 0 || spans[t].All(s => s.Language == LanguageCode.Undetermined)) continue;
            double amount = timed ? turn.Time.Duration.TotalSeconds : chars;
            string speaker = turn.SpeakerLabel ?? turn.Speaker ?? "";
            if (!talk.TryGetValue(speaker, out var bySpeaker)) talk[speaker] = bySpeaker = [];
            foreach (var s in spans[t])
                if (s.Language != LanguageCode.Undetermined)
                    bySpeaker[s.Language] = bySpeaker.GetValueOrDefault(s.Language) + amount * (s.CharEnd - s.CharStart) / chars;
        }
        string unit = timed ? "seconds" : "characters";
        if (talk.Count == 0) return new MainLanguageChoice(LanguageCode.Undetermined, MainLanguageBasis.None, unit, [], [], []);

        var labelled = talk.Keys.Where(k => k.Length > 0).ToList();
        var interviewers = labelled.Where(k => isInterviewer(k)).ToHashSet(StringComparer.Ordinal);
        List<string> narrators;
        if (interviewers.Count > 0) narrators = labelled.Where(k => !interviewers.Contains(k)).ToList();
        else if (labelled.Count >= 2)
        {
            string most = labelled.OrderByDescending(k => talk[k].Values.Sum()).ThenBy(k => k, StringComparer.Ordinal).First();
            narrators = [most];
            interviewers = labelled.Where(k => k != most).ToHashSet(StringComparer.Ordinal);
        }
        else narrators = [];

        bool allTalk = narrators.Count == 0;
        var narratorShares = Shares(talk, allTalk ? talk.Keys : narrators);
        var interviewerShares = Shares(talk, interviewers);
        if (narratorShares.IsEmpty) return new MainLanguageChoice(LanguageCode.Undetermined, MainLanguageBasis.None, unit, [], interviewerShares, []);
        var basis = allTalk ? MainLanguageBasis.AllTalk : MainLanguageBasis.NarratorTalk;
        LanguageCode main = narratorShares[0].Language;
        if (narratorShares.Length > 1 && narratorShares[0].Share - narratorShares[1].Share < TieMargin)
        {
            double first = ShareOf(interviewerShares, narratorShares[0].Language);
            double second = ShareOf(interviewerShares, narratorShares[1].Language);
            if (second > first)
            {
                main = narratorShares[1].Language;
                basis = MainLanguageBasis.InterviewerTieBreak;
            }
            else if (first > second) basis = MainLanguageBasis.InterviewerTieBreak;
        }
        return new MainLanguageChoice(main, basis, unit, narratorShares, interviewerShares,
            narrators.Order(StringComparer.Ordinal).ToImmutableArray());
    }

    private static double ShareOf(ImmutableArray<SpokenLanguage> shares, LanguageCode language) =>
        shares.FirstOrDefault(s => s.Language == language)?.Share ?? 0;

    private static ImmutableArray<SpokenLanguage> Shares(Dictionary<string, Dictionary<LanguageCode, double>> talk, IEnumerable<string> speakers)
    {
        var sum = new Dictionary<LanguageCode, double>();
        foreach (var speaker in speakers)
            foreach (var (language, amount) in talk[speaker]) sum[language] = sum.GetValueOrDefault(language) + amount;
        double total = sum.Values.Sum();
        if (total <= 0) return [];
        return sum.OrderByDescending(kv => kv.Value).ThenBy(kv => kv.Key)
            .Select(kv => new SpokenLanguage(kv.Key, Math.Round(kv.Value / total, 4))).ToImmutableArray();
    }
}
