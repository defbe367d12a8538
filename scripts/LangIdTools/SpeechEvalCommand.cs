using System.Collections.Immutable;
using System.Diagnostics;
using SwitchTag.Core.Documents;
using SwitchTag.LanguageId.Segmentation;

namespace LangIdTools;

/// <summary>Scores segmentation on real transcribed Spanish-English conversation
/// (../shared/data/codeswitch/miami-dev, development only: never trained on).</summary>
public static class SpeechEvalCommand
{
    private delegate ImmutableArray<LanguageSpan>[] Labeller(IReadOnlyList<string> conversation);

    public static int Run(string dataRoot, string modelPath)
    {
        var conversations = SpeechGold.Load(dataRoot);
        var segmenter = CodeSwitchSegmenter.Load(modelPath);
        Console.WriteLine($"## Transcribed speech: Miami dev ({conversations.Count} conversations, {conversations.Sum(c => c.Count):N0} utterances; never trained on)");
        Console.WriteLine();
        Console.WriteLine("A word's prediction is the language of the span holding its first letter; only words gold-labelled en or es are scored. " +
            "Switch points lie between consecutive scored words; an utterance's switches are found when every gold switch has a predicted one within one word and vice versa. " +
            "One- and two-word switches: runs of that many scored words in one language inside an utterance of several runs; a predicted run counts when gold has the same run.");
        Console.WriteLine();
        Console.WriteLine("| mode | token acc | switched utt. token acc | one-word utt. acc | switch points within 1 word | switch P | switch R | 1-word switch P | 1-word switch R | 2-word switch P | 2-word switch R |");
        Console.WriteLine("|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|");
        var modes = new (string Name, Labeller Label)[]
        {
            ("each line alone", c => c.Select(t => segmenter.Segment(t, segmenter.Identify(t).Language)).ToArray()),
            ("interview profile", c => segmenter.SegmentInterview(c).Spans.ToArray()),
        };
        SpeechScore? last = null;
        foreach (var (name, label) in modes)
        {
            var score = new SpeechScore();
            var clock = Stopwatch.StartNew();
            foreach (var conversation in conversations)
            {
                var spans = label(conversation.Select(u => u.Text).ToList());
                for (int i = 0; i < conversation.Count; i++) score.Add(conversation[i], spans[i]);
            }
            Console.WriteLine($"| {name} | {F(score.Tokens.Value)} ({score.Tokens.N:N0}) | {F(score.SwitchedTokens.Value)} ({score.SwitchedTokens.N:N0}) | " +
                $"{F(score.OneWordTokens.Value)} ({score.OneWordTokens.N:N0}) | {F(score.SwitchUtterances.Value)} ({score.SwitchUtterances.N:N0}) | " +
                $"{F(SpeechScore.Rate(score.MatchedPredicted, score.PredictedSwitches))} | {F(SpeechScore.Rate(score.MatchedGold, score.GoldSwitches))} | " +
                $"{F(SpeechScore.Rate(score.MatchedOneWord, score.PredictedOneWord))} | {F(SpeechScore.Rate(score.MatchedOneWord, score.GoldOneWord))} | " +
                $"{F(SpeechScore.Rate(score.MatchedTwoWord, score.PredictedTwoWord))} | {F(SpeechScore.Rate(score.MatchedTwoWord, score.GoldTwoWord))} |");
            last = score;
        }
        Console.WriteLine();
        Console.WriteLine($"Counts in parentheses: scored words, words in switched utterances, one-word utterances, utterances with a gold switch. Last mode: {last!.GoldOneWord} gold and {last.PredictedOneWord} predicted one-word switches.");
        Console.WriteLine();
        PrintConfusions(last);
        PrintWords("One-word switches predicted but not in gold", last.FalseOneWord);
        PrintWords("One-word switches in gold but not predicted", last.MissedOneWord);
        return 0;
    }

    private static void PrintConfusions(SpeechScore score)
    {
        Console.WriteLine($"### Most frequent confusions (last mode), with the most frequent words and examples");
        Console.WriteLine();
        Console.WriteLine("| gold → predicted | words | most frequent words | examples |");
        Console.WriteLine("|---|---:|---|---|");
        foreach (var ((gold, predicted), list) in score.Confusions.OrderByDescending(kv => kv.Value.Count).Take(8))
        {
            var words = list.GroupBy(x => Clean(x.Word)).OrderByDescending(g => g.Count()).Take(8).Select(g => $"{g.Key} {g.Count()}");
            var examples = list.Where((_, i) => i % Math.Max(1, list.Count / 3) == 0).Take(3).Select(x => $"\"{x.Text}\" ({Clean(x.Word)})");
            Console.WriteLine($"| {gold} → {predicted} | {list.Count} | {string.Join(", ", words)} | {string.Join("; ", examples)} |");
        }
        Console.WriteLine();
    }

    private static void PrintWords(string title, List<(string Word, string Text)> list)
    {
        Console.WriteLine($"{title} ({list.Count}), most frequent words: " + string.Join(", ",
            list.GroupBy(x => Clean(x.Word)).OrderByDescending(g => g.Count()).Take(25).Select(g => $"{g.Key} {g.Count()}")));
        Console.WriteLine();
    }

    private static string Clean(string word) => word.Trim('.', ',', '?', '!', '"').ToLowerInvariant();

    private static string F(double v) => double.IsNaN(v) ? "–" : v.ToString("F3");
}
