using System.Diagnostics;
using System.Runtime.InteropServices;
using SwitchTag.Core.Languages;
using SwitchTag.LanguageId.Model;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Text;

namespace SwitchTag.LanguageId.Training;

/// <summary>Training settings. Alpha is the additive-smoothing pseudo-count; a feature is kept for
/// a language when seen at least MinCount times there (1 for thin languages, whose every n-gram is
/// precious). VocabularyShare is the weight of a language's word list as a share of its running
/// text (0.5 was best on the calibration split among 0.25, 0.5 and 1; `LangIdTools tune`).</summary>
public sealed record TrainingOptions(
    Smoothing Smoothing = Smoothing.WittenBell,
    double Alpha = 0.5,
    int MinCount = 3,
    int ThinLanguageChars = 150_000,
    float QuantStep = 0.05f,
    int CalibrationTurns = 600,
    int Seed = 7,
    bool FitSwitching = true,
    double UnseenMassPower = 0.6,
    double VocabularyShare = 0.5);

/// <summary>How a language's probability mass is shared with features it did not keep.</summary>
public enum Smoothing
{
    /// <summary>Add Alpha to every count over the global vocabulary of the feature kind.</summary>
    Additive,
    /// <summary>Witten-Bell: unseen mass T/(N+T) per language and kind (T distinct types, N tokens),
    /// spread over the features it did not keep. Thin languages get more unseen mass, which keeps
    /// them from losing on every feature their small corpus missed.</summary>
    WittenBell,
}

/// <summary>A trained model and a writer for its file.</summary>
public sealed record TrainedModel(NgramLanguageModel Model, Action<Stream> Write);

