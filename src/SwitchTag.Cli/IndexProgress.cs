using Spectre.Console;

namespace SwitchTag.Cli;

/// <summary>Runs the per-file work with a Spectre.Console progress bar on stderr when stderr is a
/// terminal, and silently otherwise (pipes, CI, tests).</summary>
public static class IndexProgress
{
    public static void Run(TextWriter log, IReadOnlyList<string> files, Action<string> work)
    {
        if (Console.IsErrorRedirected || !ReferenceEquals(log, Console.Error))
        {
            foreach (var f in files) work(f);
            return;
        }
        var console = AnsiConsole.Create(new AnsiConsoleSettings { Out = new AnsiConsoleOutput(Console.Error) });
        console.Progress().AutoClear(true).Start(ctx =>
        {
            var task = ctx.AddTask("indexing", maxValue: Math.Max(1, files.Count));
            foreach (var f in files)
            {
                task.Description = Markup.Escape(Path.GetFileName(f));
                work(f);
                task.Increment(1);
            }
        });
    }
}
