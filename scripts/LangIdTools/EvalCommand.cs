using System.Diagnostics;
using System.Text;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Training;
using SwitchTag.Core.Languages;

namespace LangIdTools;

/// <summary>Scores the model on the held-out split and, in the same run on the same texts, the
/// reference identifier Lingua; prints markdown tables.</summary>
public static class EvalCommand
{
    internal const int SyntheticTurns = 1000;
    internal const int SyntheticSeed = 11;

    public static int Run(string dataRoot, string modelPath)
    {
        var corpus = LidCorpus.Load(dataRoot);
        var clock = Stopwatch.StartNew();
        var ours = CodeSwitchSegmenter.Load(modelPath);
        Console.WriteLine($"Model {modelPath}: {new FileInfo(modelPath).Length / 1048576.0:F2} MB, loaded in {clock.ElapsedMilliseconds} ms, {ours.Model.FeatureCount:N0} features, {ours.Languages.Count} languages.");
        clock.Restart();
        var lingua = new LinguaReference(ours.Languages.Select(l => l.Code));
        Console.WriteLine($"Lingua 2.0.0 restricted to the {lingua.Codes.Count} languages both support (built in {clock.ElapsedMilliseconds} ms): {string.Join(" ", lingua.Codes.Order())}.");
        Console.WriteLine();

        var sets = HeldOutSets.Build(corpus);
        var confusions = new Dictionary<(string, string), int>();
        var calibration = new List<(double Confidence, bool Correct)>();
        var rows = new List<Row>();
        foreach (var set in sets)
        {
            var row = new Row(set.Class, set.Code, lingua.Codes.Contains(set.Code));
            row.Lines = Score(set.Lines, set.Code, ours, row.Common ? lingua : null, confusions, calibration);
            row.Pairs = Score(set.Pairs, set.Code, ours, row.Common ? lingua : null, confusions, calibration);
            row.Words = Score(set.Words, set.Code, ours, row.Common ? lingua : null, null, calibration);
            rows.Add(row);
        }
        PrintAccuracy(rows);
        PrintConfusions(confusions);
        PrintCalibration(calibration);
        PrintSwitching(corpus, ours, lingua);
        PrintThroughput(sets, ours, lingua);
        return 0;
    }

    /// <summary>Lists the texts of one language (lines, first two words, single words) of a held-out
    /// split that the model gets wrong: the evaluation split to report, the calibration split to tune on.</summary>
    public static int Errors(string dataRoot, string modelPath, string code, Split split)
    {
        var ours = CodeSwitchSegmenter.Load(modelPath);
        var corpus = LidCorpus.Load(dataRoot).Select(l => l with { Split = l.Split == split ? Split.Evaluation : Split.Training }).ToList();
        foreach (var set in HeldOutSets.Build(corpus).Where(s => s.Code == code))
            foreach (var text in set.Lines.Concat(set.Pairs).Concat(set.Words))
            {
                var guess = ours.Identify(text);
                if (guess.Language != code) Console.WriteLine($"{guess.Language}\t{guess.Confidence:F2}\t{text}");
            }
        return 0;
    }

    /// <summary>Prints the synthetic calibration turns whose switch points the segmenter misses.</summary>
    public static int SwitchErrors(string dataRoot, string modelPath)
    {
        var ours = CodeSwitchSegmenter.Load(modelPath);
        foreach (var turn in SwitchSynthesizer.Build(LidCorpus.Load(dataRoot), Split.Calibration, 300, 3))
        {
            var spans = ours.Segment(turn.Text, new LanguageCode("en"));
            var score = new SwitchScore();
            score.Add(turn, spans);
            if (score.F1 < 1)
                Console.WriteLine($"{turn.InsertedCode}: {string.Join(" | ", spans.Select(s => s.Language + ": " + turn.Text[s.CharStart..s.CharEnd]))}");
        }
        return 0;
    }

    private sealed class Row(string cls, string code, bool common)
    {
        public string Class { get; } = cls;
        public string Code { get; } = code;
        public bool Common { get; } = common;
        public Accuracy Lines { get; set; }
        public Accuracy Pairs { get; set; }
        public Accuracy Words { get; set; }
    }

    private readonly record struct Accuracy(int N, int Ours, int Lingua)
    {
        public double OursRate => N == 0 ? double.NaN : (double)Ours / N;
        public double LinguaRate => N == 0 ? double.NaN : (double)Lingua / N;
    }

