using System.CommandLine;

namespace SwitchTag.Cli;

public static class EvalLangIdCommand
{
    public static Command Create()
    {
        var command = new Command("langid", "(being built)");
        command.SetAction(_ => { Console.Error.WriteLine("switchtag langid: not built yet"); return ExitCodes.Usage; });
        return command;
    }
}
