using System.CommandLine;
using SwitchTag.Pipeline;

namespace SwitchTag.Cli;

/// <summary><c>switchtag eval langid --dir DIR [--json]</c>: accuracy of whole-line identification on
/// DIR/&lt;code&gt;.txt (one text per line); files for unsupported codes are listed as skipped.</summary>
public static class EvalLangIdCommand
{
    public static Command Create()
    {
        var dir = new Option<DirectoryInfo>("--dir") { Description = "Folder of <code>.txt files, one text per line.", Required = true, HelpName = "DIR" };
        var json = new Option<bool>("--json") { Description = "Print {\"mean\", \"languages\": {code: {accuracy, n}}, \"skipped\"}." };
        var command = new Command("langid", "Score language identification on DIR/<code>.txt files.") { dir, json };
        command.SetAction(parseResult =>
        {
            var folder = parseResult.GetValue(dir)!;
            if (!folder.Exists)
            {
                Console.Error.WriteLine($"switchtag eval langid: {folder.FullName}: folder not found");
                return ExitCodes.InputsRejected;
            }
            var segmenter = LangIdCommand.LoadSegmenter();
            if (segmenter is null) return ExitCodes.InputsRejected;
            var result = LanguageIdEvaluation.Evaluate(segmenter, folder.FullName);
            Console.WriteLine(parseResult.GetValue(json) ? LanguageIdEvaluation.ToJson(result) : LanguageIdEvaluation.ToText(result));
            return ExitCodes.Success;
        });
        return command;
    }
}