    private static Accuracy Score(List<string> texts, string code, CodeSwitchSegmenter ours, LinguaReference? lingua,
        Dictionary<(string, string), int>? confusions, List<(double, bool)> calibration)
    {
        int right = 0, linguaRight = 0;
        foreach (var text in texts)
        {
            var guess = ours.Identify(text);
            bool ok = guess.Language == code;
            if (ok) right++;
            else if (confusions is not null) confusions[(code, guess.Language)] = confusions.GetValueOrDefault((code, guess.Language)) + 1;
            calibration.Add((guess.Confidence, ok));
            if (lingua is not null && lingua.Detect(text) == code) linguaRight++;
        }
        return new Accuracy(texts.Count, right, linguaRight);
    }

    private static string P(double v) => double.IsNaN(v) ? "–" : (100 * v).ToString("F1");

    private static void PrintAccuracy(List<Row> rows)
    {
        Console.WriteLine("## Held-out accuracy (%)");
        Console.WriteLine();
        Console.WriteLine("Held-out split (10% of lines per language, fixed hash; never trained or tuned on). Lingua columns only for languages it supports.");
        Console.WriteLine();
        Console.WriteLine("| class | lines n | lines | first 2 words | single words n | single words ≥5 letters | Lingua lines | Lingua 2 words | Lingua words |");
        Console.WriteLine("|---|---:|---:|---:|---:|---:|---:|---:|---:|");
        foreach (var r in rows)
            Console.WriteLine($"| {r.Class} | {r.Lines.N} | {P(r.Lines.OursRate)} | {P(r.Pairs.OursRate)} | {r.Words.N} | {P(r.Words.OursRate)} | " +
                (r.Common ? $"{P(r.Lines.LinguaRate)} | {P(r.Pairs.LinguaRate)} | {P(r.Words.LinguaRate)} |" : "– | – | – |"));
        var common = rows.Where(r => r.Common).ToList();
        Console.WriteLine($"| **mean, all {rows.Count} classes** | | **{P(Mean(rows, r => r.Lines.OursRate))}** | **{P(Mean(rows, r => r.Pairs.OursRate))}** | | **{P(Mean(rows, r => r.Words.OursRate))}** | | | |");
        Console.WriteLine($"| **mean, {common.Count} classes Lingua supports** | | **{P(Mean(common, r => r.Lines.OursRate))}** | **{P(Mean(common, r => r.Pairs.OursRate))}** | | **{P(Mean(common, r => r.Words.OursRate))}** | **{P(Mean(common, r => r.Lines.LinguaRate))}** | **{P(Mean(common, r => r.Pairs.LinguaRate))}** | **{P(Mean(common, r => r.Words.LinguaRate))}** |");
        Console.WriteLine();
    }

    private static double Mean(List<Row> rows, Func<Row, double> f)
    {
        var v = rows.Select(f).Where(x => !double.IsNaN(x)).ToList();
        return v.Count == 0 ? double.NaN : v.Average();
    }

    private static void PrintConfusions(Dictionary<(string, string), int> confusions)
    {
        Console.WriteLine("## Worst confusions (full lines and first two words, SwitchTag)");
        Console.WriteLine();
        Console.WriteLine("| gold | predicted | count |");
        Console.WriteLine("|---|---|---:|");
        foreach (var ((gold, predicted), n) in confusions.OrderByDescending(kv => kv.Value).ThenBy(kv => kv.Key).Take(20))
            Console.WriteLine($"| {gold} | {predicted} | {n} |");
        Console.WriteLine();
    }

    /// <summary>Expected calibration error over ten equal-width confidence bins.</summary>
    private static void PrintCalibration(List<(double Confidence, bool Correct)> items)
    {
        Console.WriteLine("## Calibration (SwitchTag confidence, all held-out texts above)");
        Console.WriteLine();
        Console.WriteLine("| confidence | n | mean confidence | accuracy |");
        Console.WriteLine("|---|---:|---:|---:|");
        double ece = 0;
        for (int b = 0; b < 10; b++)
        {
            var bin = items.Where(i => Math.Min(9, (int)(i.Confidence * 10)) == b).ToList();
            if (bin.Count == 0) continue;
            double conf = bin.Average(i => i.Confidence), acc = bin.Count(i => i.Correct) / (double)bin.Count;
            ece += bin.Count * Math.Abs(conf - acc) / items.Count;
            Console.WriteLine($"| {b / 10.0:F1}–{(b + 1) / 10.0:F1} | {bin.Count} | {conf:F3} | {acc:F3} |");
        }
        Console.WriteLine();
        Console.WriteLine($"Expected calibration error: {ece:F3}");
        Console.WriteLine();
    }

