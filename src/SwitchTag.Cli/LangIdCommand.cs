using System.CommandLine;
using System.Text;
using System.Text.Json;
using SwitchTag.LanguageId.Segmentation;

namespace SwitchTag.Cli;

/// <summary><c>switchtag langid --languages</c> and <c>switchtag langid --lines FILE [--json]</c>
/// (DESIGN.md contract: one JSON object per input line, in order).</summary>
public static class LangIdCommand
{
    public const string ModelFile = "langid.bin";

    public static Command Create()
    {
        var languages = new Option<bool>("--languages") { Description = "Print the supported language codes, one per line." };
        var lines = new Option<FileInfo?>("--lines") { Description = "Identify every line of this UTF-8 file." };
        var json = new Option<bool>("--json") { Description = "One JSON object per input line: language, confidence, spans." };
        var eachLine = new Option<bool>("--each-line")
        {
            Description = "Judge every line alone. By default the file is one conversation: its languages are found from all lines first, and each line is decided within them.",
        };
        var command = new Command("langid", "Identify the language of text, line by line, with switch points inside each line.")
        {
            languages, lines, json, eachLine,
        };
        command.SetAction(parseResult =>
        {
            var file = parseResult.GetValue(lines);
            if (!parseResult.GetValue(languages) && file is null)
            {
                Console.Error.WriteLine("switchtag langid: give --languages or --lines FILE");
                return ExitCodes.Usage;
            }
            var segmenter = LoadSegmenter();
            if (segmenter is null) return ExitCodes.InputsRejected;
            if (parseResult.GetValue(languages))
                foreach (var code in segmenter.Languages) Console.WriteLine(code);
            if (file is null) return ExitCodes.Success;
            if (!file.Exists)
            {
                Console.Error.WriteLine($"switchtag langid: {file.FullName}: file not found");
                return ExitCodes.InputsRejected;
            }
            WriteLines(segmenter, File.ReadAllLines(file.FullName, Encoding.UTF8), Console.Out, parseResult.GetValue(json), parseResult.GetValue(eachLine));
            return ExitCodes.Success;
        });
        return command;
    }

    internal static CodeSwitchSegmenter? LoadSegmenter()
    {
        var path = ModelLocator.PathOf(ModelFile);
        try
        {
            return CodeSwitchSegmenter.Load(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InvalidDataException)
        {
            Console.Error.WriteLine($"switchtag: cannot load the language model {path}: {e.Message} (rebuild it with scripts/train-langid)");
            return null;
        }
    }

    public static void WriteLines(CodeSwitchSegmenter segmenter, IReadOnlyList<string> lines, TextWriter output, bool json, bool eachLineAlone = false)
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
