using System.Text;
using System.Text.Json;
using SwitchTag.LanguageId.Segmentation;

namespace SwitchTag.Pipeline;

/// <summary>The <c>switchtag langid --lines</c> contract (DESIGN.md): per input line, the whole-line
/// language and confidence and the switch spans, as a tab-separated line or one JSON object. By
/// default the lines are one conversation: the languages of all lines are found first and each line
/// is decided within them; <c>eachLineAlone</c> judges every line on its own.</summary>
public static class LanguageIdLines
{
    public static void Write(CodeSwitchSegmenter segmenter, IReadOnlyList<string> lines, TextWriter output, bool json, bool eachLineAlone = false)
    {
        var conversation = eachLineAlone ? null : segmenter.SegmentInterview(lines);
        var buffer = new MemoryStream();
        for (int i = 0; i < lines.Count; i++)
        {
            string line = lines[i];
            var guess = conversation?.TurnLanguages[i] ?? segmenter.Identify(line);
            var spans = conversation?.Spans[i] ?? segmenter.Segment(line, guess.Language);
            if (!json)
            {
                output.WriteLine($"{guess.Language}\t{guess.Confidence:F3}\t" +
                    string.Join(" ", spans.Select(s => $"{s.CharStart}-{s.CharEnd}:{s.Language}")));
                continue;
            }
            buffer.SetLength(0);
            using (var w = new Utf8JsonWriter(buffer))
            {
                w.WriteStartObject();
                w.WriteString("language", guess.Language.Code);
                w.WriteNumber("confidence", Math.Round(guess.Confidence, 4));
                w.WriteStartArray("spans");
                foreach (var s in spans)
                {
                    w.WriteStartObject();
                    w.WriteNumber("start", s.CharStart);
                    w.WriteNumber("end", s.CharEnd);
                    w.WriteString("language", s.Language.Code);
                    w.WriteEndObject();
                }
                w.WriteEndArray();
                w.WriteEndObject();
            }
            output.WriteLine(Encoding.UTF8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length));
        }
    }
}
