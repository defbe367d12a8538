using SwitchTag.LanguageId.Training;

namespace LangIdTools;

public static class TrainCommand
{
    public static int Run(string dataRoot, string outPath)
    {
        var corpus = LidCorpus.Load(dataRoot);
        foreach (var g in corpus.GroupBy(l => l.Class).OrderBy(g => g.Key, StringComparer.Ordinal))
            Console.WriteLine($"{g.Key,-8} train {g.Count(l => l.Split == Split.Training),6}  calibration {g.Count(l => l.Split == Split.Calibration),5}  evaluation {g.Count(l => l.Split == Split.Evaluation),5}");
        var trained = ModelTrainer.Train(corpus, new TrainingOptions(), Console.Out);
        using (var file = File.Create(outPath)) trained.Write(file);
        Console.WriteLine($"wrote {outPath} ({new FileInfo(outPath).Length:N0} bytes)");
        return 0;
    }

    /// <summary>Compares training settings on the calibration split (never on the evaluation split).</summary>
    public static int Tune(string dataRoot)
    {
        var corpus = LidCorpus.Load(dataRoot);
        var calibration = HeldOutSets.Build(corpus.Select(l => l with { Split = l.Split == Split.Calibration ? Split.Evaluation : Split.Training }).ToList());
        foreach (var options in new TrainingOptions[]
        {
            new(Smoothing.WittenBell, FitSwitching: false, UnseenMassPower: 1.0),
            new(Smoothing.WittenBell, FitSwitching: false, UnseenMassPower: 0.6),
            new(Smoothing.WittenBell, FitSwitching: false, UnseenMassPower: 0.3),
        })
        {
            var model = ModelTrainer.Train(corpus, options, TextWriter.Null).Model;
            var segmenter = new SwitchTag.LanguageId.Segmentation.CodeSwitchSegmenter(model);
            double Acc(Func<HeldOutSets, List<string>> f) => calibration.Where(s => f(s).Count > 0)
                .Average(s => f(s).Count(t => segmenter.Identify(t).Language == s.Code) / (double)f(s).Count);
            var worst = calibration.Select(s => (s.Class, Acc: s.Pairs.Count(t => segmenter.Identify(t).Language == s.Code) / (double)Math.Max(1, s.Pairs.Count)))
                .OrderBy(x => x.Acc).Take(6).Select(x => $"{x.Class} {x.Acc:P0}");
            Console.WriteLine($"  worst pairs: {string.Join(", ", worst)}");
            Console.WriteLine($"{options.Smoothing} power {options.UnseenMassPower} min {options.MinCount}: features {model.FeatureCount:N0}, lines {Acc(s => s.Lines):P2}, pairs {Acc(s => s.Pairs):P2}, words {Acc(s => s.Words):P2}");
        }
        return 0;
    }
}
