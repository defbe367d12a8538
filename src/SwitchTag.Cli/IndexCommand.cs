using System.CommandLine;

namespace SwitchTag.Cli;

public static class IndexCommand
{
    public static Command Create()
    {
        var command = new Command("index", "(being built)");
        command.SetAction(_ => { Console.Error.WriteLine("switchtag index: not built yet"); return ExitCodes.Usage; });
        return command;
    }
}
