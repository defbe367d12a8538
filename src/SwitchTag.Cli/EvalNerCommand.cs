using System.CommandLine;
using SwitchTag.Pipeline;

namespace SwitchTag.Cli;

/// <summary><c>switchtag eval ner --gold FILE... [--json]</c>: scores the shipped name model on
/// pre-tokenised gold files (<see cref="NameModelEvaluation"/>).</summary>
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
        var json = new Option<bool>("--json") { Description = "Print {\"micro\", \"PER\", \"LOC\", \"ORG\"} precision/recall/f1 as JSON" };
        var command = new Command("ner", "Score the name tagger on gold files (exact span match, conlleval rules).") { gold, json };
        command.SetAction(parse => NameModelEvaluation.Run(parse.GetValue(gold) ?? [], parse.GetValue(json), Console.Out, Console.Error) switch
        {
            NameEvaluationResult.Scored => ExitCodes.Success,
            NameEvaluationResult.NoInput => ExitCodes.Usage,
            _ => ExitCodes.InputsRejected,
        });
        return command;
    }
}
