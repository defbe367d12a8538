using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace LangIdTools;

/// <summary>Scores predicted spans against per-word gold on transcribed speech. A gold word's
/// prediction is the language of the span holding its first letter or digit. Switch points are
/// counted between consecutive scored words (unscored names, fillers and punctuation are skipped).</summary>
public sealed class SpeechScore
{
    public Ratio Tokens, SwitchedTokens, OneWordTokens, SwitchUtterances;
    public int GoldSwitches, PredictedSwitches, MatchedGold, MatchedPredicted;
    public int GoldOneWord, PredictedOneWord, MatchedOneWord;
    public int GoldTwoWord, PredictedTwoWord, MatchedTwoWord;
    public readonly Dictionary<(string Gold, string Predicted), List<(string Word, string Text)>> Confusions = [];
    public readonly List<(string Word, string Text)> FalseOneWord = [], MissedOneWord = [];

    public void Add(SpeechUtterance u, ImmutableArray<LanguageSpan> spans)
    {
        var starts = u.WordStarts();
        var gold = new List<string>();
        var predicted = new List<string>();
        var words = new List<string>();
        for (int w = 0; w < starts.Length; w++)
        {
            if (!u.IsScored(w)) continue;
            int end = w + 1 < starts.Length ? starts[w + 1] - 1 : u.Text.Length;
            string p = LanguageAt(spans, FirstLetterOrDigit(u.Text, starts[w], end));
            gold.Add(u.Labels[w]);
            words.Add(u.Text[starts[w]..end]);
            predicted.Add(p);
            if (p != u.Labels[w])
            {
                if (!Confusions.TryGetValue((u.Labels[w], p), out var list)) Confusions[(u.Labels[w], p)] = list = [];
                list.Add((u.Text[starts[w]..end], u.Text));
            }
        }
        if (gold.Count == 0) return;
        int right = gold.Zip(predicted).Count(x => x.First == x.Second);
        Tokens = Tokens.Add(right, gold.Count);
        if (u.Mixed) SwitchedTokens = SwitchedTokens.Add(right, gold.Count);
        if (gold.Count == 1) OneWordTokens = OneWordTokens.Add(right, 1);

        var g = Switches(gold);
        var p2 = Switches(predicted);
        GoldSwitches += g.Count;
        PredictedSwitches += p2.Count;
        int mg = g.Count(x => p2.Any(y => Math.Abs(x - y) <= 1));
        int mp = p2.Count(y => g.Any(x => Math.Abs(x - y) <= 1));
        MatchedGold += mg;
        MatchedPredicted += mp;
        if (g.Count > 0) SwitchUtterances = SwitchUtterances.Add(mg == g.Count && mp == p2.Count ? 1 : 0, 1);

        if (gold.Count < 2) return;
        var goldRuns = Runs(gold);
        var predictedRuns = Runs(predicted);
        CountRuns(goldRuns, predictedRuns, 1, ref GoldOneWord, ref PredictedOneWord, ref MatchedOneWord);
        if (goldRuns.Count > 1)
            foreach (var r in goldRuns.Where(r => r.Length == 1 && !(predictedRuns.Count > 1 && predictedRuns.Contains(r)))) MissedOneWord.Add((words[r.Start], u.Text));
        if (predictedRuns.Count > 1)
            foreach (var r in predictedRuns.Where(r => r.Length == 1 && !(goldRuns.Count > 1 && goldRuns.Contains(r)))) FalseOneWord.Add((words[r.Start], u.Text));
        CountRuns(goldRuns, predictedRuns, 2, ref GoldTwoWord, ref PredictedTwoWord, ref MatchedTwoWord);
    }

    private static void CountRuns(List<(int Start, int Length, string Label)> gold, List<(int Start, int Length, string Label)> predicted,
        int length, ref int goldCount, ref int predictedCount, ref int matched)
    {
        // A run that fills the whole utterance is no insertion.
        var g = gold.Count > 1 ? gold.Where(r => r.Length == length).ToList() : [];
        var p = predicted.Count > 1 ? predicted.Where(r => r.Length == length).ToList() : [];
        goldCount += g.Count;
        predictedCount += p.Count;
        matched += p.Count(r => g.Contains(r));
    }

    private static List<int> Switches(List<string> labels)
    {
        var at = new List<int>();
        for (int i = 1; i < labels.Count; i++) if (labels[i] != labels[i - 1]) at.Add(i);
        return at;
    }

    private static List<(int Start, int Length, string Label)> Runs(List<string> labels)
    {
        var runs = new List<(int, int, string)>();
        for (int i = 0; i < labels.Count;)
        {
            int j = i;
            while (j < labels.Count && labels[j] == labels[i]) j++;
            runs.Add((i, j - i, labels[i]));
            i = j;
        }
        return runs;
    }

    private static int FirstLetterOrDigit(string text, int start, int end)
    {
        for (int i = start; i < end; i++) if (char.IsLetterOrDigit(text[i])) return i;
        return start;
    }

    private static string LanguageAt(ImmutableArray<LanguageSpan> spans, int offset)
    {
        foreach (var s in spans) if (s.CharStart <= offset && offset < s.CharEnd) return s.Language;
        return "none";
    }

    public static double Rate(int a, int b) => b == 0 ? double.NaN : (double)a / b;
}

public readonly record struct Ratio(int Right, int N)
{
    public Ratio Add(int right, int n) => new(Right + right, N + n);

    public double Value => N == 0 ? double.NaN : (double)Right / N;
}
