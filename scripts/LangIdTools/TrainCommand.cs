using SwitchTag.LanguageId.Training;

namespace LangIdTools;

public static class TrainCommand
{
    public static int Run(string dataRoot, string outPath)
    {
        var corpus = LidCorpus.Load(dataRoot);
        foreach (var g in corpus.GroupBy(l => l.Class).OrderBy(g => g.Key, StringComparer.Ordinal))
            Console.WriteLine($"{g.Key,-8} train {g.Count(l => l.Split == Split.Training),6}  calibration {g.Count(l => l.Split == Split.Calibration),5}  evaluation {g.Count(l => l.Split == Split.Evaluation),5}");
        var bytes = ModelTrainer.Train(corpus, new TrainingOptions(), Console.Out);
        File.WriteAllBytes(outPath, bytes);
        Console.WriteLine($"wrote {outPath} ({bytes.Length:N0} bytes)");
        return 0;
    }
}
