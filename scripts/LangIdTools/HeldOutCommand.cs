using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Training;
using SwitchTag.Core.Languages;

namespace LangIdTools;

/// <summary>The model's own held-out figures of <see cref="EvalCommand"/> without the reference
/// identifier (seconds instead of minutes): per-class line, two-word and word accuracy, their means,
/// and switch-point F1 on the same synthetic evaluation turns.</summary>
public static class HeldOutCommand
{
    public static int Run(string dataRoot, string modelPath)
    {
        var corpus = LidCorpus.Load(dataRoot);
        var model = CodeSwitchSegmenter.Load(modelPath);
        var rows = HeldOutSets.Build(corpus).Select(s => (s.Class,
            Lines: Rate(s.Lines, s.Code, model), Pairs: Rate(s.Pairs, s.Code, model), Words: Rate(s.Words, s.Code, model))).ToList();
        foreach (var r in rows) Console.WriteLine($"{r.Class,-8} lines {P(r.Lines)}  2 words {P(r.Pairs)}  words {P(r.Words)}");
        Console.WriteLine($"mean of {rows.Count} classes: lines {P(Mean(rows.Select(r => r.Lines)))}  2 words {P(Mean(rows.Select(r => r.Pairs)))}  words {P(Mean(rows.Select(r => r.Words)))}");
        var score = new SwitchScore();
        foreach (var turn in SwitchSynthesizer.Build(corpus, Split.Evaluation, EvalCommand.SyntheticTurns, EvalCommand.SyntheticSeed))
            score.Add(turn, model.Segment(turn.Text, new LanguageCode("en")));
        Console.WriteLine($"synthetic switch points: P {score.Precision:F3} R {score.Recall:F3} F1 {score.F1:F3} word accuracy {score.WordAccuracy:F3}");
        return 0;
    }

    private static double Rate(List<string> texts, string code, CodeSwitchSegmenter model) =>
        texts.Count == 0 ? double.NaN : texts.Count(t => model.Identify(t).Language == code) / (double)texts.Count;

    private static double Mean(IEnumerable<double> values)
    {
        var v = values.Where(x => !double.IsNaN(x)).ToList();
        return v.Count == 0 ? double.NaN : v.Average();
    }

    private static string P(double v) => double.IsNaN(v) ? "–" : (100 * v).ToString("F1");
}
