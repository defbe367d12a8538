using System.CommandLine;
using SwitchTag.Output;
using SwitchTag.Pipeline;
using SwitchTag.Store;

namespace SwitchTag.Cli;

/// <summary><c>switchtag index PATH... --out DIR</c>: the whole pipeline on every transcript, each
/// interview's outputs in <c>DIR/&lt;interview&gt;/</c>, and the collection index in DIR.</summary>
public static class IndexCommand
{
    /// <summary>What <c>index --help</c> adds below the options.</summary>
    public static string Epilogue =>
        $"Writes DIR/<interview>/ {string.Join(" ", OutputWriters.Default.InterviewFileNames)}\n" +
        $"and DIR/ {string.Join(" ", OutputWriters.Default.CollectionFileNames)} {CollectionStore.DefaultFileName}\n" +
        "(the collection store: every interview indexed into DIR across runs; unchanged ones are skipped).\n\n" +
        "Exit codes: 0 every input indexed; 1 some inputs rejected (each reported as file:line: error: reason,\nthe others still indexed; a link loop or a FIFO, device or socket skipped counts too); " +
        "2 usage error or a model that cannot be loaded.\n";

    public static Command Create()
    {
        var paths = new Argument<string[]>("PATH") { Description = "Transcript files or folders (walked for .vtt .srt .txt .md).", Arity = ArgumentArity.OneOrMore };
        UnknownOptions.RejectIn(paths);
        var output = new Option<string>("--out", "-o") { Description = "Output folder (created if missing).", Required = true, HelpName = "DIR" };
        var format = new Option<string?>("--format") { Description = "Force the input format instead of detecting it.", HelpName = "webvtt|srt|text|markdown" };
        var main = new Option<string?>("--main") { Description = "The interviews' main language, an ISO 639 code such as en (switchtag langid --languages lists them); chosen from the narrators' talk when absent.", HelpName = "CODE" };
        var names = new Option<string>("--names") { Description = "rules-only (authority list and gazetteer) or default (rules, then the name model).", DefaultValueFactory = _ => "default", HelpName = "default|rules-only" };
        var authority = new Option<string?>("--authority") { Description = "Authority list CSV (label,name,variants).", HelpName = "NAMES.csv" };
        var decisions = new Option<string?>("--decisions") { Description = "Reviewers' decisions CSV, as review.html exports it (see SCHEMA.md).", HelpName = "DECISIONS.csv" };
        var media = new Option<string?>("--media") { Description = "The recording, so each time in the report opens it at that second; {interview} stands for the interview's id.", HelpName = "URL" };
        var jobs = new Option<int>("--jobs", "-j") { Description = "Interviews indexed at once (default: one per core); the outputs are the same for any number.", HelpName = "N" };
        var force = new Option<bool>("--force") { Description = "Redo interviews the collection store holds unchanged." };
        var allowInside = new Option<bool>("--allow-out-inside-input") { Description = "Write into an --out that is an input folder or lies inside one (it is then never read as input)." };
        var prune = new Option<bool>("--prune") { Description = "Remove from the collection the interviews whose source file is gone." };
        var command = new Command("index", "Index people, places and organisations and list the stretches to translate.")
        {
            paths, output, format, main, names, authority, decisions, media, jobs, force, prune, allowInside,
        };
        command.SetAction(parse =>
        {
            var request = IndexRequest.From(parse.GetValue(paths) ?? [], parse.GetValue(output)!, parse.GetValue(format), parse.GetValue(main),
                parse.GetValue(names)!, parse.GetValue(authority), parse.GetValue(decisions), out string? usage, parse.GetValue(media), parse.GetValue(allowInside));
            if (request is null)
            {
                Console.Error.WriteLine($"switchtag index: {usage}");
                return ExitCodes.Usage;
            }
            if (parse.GetValue(jobs) < 0)
            {
                Console.Error.WriteLine("switchtag index: --jobs wants a positive number");
                return ExitCodes.Usage;
            }
            request = request.WithCollection(parse.GetValue(jobs), parse.GetValue(force), parse.GetValue(prune));
            try
            {
                return IndexRun.Execute(request, Console.Error, IndexProgress.Run) switch
                {
                    IndexRunResult.Indexed => ExitCodes.Success,
                    IndexRunResult.InputsRejected => ExitCodes.InputsRejected,
                    _ => ExitCodes.Usage,
                };
            }
            catch (Exception e) when (WriteGate.Stopped && e is OperationCanceledException or AggregateException)
            {
                // SIGINT/SIGTERM: the signal ends the process; say what was kept instead of a stack trace.
                Console.Error.WriteLine("switchtag index: stopped by a signal; interviews finished before it are kept, nothing half-written is left");
                return ExitCodes.InputsRejected;
            }
        });
        return command;
    }
}
