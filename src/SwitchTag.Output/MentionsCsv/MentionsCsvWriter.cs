using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Output.Text;

namespace SwitchTag.Output.MentionsCsv;

/// <summary><c>mentions.csv</c>: one row per mention in time order of the transcript. <c>turn</c> and
/// <c>char</c> are what a decisions file row names a mention by.</summary>
public sealed class MentionsCsvWriter : IInterviewWriter
{
    public string FileName => "mentions.csv";

    public void Write(InterviewIndex index, Stream stream)
    {
        using var text = Utf8Text.Writer(stream);
        Rows(index, new Csv(text));
    }

    public static readonly string[] Header =
        ["start", "end", "start_seconds", "end_seconds", "speaker", "text", "label", "heading", "heading_name",
         "language", "confidence", "source", "review", "turn", "char", "char_end"];

    public static string Render(InterviewIndex index) => Rows(index, new Csv()).ToString();

    private static Csv Rows(InterviewIndex index, Csv csv)
    {
        var names = index.Headings.ToDictionary(h => h.Id, h => h.Name);
        var reasons = index.Review.ToDictionary(r => r.Mention, r => r.Reason);
        csv.Row(Header);
        for (int i = 0; i < index.Mentions.Length; i++)
        {
            var (m, time, heading) = index.Mentions[i];
            csv.Row(time.Start.ToString(), time.End.ToString(), time.Start.ToSecondsString(), time.End.ToSecondsString(),
                index.TurnAt(m.Turn).Speaker, m.Text, m.Label.ToString(), heading?.Value,
                heading is { } id ? names.GetValueOrDefault(id) : null, m.Language.Code, Numbers.Confidence(m.Confidence),
                m.Source.Name, reasons.GetValueOrDefault(new MentionId(i)), Numbers.Integer(m.Turn.Index), Numbers.Integer(m.CharStart),
                Numbers.Integer(m.CharEnd));
        }
        return csv;
    }
}