/// <summary>Counts features on the training split, builds the smoothed, pruned, quantised tables,
/// then fits the softmax temperature (log-loss on calibration lines, their first two words and
/// single words) and the segmenter's switch cost and emission cap (switch-point F1 on synthetic
/// turns made from calibration lines). Single-threaded and deterministic.</summary>
public static class ModelTrainer
{
    public static TrainedModel Train(IReadOnlyList<CorpusLine> corpus, IReadOnlyList<Vocabulary> wordLists,
        TrainingOptions options, TextWriter log)
    {
        var clock = Stopwatch.StartNew();
        var classes = corpus.Select(l => l.Class).Distinct().Order(StringComparer.Ordinal).ToArray();
        var codes = classes.Select(c => corpus.First(l => l.Class == c).Code).ToArray();
        var classIndex = classes.Select((c, i) => (c, i)).ToDictionary(x => x.c, x => x.i);
        var counts = classes.Select(_ => new Dictionary<uint, int>()).ToArray();
        var listCounts = classes.Select(_ => new Dictionary<uint, int>()).ToArray();
        var kindOf = new Dictionary<uint, byte>();
        var textTotals = new long[classes.Length, NgramHasher.FeatureKinds];
        var listTotals = new long[classes.Length, NgramHasher.FeatureKinds];
        var chars = new long[classes.Length];
        var tokens = new List<Token>();
        var buffer = new char[NgramHasher.MaxWordChars];
        foreach (var line in corpus)
        {
            if (line.Split != Split.Training) continue;
            int c = classIndex[line.Class];
            chars[c] += line.Text.Length;
            tokens.Clear();
            Tokenizer.Tokenize(line.Text, tokens);
            var sink = new CountSink(counts[c], kindOf, textTotals, c);
            foreach (var token in tokens)
            {
                if (token.IsNeutral) continue;
                int len = WordNormalizer.Normalize(line.Text.AsSpan(token.Start, token.Length), buffer);
                NgramHasher.ForEachFeature(buffer.AsSpan(0, len), ref sink);
            }
        }
        foreach (var list in wordLists)
        {
            if (!classIndex.TryGetValue(list.Class, out int c)) throw new InvalidDataException($"word list {list.Source}: {list.Class} is not a class of the corpus");
            var sink = new CountSink(listCounts[c], kindOf, listTotals, c);
            // Lists that keep case variants (KUCKEN, Kucken, kucken) count the word once.
            var normalised = new HashSet<string>(StringComparer.Ordinal);
            foreach (var word in list.Words)
            {
                tokens.Clear();
                Tokenizer.Tokenize(word, tokens);
                if (tokens is not [{ IsNeutral: false } token]) continue;
                int len = WordNormalizer.Normalize(word.AsSpan(token.Start, token.Length), buffer);
                if (normalised.Add(new string(buffer, 0, len))) NgramHasher.ForEachFeature(buffer.AsSpan(0, len), ref sink);
            }
        }
        log.WriteLine($"counted {kindOf.Count:N0} distinct features over {classes.Length} classes in {clock.Elapsed.TotalSeconds:F1}s");

        // A list's features weigh VocabularyShare of the language's running text in all: a list
        // holds every form once, rare or common, and counted like text it drowns the frequent words
        // that short texts are made of (Macedonian pairs on the calibration split fell 16 -> 7 of 22).
        var listWeight = new double[classes.Length];
        var totals = new double[classes.Length, NgramHasher.FeatureKinds];
        for (int c = 0; c < classes.Length; c++)
        {
            double text = 0, list = 0;
            for (int k = 1; k < NgramHasher.FeatureKinds; k++) { text += textTotals[c, k]; list += listTotals[c, k]; }
            listWeight[c] = list == 0 ? 0 : options.VocabularyShare * text / list;
            for (int k = 1; k < NgramHasher.FeatureKinds; k++) totals[c, k] = textTotals[c, k] + listWeight[c] * listTotals[c, k];
            if (list > 0) log.WriteLine($"word list of {classes[c]}: weight {listWeight[c]:G3} per word");
        }

        // Keep a feature for a language if seen often enough in its text; from its list, a whole word
        // always and an n-gram when MinCount of the list's words have it (the rest are mostly rare
        // and would double the table, slowing every lookup). Vocabulary sizes per kind follow.
        var kept = new Dictionary<uint, List<(byte Class, double Count)>>();
        var seen = new HashSet<uint>();
        var types = new double[classes.Length, NgramHasher.FeatureKinds];
        for (int c = 0; c < classes.Length; c++)
        {
            int min = chars[c] < options.ThinLanguageChars ? 1 : options.MinCount;
            seen.Clear();
            foreach (var key in counts[c].Keys.Concat(listCounts[c].Keys))
            {
                if (!seen.Add(key)) continue;
                int n = counts[c].GetValueOrDefault(key), m = listCounts[c].GetValueOrDefault(key);
                // A type first met in the list was met at the list's weight (Witten-Bell's T counts
                // first sightings, so a weighted sighting adds its weight, as it does to N); counted
                // whole, a list's types raised the unseen mass so far that the language lost its
                // evidence (Macedonian pairs 16 -> 8 of 22 on the calibration split).
                types[c, kindOf[key]] += n > 0 ? 1 : listWeight[c];
                if (n < min && m < (kindOf[key] == NgramHasher.WordFeature ? 1 : options.MinCount)) continue;
                if (!kept.TryGetValue(key, out var list)) kept[key] = list = [];
                list.Add(((byte)c, n + listWeight[c] * m));
            }
        }
        var vocabulary = new long[NgramHasher.FeatureKinds];
        foreach (var key in kept.Keys) vocabulary[kindOf[key]]++;

        var keptTypes = new long[classes.Length, NgramHasher.FeatureKinds];
        foreach (var (key, list) in kept)
            foreach (var (c, _) in list) keptTypes[c, kindOf[key]]++;
        var floor = new float[classes.Length * NgramHasher.FeatureKinds];
        var gainScale = new double[classes.Length * NgramHasher.FeatureKinds];
        for (int c = 0; c < classes.Length; c++)
            for (int k = 1; k < NgramHasher.FeatureKinds; k++)
            {
                double n = totals[c, k], v = Math.Max(1, vocabulary[k]);
                int i = c * NgramHasher.FeatureKinds + k;
                if (options.Smoothing == Smoothing.Additive)
                {
                    floor[i] = (float)Math.Log(options.Alpha / (n + options.Alpha * v));
                    gainScale[i] = 1 / options.Alpha; // gain = log((count + alpha) / alpha)
                }
                else
                {
                    double t = Math.Max(1, types[c, k]), unkept = Math.Max(1, v - keptTypes[c, k]);
                    // Unseen mass (T/(N+T))^power: power 1 is plain Witten-Bell; below 1 it evens out
                    // the mass between thin and large corpora, so a thin language (gl beside pt)
                    // does not win merely because its small corpus missed more features.
                    double unseen = Math.Pow(t / (n + t), options.UnseenMassPower);
                    floor[i] = (float)Math.Log(unseen / unkept);
                    gainScale[i] = unkept / (unseen * (n + t)); // gain = log(count / (n + t)) - floor
                }
            }
        var features = kept.OrderBy(kv => kv.Key)
            .Select(kv => (kv.Key, kv.Value.OrderBy(p => p.Class)
                .Select(p => (p.Class, Quantise(Gain(options, p.Count, gainScale[p.Class * NgramHasher.FeatureKinds + kindOf[kv.Key]]), options.QuantStep)))
                .ToArray()))
            .ToList();
        log.WriteLine($"kept {features.Count:N0} features, {features.Sum(f => f.Item2.Length):N0} postings");

        var parameters = new ModelParameters(options.QuantStep, 1f, 4f, 8f, 0.5f, 0f);
        var model = Build(classes, codes, floor, parameters, features);
        var temperature = FitTemperature(model, corpus);
        log.WriteLine($"temperature {temperature:F3}");
        parameters = parameters with { Temperature = temperature };
        model = Build(classes, codes, floor, parameters, features);
        if (options.FitSwitching)
        {
            parameters = FitSwitching(model, corpus, options, log);
            model = Build(classes, codes, floor, parameters, features);
        }
        log.WriteLine($"trained in {clock.Elapsed.TotalSeconds:F1}s");
        return new TrainedModel(model, stream => NgramLanguageModel.Write(stream, classes, codes, floor, parameters, features));
    }