    private static void PrintSwitching(List<CorpusLine> corpus, CodeSwitchSegmenter ours, LinguaReference lingua)
    {
        var turns = SwitchSynthesizer.Build(corpus, Split.Evaluation, SyntheticTurns, SyntheticSeed);
        var all = new SwitchScore();
        var oursCommon = new SwitchScore();
        var linguaCommon = new SwitchScore();
        var byCode = new Dictionary<string, SwitchScore>();
        foreach (var turn in turns)
        {
            var spans = ours.Segment(turn.Text, new LanguageCode("en"));
            all.Add(turn, spans);
            if (!byCode.TryGetValue(turn.InsertedCode, out var s)) byCode[turn.InsertedCode] = s = new SwitchScore();
            s.Add(turn, spans);
            if (!lingua.Codes.Contains(turn.InsertedCode)) continue;
            oursCommon.Add(turn, spans);
            linguaCommon.Add(turn, lingua.Segment(turn.Text));
        }
        Console.WriteLine($"## Code-switch segmentation ({turns.Count} synthetic turns from held-out lines, seed {SyntheticSeed})");
        Console.WriteLine();
        Console.WriteLine("An English held-out line with 2–6 consecutive words of another language's held-out line inserted or appended; a predicted switch within one word of a gold switch counts.");
        Console.WriteLine();
        Console.WriteLine("| system | turns | switch precision | switch recall | switch F1 | word accuracy |");
        Console.WriteLine("|---|---:|---:|---:|---:|---:|");
        Line("SwitchTag, all inserted languages", turns.Count, all);
        int common = turns.Count(t => lingua.Codes.Contains(t.InsertedCode));
        Line("SwitchTag, languages Lingua supports", common, oursCommon);
        Line("Lingua DetectMultipleLanguagesOf, same turns", common, linguaCommon);
        Console.WriteLine();
        Console.WriteLine("Per inserted language (SwitchTag): " + string.Join(", ",
            byCode.OrderBy(kv => kv.Value.F1).Select(kv => $"{kv.Key} {kv.Value.F1:F2}")));
        Console.WriteLine();

        static void Line(string name, int n, SwitchScore s) =>
            Console.WriteLine($"| {name} | {n} | {s.Precision:F3} | {s.Recall:F3} | {s.F1:F3} | {s.WordAccuracy:F3} |");
    }

    private static void PrintThroughput(List<HeldOutSets> sets, CodeSwitchSegmenter ours, LinguaReference lingua)
    {
        var common = sets.Where(s => lingua.Codes.Contains(s.Code)).SelectMany(s => s.Lines).ToList();
        long bytes = common.Sum(t => (long)Encoding.UTF8.GetByteCount(t));
        var oursIdentify = Throughput.Measure(bytes, 1, () => { foreach (var t in common) ours.Identify(t); });
        var oursSegment = Throughput.Measure(bytes, 1, () => { foreach (var t in common) ours.Segment(t, new LanguageCode("en")); });
        var linguaDetect = Throughput.Measure(bytes, 1, () => { foreach (var t in common) lingua.Detect(t); });
        Console.WriteLine($"## Throughput on the same {common.Count} held-out lines ({bytes / 1048576.0:F2} MB UTF-8), one thread");
        Console.WriteLine();
        Console.WriteLine($"Machine load average {File.ReadAllText("/proc/loadavg").Split(' ')[0]} on {Environment.ProcessorCount} shared cores: CPU-time rates are the fairer figure.");
        Console.WriteLine();
        Console.WriteLine("| system | MB/s per CPU-second | MB/s wall clock |");
        Console.WriteLine("|---|---:|---:|");
        Console.WriteLine($"| SwitchTag Identify | {oursIdentify.CpuMBps:F2} | {oursIdentify.WallMBps:F2} |");
        Console.WriteLine($"| SwitchTag Segment | {oursSegment.CpuMBps:F2} | {oursSegment.WallMBps:F2} |");
        Console.WriteLine($"| Lingua DetectLanguageOf | {linguaDetect.CpuMBps:F2} | {linguaDetect.WallMBps:F2} |");
        Console.WriteLine();
    }
}
