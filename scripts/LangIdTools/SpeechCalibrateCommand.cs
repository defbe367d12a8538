using SwitchTag.LanguageId.Interview;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Text;

namespace LangIdTools;

/// <summary>Fits <see cref="StretchCalibration"/> on Miami dev stretches (a stretch's target is the
/// share of its scored gold words in its language) and reports expected calibration error: raw,
/// shipped, and two-fold cross-fitted (fit on half the conversations, measured on the other half).</summary>
public static class SpeechCalibrateCommand
{
    private readonly record struct Stretch(int Fold, double Raw, int Words, double Share, double Target, double Shipped, bool Minority);

    public static int Run(string dataRoot, string modelPath)
    {
        var conversations = SpeechGold.Load(dataRoot);
        var segmenter = CodeSwitchSegmenter.Load(modelPath);
        var raw = InterviewParameters.Default with { Calibration = StretchCalibration.Raw };
        var stretches = new List<Stretch>();
        for (int i = 0; i < conversations.Count; i++)
        {
            var utterances = conversations[i];
            var texts = utterances.Select(u => u.Text).ToList();
            var result = segmenter.SegmentInterview(texts, raw);
            var shipped = segmenter.SegmentInterview(texts);
            for (int u = 0; u < utterances.Count; u++)
            {
                var tokens = Tokenizer.Tokenize(texts[u]);
                var starts = utterances[u].WordStarts();
                for (int s = 0; s < result.Spans[u].Length; s++)
                {
                    var span = result.Spans[u][s];
                    int scored = 0, right = 0;
                    for (int w = 0; w < starts.Length; w++)
                    {
                        if (!utterances[u].IsScored(w)) continue;
                        int at = starts[w];
                        while (at < texts[u].Length && !char.IsLetterOrDigit(texts[u][at])) at++;
                        if (at < span.CharStart || at >= span.CharEnd) continue;
                        scored++;
                        if (utterances[u].Labels[w] == span.Language) right++;
                    }
                    if (scored == 0) continue;
                    stretches.Add(new Stretch(i % 2, span.Confidence, CodeSwitchSegmenter.WordsIn(tokens, span.CharStart, span.CharEnd),
                        CodeSwitchSegmenter.ShareOf(result.Profile, span.Language, raw), (double)right / scored, shipped.Spans[u][s].Confidence,
                        span.Language != result.Profile.Spoken[0].Language));
                }
            }
        }
        Console.WriteLine($"## Stretch confidence on Miami dev ({stretches.Count:N0} stretches with scored words; target: share of a stretch's scored words in its language)");
        Console.WriteLine();
        var all = Fit(stretches);
        var fold0 = Fit(stretches.Where(x => x.Fold == 1).ToList());
        var fold1 = Fit(stretches.Where(x => x.Fold == 0).ToList());
        var cross = stretches.Select(s => ((s.Fold == 0 ? fold0 : fold1).Apply(s.Raw, s.Words, s.Share), s.Target)).ToList();
        var minority = stretches.Select((s, i) => (s, i)).Where(x => x.s.Minority).Select(x => x.i).ToList();
        var crossMinority = minority.Select(i => cross[i]).ToList();
        Console.WriteLine("| confidence | ECE | stretches |");
        Console.WriteLine("|---|---:|---:|");
        Console.WriteLine($"| raw posterior | {Ece(stretches.Select(s => (s.Raw, s.Target)).ToList()):F3} | {stretches.Count} |");
        Console.WriteLine($"| calibrated, two-fold cross-fitted (fit on one half of the conversations, measured on the other) | {Ece(cross):F3} | {stretches.Count} |");
        Console.WriteLine($"| shipped calibration (StretchCalibration.Fitted), in-sample | {Ece(stretches.Select(s => (s.Shipped, s.Target)).ToList()):F3} | {stretches.Count} |");
        Console.WriteLine($"| raw, stretches outside the conversation's main language (the worklist's) | {Ece(minority.Select(i => (stretches[i].Raw, stretches[i].Target)).ToList()):F3} | {minority.Count} |");
        Console.WriteLine($"| calibrated cross-fitted, same stretches | {Ece(crossMinority):F3} | {minority.Count} |");
        Console.WriteLine();
        Console.WriteLine($"Fit on all conversations: new StretchCalibration({all.Bias:F4}, {all.LogitWeight:F4}, {all.WordsWeight:F4}, {all.ShareWeight:F4})");
        Console.WriteLine();
        Console.WriteLine("Raw reliability:");
        Console.WriteLine();
        PrintBins(stretches.Select(s => (s.Raw, s.Target)).ToList());
        Console.WriteLine("Cross-fitted reliability:");
        Console.WriteLine();
        PrintBins(cross);
        Console.WriteLine("Cross-fitted reliability, stretches outside the main language:");
        Console.WriteLine();
        PrintBins(crossMinority);
        Thresholds("all stretches", cross);
        Thresholds("stretches outside the main language", crossMinority);
        return 0;
    }

