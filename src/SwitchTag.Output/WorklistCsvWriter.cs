using SwitchTag.Core.Documents;
using SwitchTag.Indexing;

namespace SwitchTag.Output;

/// <summary><c>worklist.csv</c>: the translators' stretches, in time order.</summary>
public static class WorklistCsvWriter
{
    public static readonly string[] Header =
        ["start", "end", "start_seconds", "end_seconds", "speaker", "language", "confidence", "words", "text", "turn", "char", "char_end"];

    public static string Render(InterviewIndex index)
    {
        var csv = new Csv().Row(Header);
        foreach (var item in index.Worklist)
            csv.Row(item.Time.Start.ToString(), item.Time.End.ToString(), item.Time.Start.ToSecondsString(), item.Time.End.ToSecondsString(),
                item.Speaker, item.Language, Numbers.Confidence(item.Confidence),
                Numbers.Integer(LanguageStatistics.CountWords(item.Text, 0, item.Text.Length)), item.Text,
                Numbers.Integer(item.Turn), Numbers.Integer(item.CharStart), Numbers.Integer(item.CharEnd));
        return csv.ToString();
    }
}
