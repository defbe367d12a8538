using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Training;

/// <summary>Switch-point precision/recall/F1 (a predicted switch within one word of a gold switch
/// counts, each gold switch matched once) and word-level accuracy over synthetic turns.</summary>
public sealed class SwitchScore
{
    public int GoldSwitches { get; private set; }
    public int PredictedSwitches { get; private set; }
    public int Matched { get; private set; }
    public int Words { get; private set; }
    public int WordsCorrect { get; private set; }

    public double Precision => PredictedSwitches == 0 ? 1 : (double)Matched / PredictedSwitches;
    public double Recall => GoldSwitches == 0 ? 1 : (double)Matched / GoldSwitches;
    public double F1 => Precision + Recall == 0 ? 0 : 2 * Precision * Recall / (Precision + Recall);
    public double WordAccuracy => Words == 0 ? 0 : (double)WordsCorrect / Words;

    public void Add(SyntheticTurn turn, ImmutableArray<LanguageSpan> spans)
    {
        var gold = turn.Words.Select(w => w.Code).ToArray();
        var predicted = turn.Words.Select(w => LanguageAt(spans, w.Start)).ToArray();
        for (int i = 0; i < gold.Length; i++)
        {
            Words++;
            if (gold[i] == predicted[i]) WordsCorrect++;
        }
        var goldPoints = SwitchPoints(gold);
        var predictedPoints = SwitchPoints(predicted);
        GoldSwitches += goldPoints.Count;
        PredictedSwitches += predictedPoints.Count;
        var used = new bool[goldPoints.Count];
        foreach (var p in predictedPoints)
        {
            for (int g = 0; g < goldPoints.Count; g++)
            {
                if (used[g] || Math.Abs(goldPoints[g] - p) > 1) continue;
                used[g] = true;
                Matched++;
                break;
            }
        }
    }

    private static string LanguageAt(ImmutableArray<LanguageSpan> spans, int offset)
    {
        foreach (var s in spans) if (offset >= s.CharStart && offset < s.CharEnd) return s.Language.Code;
        return LanguageCode.Undetermined.Code;
    }

    private static List<int> SwitchPoints(string[] labels)
    {
        var points = new List<int>();
        for (int i = 1; i < labels.Length; i++) if (labels[i] != labels[i - 1]) points.Add(i);
        return points;
    }
}
