using SwitchTag.Core.Documents;
using SwitchTag.Output.Html;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.WorklistCsv;

/// <summary><c>worklist.csv</c>: the translators' stretches, in time order; <c>check</c> is <c>yes</c>
/// for a stretch whose language a person should check before it is translated.</summary>
public sealed class WorklistCsvWriter : IInterviewWriter
{
    public string FileName => "worklist.csv";

    public void Write(InterviewIndex index, Stream stream)
    {
        using var text = Utf8Text.Writer(stream);
        Rows(index, new Csv(text));
    }

    public static readonly string[] Header =
        ["start", "end", "start_seconds", "end_seconds", "speaker", "language", "language_name", "confidence", "check", "words", "text", "turn", "char", "char_end"];

    public static string Render(InterviewIndex index) => Rows(index, new Csv()).ToString();

    private static Csv Rows(InterviewIndex index, Csv csv)
    {
        csv.Row(Header);
        foreach (var item in index.Worklist)
            csv.Row(item.Time.Start.ToString(), item.Time.End.ToString(), item.Time.Start.ToSecondsString(), item.Time.End.ToSecondsString(),
                item.Speaker, item.Language.Code, LanguageNames.Of(item.Language), Numbers.Confidence(item.Confidence), item.Check ? "yes" : "no",
                Numbers.Integer(item.Words), item.Text,
                Numbers.Integer(item.Turn.Index), Numbers.Integer(item.CharStart), Numbers.Integer(item.CharEnd));
        return csv;
    }
}
