using System.CommandLine;
using System.CommandLine.Help;
using System.CommandLine.Invocation;

namespace SwitchTag.Cli;

/// <summary>Text printed after a command's generated help (what it writes, its exit codes), so the
/// one-line description in the parent's command list stays one line.</summary>
internal sealed class HelpEpilogues(HelpAction inner, IReadOnlyDictionary<Command, string> epilogues) : SynchronousCommandLineAction
{
    public static void Attach(RootCommand root, IReadOnlyDictionary<Command, string> epilogues)
    {
        var help = root.Options.OfType<HelpOption>().Single();
        help.Action = new HelpEpilogues((HelpAction)help.Action!, epilogues);
    }

    public override int Invoke(ParseResult parseResult)
    {
        int code = inner.Invoke(parseResult);
        if (epilogues.TryGetValue(parseResult.CommandResult.Command, out var text))
            parseResult.InvocationConfiguration.Output.WriteLine(text);
        return code;
    }
}
