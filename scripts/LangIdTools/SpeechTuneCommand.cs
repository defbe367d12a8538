using SwitchTag.LanguageId.Interview;
using SwitchTag.LanguageId.Segmentation;

namespace LangIdTools;

/// <summary>Grid search of the interview decoder's numbers on Miami dev (the only numbers fitted on
/// it); prints one line per setting, best switch-point share first among settings that keep token,
/// switched-utterance and one-word accuracy at their targets.</summary>
public static class SpeechTuneCommand
{
    public static int Run(string dataRoot, string modelPath)
    {
        var conversations = SpeechGold.Load(dataRoot);
        var segmenter = CodeSwitchSegmenter.Load(modelPath);
        var texts = conversations.Select(c => c.Select(u => u.Text).ToList()).ToList();
        var results = new List<(InterviewParameters P, SpeechScore S)>();
        foreach (float switchCost in new[] { 1f, 1.5f, 2f })
        foreach (float enter in new[] { 0.5f, 0.75f })
        foreach (double context in new[] { 0.3 })
        foreach (bool known in new[] { false, true })
        {
            var p = InterviewParameters.Default with { SwitchCost = switchCost, EnterWeight = enter, Context = context, KeepKnownWords = known };
            var score = new SpeechScore();
            for (int i = 0; i < conversations.Count; i++)
            {
                var spans = segmenter.SegmentInterview(texts[i], p).Spans;
                for (int u = 0; u < conversations[i].Count; u++) score.Add(conversations[i][u], spans[u]);
            }
            results.Add((p, score));
            Console.Error.WriteLine($"{Line(p, score)}");
        }
        foreach (var (p, s) in results.OrderByDescending(r => r.S.Tokens.Value >= 0.98 && r.S.SwitchedTokens.Value >= 0.95 && r.S.OneWordTokens.Value >= 0.9)
                     .ThenByDescending(r => r.S.SwitchUtterances.Value))
            Console.WriteLine(Line(p, s));
        return 0;
    }

    private static string Line(InterviewParameters p, SpeechScore s) =>
        $"switch {p.SwitchCost} enter {p.EnterWeight} context {p.Context} known {p.KeepKnownWords} | tokens {s.Tokens.Value:F4} switched {s.SwitchedTokens.Value:F4} " +
        $"one-word {s.OneWordTokens.Value:F4} switch-utt {s.SwitchUtterances.Value:F4} 1w P {SpeechScore.Rate(s.MatchedOneWord, s.PredictedOneWord):F3} R {SpeechScore.Rate(s.MatchedOneWord, s.GoldOneWord):F3}";
}
