using System.Text;
using System.Text.Json;

namespace SwitchTag.Tagging;

/// <summary>Scores a <see cref="SequenceTagger"/> on gold files with conlleval's exact-span rules,
/// pooling all sentences of all files.</summary>
public static class NerEvaluation
{
    public static Dictionary<string, PrfScore> Evaluate(SequenceTagger tagger, IReadOnlyList<GoldSentence> sentences)
    {
        var predicted = tagger.Tags([.. sentences.Select(s => s.Words)]);
        return ConllScore.Score(sentences.Select((s, i) => (s.Tags, (IReadOnlyList<string>)predicted[i])));
    }

    /// <summary>The <c>eval ner --json</c> object: micro first, then PER, LOC, ORG, each with
    /// precision, recall and f1.</summary>
    public static string ToJson(IReadOnlyDictionary<string, PrfScore> scores)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            foreach (var key in ConllScore.Types.Prepend("micro"))
            {
                var s = scores[key];
                w.WriteStartObject(key);
                w.WriteNumber("precision", Math.Round(s.Precision, 4));
                w.WriteNumber("recall", Math.Round(s.Recall, 4));
                w.WriteNumber("f1", Math.Round(s.F1, 4));
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    public static string ToTable(IReadOnlyDictionary<string, PrfScore> scores)
    {
        var sb = new StringBuilder("type   precision  recall  f1      gold  predicted\n");
        foreach (var key in ConllScore.Types.Prepend("micro"))
        {
            var s = scores[key];
            sb.Append($"{key,-6} {s.Precision,9:F4}  {s.Recall,6:F4}  {s.F1,6:F4}  {s.Gold,5}  {s.Predicted,9}\n");
        }
        return sb.ToString();
    }
}
