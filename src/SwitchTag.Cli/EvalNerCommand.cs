using System.CommandLine;

namespace SwitchTag.Cli;

public static class EvalNerCommand
{
    public static Command Create()
    {
        var command = new Command("ner", "(being built)");
        command.SetAction(_ => { Console.Error.WriteLine("switchtag ner: not built yet"); return ExitCodes.Usage; });
        return command;
    }
}
