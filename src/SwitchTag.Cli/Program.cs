using System.CommandLine;
using SwitchTag.Cli;

// Large native blocks go back to the system when freed (NativeHeap).
NativeHeap.ReturnLargeBlocks();

// Exit codes (DESIGN.md): 0 success, 1 some inputs rejected, 2 usage error.
var root = new RootCommand("SwitchTag: index people, places and organisations in multilingual interview transcripts, offline.");
var index = IndexCommand.Create();
root.Subcommands.Add(index);
root.Subcommands.Add(LangIdCommand.Create());
root.Subcommands.Add(SearchCommand.Create());
root.Subcommands.Add(new Command("eval", "Score the shipped models against gold data.")
{
    EvalNerCommand.Create(),
    EvalLangIdCommand.Create(),
});

HelpEpilogues.Attach(root, new Dictionary<Command, string> { [index] = IndexCommand.Epilogue });

// A bare call is someone finding out what the command does: show the help, not an error.
if (args.Length == 0) return root.Parse(["--help"]).Invoke();

var parsed = root.Parse(args);
if (parsed.Errors.Count > 0 && !args.Any(a => a is "-h" or "--help" or "-?"))
{
    foreach (var error in parsed.Errors)
        Console.Error.WriteLine($"switchtag: {error.Message}");
    Console.Error.WriteLine("Run 'switchtag --help' for usage.");
    return ExitCodes.Usage;
}
return parsed.Invoke();