    private static void Thresholds(string title, List<(double, double)> cross)
    {
        Console.WriteLine($"Thresholds (cross-fitted confidence, {title}): stretches below go to \"check the language\".");
        Console.WriteLine();
        Console.WriteLine("| threshold | stretches below | their mean accuracy | stretches at or above | their mean accuracy |");
        Console.WriteLine("|---:|---:|---:|---:|---:|");
        foreach (var t in new[] { 0.5, 0.6, 0.7, 0.8, 0.9, 0.95 })
        {
            var below = cross.Where(c => c.Item1 < t).ToList();
            var above = cross.Where(c => c.Item1 >= t).ToList();
            Console.WriteLine($"| {t:F2} | {below.Count} ({(double)below.Count / cross.Count:P1}) | {Mean(below):F3} | {above.Count} | {Mean(above):F3} |");
        }
        Console.WriteLine();
    }

    private static double Mean(List<(double, double Target)> items) => items.Count == 0 ? double.NaN : items.Average(i => i.Target);

    private static void PrintBins(List<(double Confidence, double Target)> items)
    {
        Console.WriteLine("| confidence | n | mean confidence | mean accuracy |");
        Console.WriteLine("|---|---:|---:|---:|");
        for (int b = 0; b < 10; b++)
        {
            var bin = items.Where(i => Math.Min(9, (int)(i.Confidence * 10)) == b).ToList();
            if (bin.Count > 0)
                Console.WriteLine($"| {b / 10.0:F1}–{(b + 1) / 10.0:F1} | {bin.Count} | {bin.Average(i => i.Confidence):F3} | {bin.Average(i => i.Target):F3} |");
        }
        Console.WriteLine();
    }

    /// <summary>Expected calibration error over ten equal-width bins.</summary>
    public static double Ece(List<(double Confidence, double Target)> items)
    {
        double ece = 0;
        for (int b = 0; b < 10; b++)
        {
            var bin = items.Where(i => Math.Min(9, (int)(i.Confidence * 10)) == b).ToList();
            if (bin.Count > 0) ece += bin.Count * Math.Abs(bin.Average(i => i.Confidence) - bin.Average(i => i.Target)) / items.Count;
        }
        return ece;
    }

    /// <summary>Logistic regression with fractional targets by Newton's method (tiny ridge for stability).</summary>
    private static StretchCalibration Fit(List<Stretch> items)
    {
        var x = items.Select(s => Features(s)).ToList();
        var w = new double[4] { 0, 1, 0, 0 };
        for (int it = 0; it < 25; it++)
        {
            var g = new double[4];
            var h = new double[4, 4];
            for (int i = 0; i < x.Count; i++)
            {
                double z = 0;
                for (int k = 0; k < 4; k++) z += w[k] * x[i][k];
                double p = 1 / (1 + Math.Exp(-z));
                for (int k = 0; k < 4; k++)
                {
                    g[k] += (p - items[i].Target) * x[i][k];
                    for (int l = 0; l < 4; l++) h[k, l] += p * (1 - p) * x[i][k] * x[i][l];
                }
            }
            for (int k = 0; k < 4; k++) { g[k] += 1e-3 * w[k]; h[k, k] += 1e-3; }
            var step = Solve(h, g);
            // Backtracking: halve the Newton step until the loss does not grow.
            double before = Loss(x, items, w);
            for (double scale = 1; scale > 1e-4; scale /= 2)
            {
                var trial = new double[4];
                for (int k = 0; k < 4; k++) trial[k] = w[k] - scale * step[k];
                if (Loss(x, items, trial) <= before) { w = trial; break; }
            }
        }
        return new StretchCalibration(w[0], w[1], w[2], w[3]);
    }

    private static double Loss(List<double[]> x, List<Stretch> items, double[] w)
    {
        double loss = 0;
        for (int i = 0; i < x.Count; i++)
        {
            double z = 0;
            for (int k = 0; k < 4; k++) z += w[k] * x[i][k];
            double t = items[i].Target;
            // log(1 + e^z) - t z, computed stably
            loss += (z > 0 ? z + Math.Log(1 + Math.Exp(-z)) : Math.Log(1 + Math.Exp(z))) - t * z;
        }
        for (int k = 0; k < 4; k++) loss += 0.5e-3 * w[k] * w[k];
        return loss;
    }

    private static double[] Features(Stretch s)
    {
        var unit = new StretchCalibration(0, 1, 0, 0);
        double p = unit.Apply(s.Raw, 1, 1);
        return [1, Math.Log(p / (1 - p)), Math.Log(Math.Max(1, s.Words)), Math.Log(Math.Max(s.Share, 1e-6))];
    }

    private static double[] Solve(double[,] a, double[] b)
    {
        int n = b.Length;
        var m = (double[,])a.Clone();
        var v = (double[])b.Clone();
        for (int c = 0; c < n; c++)
        {
            int pivot = c;
            for (int r = c + 1; r < n; r++) if (Math.Abs(m[r, c]) > Math.Abs(m[pivot, c])) pivot = r;
            for (int k = 0; k < n; k++) (m[c, k], m[pivot, k]) = (m[pivot, k], m[c, k]);
            (v[c], v[pivot]) = (v[pivot], v[c]);
            for (int r = 0; r < n; r++)
            {
                if (r == c) continue;
                double f = m[r, c] / m[c, c];
                for (int k = 0; k < n; k++) m[r, k] -= f * m[c, k];
                v[r] -= f * v[c];
            }
        }
        for (int c = 0; c < n; c++) v[c] /= m[c, c];
        return v;
    }
}
