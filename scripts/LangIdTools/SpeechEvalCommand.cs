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
        PrintThirdLanguage(dataRoot, conversations, segmenter);
        PrintConfusions(last);
        PrintWords("One-word switches predicted but not in gold", last.FalseOneWord);
        PrintWords("One-word switches in gold but not predicted", last.MissedOneWord);
        return 0;
    }

    private static readonly string[] ThirdLanguages = ["de", "fr", "it", "pt", "ca", "gl", "pl", "tr", "cy", "nl"];

    /// <summary>A real third language must still come through: into each conversation go 4
    /// held-out UD lines (of at least 6 words) of one other language at fixed places; counts how
    /// many of them come out in that language, and how many Miami words leave en/es.</summary>
    private static void PrintThirdLanguage(string dataRoot, List<List<SpeechUtterance>> conversations, CodeSwitchSegmenter segmenter)
    {
        var corpus = SwitchTag.LanguageId.Training.LidCorpus.Load(dataRoot)
            .Where(l => l.Split == SwitchTag.LanguageId.Training.Split.Evaluation && l.Text.Split(' ').Length >= 6).ToList();
        var byLanguage = ThirdLanguages.ToDictionary(c => c, c => corpus.Where(l => l.Code == c).Select(l => l.Text).ToList());
        var found = ThirdLanguages.ToDictionary(c => c, _ => 0);
        var inserted = ThirdLanguages.ToDictionary(c => c, _ => 0);
        int leftPair = 0, words = 0;
        for (int i = 0; i < conversations.Count; i++)
        {
            string code = ThirdLanguages[i % ThirdLanguages.Length];
            var texts = conversations[i].Select(u => u.Text).ToList();
            var places = new List<int>();
            for (int k = 0; k < 4; k++)
            {
                int at = (k + 1) * texts.Count / 5 + k;
                texts.Insert(at, byLanguage[code][(i * 4 + k) % byLanguage[code].Count]);
                places.Add(at);
            }
            var result = segmenter.SegmentInterview(texts);
            foreach (var at in places)
            {
                inserted[code]++;
                if (result.TurnLanguages[at].Language == code) found[code]++;
            }
            for (int t = 0; t < texts.Count; t++)
            {
                if (places.Contains(t)) continue;
                foreach (var span in result.Spans[t])
                {
                    int n = texts[t][span.CharStart..span.CharEnd].Split(' ', StringSplitOptions.RemoveEmptyEntries).Length;
                    words += n;
                    if (span.Language.Code is not ("en" or "es" or "und")) leftPair += n;
                }
            }
        }
        Console.WriteLine("### A third language still comes through");
        Console.WriteLine();
        Console.WriteLine("Four held-out UD lines (≥ 6 words) of one other language put into each conversation (the language cycles over the conversations); " +
            "a line counts when its turn language is that language.");
        Console.WriteLine();
        Console.WriteLine("| inserted language | lines | found |");
        Console.WriteLine("|---|---:|---:|");
        foreach (var c in ThirdLanguages.Where(c => inserted[c] > 0))
            Console.WriteLine($"| {c} | {inserted[c]} | {found[c]} |");
        Console.WriteLine($"| **all** | {inserted.Values.Sum()} | {found.Values.Sum()} ({(double)found.Values.Sum() / inserted.Values.Sum():P0}) |");
        Console.WriteLine();
        Console.WriteLine($"Miami words put in a language other than en, es or und in the same runs: {leftPair} of {words:N0}.");
        Console.WriteLine();
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