    private static double Gain(TrainingOptions options, double count, double scale) =>
        options.Smoothing == Smoothing.Additive ? Math.Log((count + options.Alpha) * scale) : Math.Log(count * scale);

    private static byte Quantise(double gain, float step) => (byte)Math.Clamp((int)Math.Round(gain / step), 1, 255);

    private static NgramLanguageModel Build(string[] classes, string[] codes, float[] floor, ModelParameters parameters,
        List<(uint, (byte, byte)[])> features)
    {
        var keys = features.Select(f => f.Item1).ToArray();
        var lengths = features.Select(f => (byte)f.Item2.Length).ToArray();
        var postings = features.SelectMany(f => f.Item2).Select(p => (ushort)((p.Item1 << 8) | p.Item2)).ToArray();
        return new NgramLanguageModel(classes, codes, floor, parameters, keys, lengths, postings);
    }

    /// <summary>Grid search of the temperature minimising log-loss of the true class on calibration
    /// lines, their first two words and their single words.</summary>
    private static float FitTemperature(NgramLanguageModel model, IReadOnlyList<CorpusLine> corpus)
    {
        var items = new List<(float[] Scores, int Class)>();
        var classIndex = model.Classes.Select((c, i) => (c, i)).ToDictionary(x => x.c, x => x.i);
        var acc = new ScoreAccumulator(model.ClassCount);
        var buffer = new char[NgramHasher.MaxWordChars];
        foreach (var line in corpus)
        {
            if (line.Split != Split.Calibration) continue;
            var words = Tokenizer.Tokenize(line.Text).Where(t => !t.IsNeutral).ToList();
            foreach (var prefix in new[] { words.Count, Math.Min(2, words.Count), Math.Min(1, words.Count) })
            {
                if (prefix == 0) continue;
                acc.Clear();
                foreach (var w in words.Take(prefix))
                {
                    int len = WordNormalizer.Normalize(line.Text.AsSpan(w.Start, w.Length), buffer);
                    model.AddWord(buffer.AsSpan(0, len), acc);
                }
                if (acc.FeatureHits == 0) continue;
                var s = new float[model.ClassCount];
                model.LogLikelihoods(acc, s);
                items.Add((s, classIndex[line.Class]));
            }
        }
        float best = 1, bestLoss = float.MaxValue;
        for (float t = 0.02f; t <= 1.0f; t *= 1.15f)
        {
            double loss = 0;
            foreach (var (s, c) in items)
            {
                float max = s.Max();
                double sum = 0;
                foreach (var v in s) sum += Math.Exp((v - max) * t);
                loss -= (s[c] - max) * t - Math.Log(sum);
            }
            if (loss < bestLoss) { bestLoss = (float)loss; best = t; }
        }
        return best;
    }

    /// <summary>Grid search on synthetic calibration turns. Name weights stop at 0.25: a name keeps a
    /// quarter of a word's evidence at most, so one or two foreign names do not pay for a switch.</summary>
    private static ModelParameters FitSwitching(NgramLanguageModel model, IReadOnlyList<CorpusLine> corpus,
        TrainingOptions options, TextWriter log)
    {
        var turns = SwitchSynthesizer.Build(corpus, Split.Calibration, options.CalibrationTurns, options.Seed);
        var segmenter = new CodeSwitchSegmenter(model);
        var best = model.Parameters;
        double bestF1 = -1;
        foreach (var cost in new[] { 3f, 4f, 5f, 6f, 8f })
            foreach (var cap in new[] { 6f, 9f, 12f, 16f })
            foreach (var bonus in new[] { 0f, 0.25f, 0.5f, 1f })
            foreach (var name in new[] { 0f, 0.125f, 0.25f })
            {
                var p = model.Parameters with { SwitchCost = cost, EmissionCap = cap, MainLanguageBonus = bonus, NameWeight = name };
                var score = new SwitchScore();
                foreach (var turn in turns) score.Add(turn, segmenter.Segment(turn.Text, new LanguageCode("en"), p));
                if (score.F1 > bestF1) { bestF1 = score.F1; best = p; }
            }
        log.WriteLine($"switch cost {best.SwitchCost}, emission cap {best.EmissionCap}, main-language bonus {best.MainLanguageBonus}, name weight {best.NameWeight}: calibration switch F1 {bestF1:F3}");
        return best;
    }

    private readonly struct CountSink(Dictionary<uint, int> counts, Dictionary<uint, byte> kindOf, long[,] totals, int cls) : IFeatureSink
    {
        public void Add(uint key, int kind)
        {
            ref int n = ref CollectionsMarshal.GetValueRefOrAddDefault(counts, key, out bool exists);
            n++;
            if (!exists) kindOf.TryAdd(key, (byte)kind);
            totals[cls, kind]++;
        }
    }
}
