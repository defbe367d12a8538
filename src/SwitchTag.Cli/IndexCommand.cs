using System.Collections.Immutable;
using System.CommandLine;
using SwitchTag.Core.Documents;
using SwitchTag.Indexing;
using SwitchTag.Tagging;

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
        var jobs = new Option<int>("--jobs", "-j") { Description = "Interviews indexed at once (default: all cores); outputs are the same for any number." };
        var force = new Option<bool>("--force") { Description = "Redo interviews the collection store holds unchanged." };
        var prune = new Option<bool>("--prune") { Description = "Remove from the collection the interviews whose source file is gone." };
        var command = new Command("index", "Index people, places and organisations and list the stretches to translate.")
        {
            paths, output, format, main, names, authority, decisions, jobs, force, prune,
        };
        command.SetAction(parse =>
        {
            var options = IndexOptions.From(parse.GetValue(paths) ?? [], parse.GetValue(output)!, parse.GetValue(format), parse.GetValue(main),
                parse.GetValue(names)!, parse.GetValue(authority), parse.GetValue(decisions), out string? usage);
            if (options is null)
            {
                Console.Error.WriteLine($"switchtag index: {usage}");
                return ExitCodes.Usage;
            }
            if (parse.GetValue(jobs) < 0)
            {
                Console.Error.WriteLine("switchtag index: --jobs wants a positive number");
                return ExitCodes.Usage;
            }
            return IndexRun.Execute(options with { Jobs = parse.GetValue(jobs), Force = parse.GetValue(force), Prune = parse.GetValue(prune) }, Console.Error);
        });
        return command;
    }
}

/// <summary>The checked options of one index run.</summary>
public sealed record IndexOptions(
    ImmutableArray<string> Paths,
    string OutDir,
    TranscriptFormat? Format,
    string? MainLanguage,
    TaggingMode Names,
    string? AuthorityPath,
    ImmutableArray<Decision> Decisions,
    ImmutableArray<Diagnostic> DecisionProblems,
    int Jobs = 0,
    bool Force = false,
    bool Prune = false)
{
    public static IndexOptions? From(string[] paths, string outDir, string? format, string? main, string names,
        string? authority, string? decisions, out string? usage)
    {
        usage = null;
        TranscriptFormat? forced = null;
        if (format is not null)
        {
            if (!TranscriptFormatNames.TryParse(format, out var f)) { usage = $"unknown --format \"{format}\" (webvtt, srt, text or markdown)"; return null; }
            forced = f;
        }
        TaggingMode mode;
        switch (names)
        {
            case "rules-only": mode = TaggingMode.RulesOnly; break;
            case "default": mode = TaggingMode.RulesThenModel; break;
            default: usage = $"unknown --names \"{names}\" (rules-only or default)"; return null;
        }
        if (main is not null && (main.Length is < 2 or > 3 || !main.All(char.IsAsciiLetterLower)))
        {
            usage = $"--main wants an ISO 639 code such as en or pl, not \"{main}\"";
            return null;
        }
        if (authority is not null && !File.Exists(authority)) { usage = $"--authority: no such file {authority}"; return null; }
        ImmutableArray<Decision> list = [];
        ImmutableArray<Diagnostic> problems = [];
        if (decisions is not null)
        {
            if (!File.Exists(decisions)) { usage = $"--decisions: no such file {decisions}"; return null; }
            (list, problems) = DecisionsFile.Read(decisions);
        }
        if (File.Exists(outDir)) { usage = $"--out {outDir} is a file, not a folder"; return null; }
        return new IndexOptions([.. paths], outDir, forced, main, mode, authority, list, problems);
    }
}
