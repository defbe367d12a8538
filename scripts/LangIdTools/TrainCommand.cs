using SwitchTag.LanguageId.Training;

namespace LangIdTools;

public static class TrainCommand
{
    public static int Run(string dataRoot, string outPath, string? listFolder)
    {
        var corpus = LidCorpus.Load(dataRoot);
        var lists = listFolder is null ? [] : Vocabulary.Load(listFolder);
        foreach (var list in lists) Console.WriteLine($"word list {list.Source}: {list.Words.Length:N0} words");
        foreach (var g in corpus.GroupBy(l => l.Class).OrderBy(g => g.Key, StringComparer.Ordinal))
            Console.WriteLine($"{g.Key,-8} train {g.Count(l => l.Split == Split.Training),6}  calibration {g.Count(l => l.Split == Split.Calibration),5}  evaluation {g.Count(l => l.Split == Split.Evaluation),5}");
        var trained = ModelTrainer.Train(corpus, lists, new TrainingOptions(), Console.Out);
        using (var file = File.Create(outPath)) trained.Write(file);
        Console.WriteLine($"wrote {outPath} ({new FileInfo(outPath).Length:N0} bytes)");
        return 0;
    }

    /// <summary>Compares the word-list share on the calibration split (never on the evaluation
    /// split): first without the lists, then with each share; the thin languages the lists are
    /// for get their own counts.</summary>
    public static int Tune(string dataRoot, string? listFolder)
    {
        var corpus = LidCorpus.Load(dataRoot);
        var lists = listFolder is null ? [] : Vocabulary.Load(listFolder);
        var calibration = HeldOutSets.Build(corpus.Select(l => l with { Split = l.Split == Split.Calibration ? Split.Evaluation : Split.Training }).ToList());
        var runs = new List<(string Name, TrainingOptions Options, List<Vocabulary> Lists)> { ("no word lists", new(FitSwitching: false), []) };
        if (lists.Count > 0) runs.AddRange(new[] { 0.25, 0.5, 1 }.Select(r => ($"word-list share {r}", new TrainingOptions(FitSwitching: false, VocabularyShare: r), lists)));
        foreach (var (name, options, runLists) in runs)
        {
            var model = ModelTrainer.Train(corpus, runLists, options, TextWriter.Null).Model;
            var segmenter = new SwitchTag.LanguageId.Segmentation.CodeSwitchSegmenter(model);
            int Right(List<string> texts, string code) => texts.Count(t => segmenter.Identify(t).Language == code);
            double Acc(Func<HeldOutSets, List<string>> f) => calibration.Where(s => f(s).Count > 0)
                .Average(s => Right(f(s), s.Code) / (double)f(s).Count);
            var worst = calibration.Select(s => (s.Class, Acc: Right(s.Pairs, s.Code) / (double)Math.Max(1, s.Pairs.Count)))
                .OrderBy(x => x.Acc).Take(6).Select(x => $"{x.Class} {x.Acc:P0}");
            Console.WriteLine($"{name}: features {model.FeatureCount:N0}, lines {Acc(s => s.Lines):P2}, pairs {Acc(s => s.Pairs):P2}, words {Acc(s => s.Words):P2}");
            Console.WriteLine($"  worst pairs: {string.Join(", ", worst)}");
            foreach (var s in calibration.Where(s => lists.Any(l => l.Class == s.Class)))
                Console.WriteLine($"  {s.Class}: lines {Right(s.Lines, s.Code)}/{s.Lines.Count}, pairs {Right(s.Pairs, s.Code)}/{s.Pairs.Count}, words {Right(s.Words, s.Code)}/{s.Words.Count}");
        }
        return 0;
    }
}
