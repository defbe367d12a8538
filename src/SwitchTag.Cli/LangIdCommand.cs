using System.CommandLine;
using System.Text;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.Pipeline;
using SwitchTag.Pipeline.Models;

namespace SwitchTag.Cli;

/// <summary><c>switchtag langid --languages</c> and <c>switchtag langid --lines FILE [--json]</c>
/// (DESIGN.md contract: one JSON object per input line, in order).</summary>
public static class LangIdCommand
{
    public static Command Create()
    {
        var languages = new Option<bool>("--languages") { Description = "Print the supported language codes, one per line." };
        var lines = new Option<FileInfo?>("--lines") { Description = "Identify every line of this UTF-8 file.", HelpName = "FILE" };
        var json = new Option<bool>("--json") { Description = "One JSON object per input line: language, confidence, spans." };
        var command = new Command("langid", "Identify the language of text, line by line, with switch points inside each line.")
        {
            languages, lines, json,
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
            LanguageIdLines.Write(segmenter, File.ReadLines(file.FullName, Encoding.UTF8), Console.Out, parseResult.GetValue(json));
            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>The shipped language model, or null after saying on stderr why it cannot be loaded.</summary>
    internal static CodeSwitchSegmenter? LoadSegmenter()
    {
        var segmenter = ShippedModels.LoadLanguageModel(ModelLocation.Default, null, out var error);
        if (segmenter is null) Console.Error.WriteLine($"switchtag: {error}");
        return segmenter;
    }
}
