using System.Text;
using System.Text.Json;
using SwitchTag.Core.Stages;

namespace SwitchTag.Pipeline;

/// <summary>The <c>switchtag langid --lines</c> contract (DESIGN.md): per input line, the whole-line
/// language and confidence and the switch spans, as a tab-separated line or one JSON object.</summary>
public static class LanguageIdLines
{
    public static void Write(ILanguageSegmenter segmenter, IEnumerable<string> lines, TextWriter output, bool json)
    {
        var buffer = new MemoryStream();
        foreach (var line in lines)
        {
            var guess = segmenter.Identify(line);
            var spans = segmenter.Segment(line, guess.Language);
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
                w.WriteString("language", guess.Language);
                w.WriteNumber("confidence", Math.Round(guess.Confidence, 4));
                w.WriteStartArray("spans");
                foreach (var s in spans)
                {
                    w.WriteStartObject();
                    w.WriteNumber("start", s.CharStart);
                    w.WriteNumber("end", s.CharEnd);
                    w.WriteString("language", s.Language);
                    w.WriteEndObject();
                }
                w.WriteEndArray();
                w.WriteEndObject();
            }
            output.WriteLine(Encoding.UTF8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length));
        }
    }
}
