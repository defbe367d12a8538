using System.CommandLine;
using SwitchTag.Tagging;

namespace SwitchTag.Cli;

/// <summary><c>switchtag eval ner --gold FILE... [--json] [--lowercase]</c>: scores the shipped name
/// model on pre-tokenised gold files (DESIGN.md contract; format rules in <see cref="GoldReader"/>),
/// pooled and per source and language (<see cref="GoldFileLabel"/>).</summary>
public static class EvalNerCommand
{
    public static Command Create()
    {
        var gold = new Option<string[]>("--gold")
        {
            Description = "Gold files: IOB2 (Universal NER), CoNLL token ... tag, or NerKor CoNLL-U Plus",
            Required = true,
            AllowMultipleArgumentsPerToken = true,
        };
        var json = new Option<bool>("--json") { Description = "Print {\"micro\", \"PER\", \"LOC\", \"ORG\"} precision/recall/f1, then bySource and byLanguage, as JSON" };
        var lowercase = new Option<bool>("--lowercase") { Description = "Score lower-cased copies of the gold sentences" };
        var command = new Command("ner", "Score the name tagger on gold files (exact span match, conlleval rules).") { gold, json, lowercase };
        command.SetAction(parse => Run(parse.GetValue(gold) ?? [], parse.GetValue(json), Console.Out, Console.Error, parse.GetValue(lowercase)));
        return command;
    }

    public static int Run(IReadOnlyList<string> goldFiles, bool json, TextWriter output, TextWriter error, bool lowercase = false)
    {
        if (goldFiles.Count == 0)
        {
            error.WriteLine("switchtag eval ner: give at least one --gold FILE");
            return ExitCodes.Usage;
        }
        var problems = new List<string>();
        var files = new List<(GoldFileLabel, IReadOnlyList<GoldSentence>)>();
        int rejected = 0;
        foreach (var file in goldFiles)
        {
            if (!File.Exists(file)) { problems.Add($"{file}: no such file"); rejected++; continue; }
            var read = GoldReader.Read(file, problems);
            files.Add((GoldFileLabel.Of(file), lowercase ? [.. read.Select(NerEvaluation.LowerCased)] : read));
        }
        foreach (var p in problems) error.WriteLine($"switchtag eval ner: {p}");
        NerModel model;
        try
        {
            model = NerModel.Shared(ModelLocator.ModelsDirectory);
        }
        catch (Exception e) when (e is IOException or InvalidDataException or UnauthorizedAccessException or Microsoft.ML.OnnxRuntime.OnnxRuntimeException or System.Text.Json.JsonException or KeyNotFoundException)
        {
            error.WriteLine($"switchtag eval ner: cannot load the name model from {ModelLocator.ModelsDirectory}: {e.Message}");
            return ExitCodes.InputsRejected;
        }
        var report = NerEvaluation.Report(new SequenceTagger(model), files);
        output.WriteLine(json ? NerEvaluation.ToJson(report) : NerEvaluation.ToTable(report));
        return rejected > 0 ? ExitCodes.InputsRejected : ExitCodes.Success;
    }
}
