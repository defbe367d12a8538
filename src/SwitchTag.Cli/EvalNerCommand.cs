using System.CommandLine;
using SwitchTag.Pipeline;

namespace SwitchTag.Cli;

/// <summary><c>switchtag eval ner --gold FILE... [--json] [--lowercase] [--per-as-loc]</c>: scores the
/// shipped name model on pre-tokenised gold files, pooled and per source and language
/// (<see cref="NameModelEvaluation"/>), or counts persons tagged as places (<see cref="PersonAsPlaceEvaluation"/>).</summary>
public static class EvalNerCommand
{
    public static Command Create()
    {
        var gold = new Option<string[]>("--gold")
        {
            Description = "Gold files: IOB2 (Universal NER), CoNLL token ... tag, or NerKor CoNLL-U Plus",
            Required = true,
            AllowMultipleArgumentsPerToken = true,
            HelpName = "FILE",
        };
        var json = new Option<bool>("--json") { Description = "Print {\"micro\", \"PER\", \"LOC\", \"ORG\"} precision/recall/f1, then bySource and byLanguage, as JSON" };
        var lowercase = new Option<bool>("--lowercase") { Description = "Score lower-cased copies of the gold sentences" };
        var personAsPlace = new Option<bool>("--per-as-loc")
        {
            Description = "Instead of scores, count gold person tokens tagged inside a place, by the shipped name cascade and by the plain model-over-gazetteer order",
        };
        var command = new Command("ner", "Score the name tagger on gold files (exact span match, conlleval rules).") { gold, json, lowercase, personAsPlace };
        command.SetAction(parse => (parse.GetValue(personAsPlace)
            ? PersonAsPlaceEvaluation.Run(parse.GetValue(gold) ?? [], Console.Out, Console.Error)
            : NameModelEvaluation.Run(parse.GetValue(gold) ?? [], parse.GetValue(json), Console.Out, Console.Error, lowercase: parse.GetValue(lowercase))) switch
        {
            NameEvaluationResult.Scored => ExitCodes.Success,
            NameEvaluationResult.NoInput => ExitCodes.Usage,
            _ => ExitCodes.InputsRejected,
        });
        return command;
    }
}
