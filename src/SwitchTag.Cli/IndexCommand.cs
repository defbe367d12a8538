using System.CommandLine;
using SwitchTag.Pipeline;

namespace SwitchTag.Cli;

/// <summary><c>switchtag index PATH... --out DIR</c>: the whole pipeline on every transcript, each
/// interview's outputs in <c>DIR/&lt;interview&gt;/</c>, and the collection index in DIR.</summary>
public static class IndexCommand
{
    public static Command Create()
    {
        var paths = new Argument<string[]>("PATH") { Description = "Transcript files or folders (walked for .vtt .srt .txt .md).", Arity = ArgumentArity.OneOrMore };
        var output = new Option<string>("--out", "-o") { Description = "Output folder.", Required = true };
        var format = new Option<string?>("--format") { Description = "Force the input format: webvtt, srt, text or markdown." };
        var main = new Option<string?>("--main") { Description = "The interviews' main language (ISO 639 code); detected when absent." };
        var names = new Option<string>("--names") { Description = "rules-only (authority list and gazetteer) or default (rules, then the name model).", DefaultValueFactory = _ => "default" };
        var authority = new Option<string?>("--authority") { Description = "Authority list CSV (label,name,variants)." };
        var decisions = new Option<string?>("--decisions") { Description = "Reviewers' decisions CSV (see SCHEMA.md)." };
        var command = new Command("index", "Index people, places and organisations and list the stretches to translate.")
        {
            paths, output, format, main, names, authority, decisions,
        };
        command.SetAction(parse =>
        {
            var request = IndexRequest.From(parse.GetValue(paths) ?? [], parse.GetValue(output)!, parse.GetValue(format), parse.GetValue(main),
                parse.GetValue(names)!, parse.GetValue(authority), parse.GetValue(decisions), out string? usage);
            if (request is null)
            {
                Console.Error.WriteLine($"switchtag index: {usage}");
                return ExitCodes.Usage;
            }
            return IndexRun.Execute(request, Console.Error, IndexProgress.Run) switch
            {
                IndexRunResult.Indexed => ExitCodes.Success,
                IndexRunResult.InputsRejected => ExitCodes.InputsRejected,
                _ => ExitCodes.Usage,
            };
        });
        return command;
    }
}
