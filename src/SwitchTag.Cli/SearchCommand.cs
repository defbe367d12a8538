using System.CommandLine;
using SwitchTag.Store;

namespace SwitchTag.Cli;

/// <summary><c>switchtag search QUERY --in DIR</c>: the options, made into a <see cref="SearchQuery"/>
/// and run by <see cref="SearchRun"/>. Exit code 0 with or without hits; 1 when the folder has no
/// store it can read; 2 for bad options.</summary>
public static class SearchCommand
{
    public static Command Create()
    {
        var query = new Argument<string?>("QUERY") { Description = "Words to find in headings, their variants and the turns' text (any case, accents, inflection).", Arity = ArgumentArity.ZeroOrOne };
        var folder = new Option<string>("--in") { Description = "The output folder of 'switchtag index' (holds the collection store).", Required = true };
        var label = new Option<string?>("--label") { Description = "Only mentions of PER, LOC or ORG headings." };
        var language = new Option<string?>("--language") { Description = "Only hits in this language (ISO 639 code)." };
        var speaker = new Option<string?>("--speaker") { Description = "Only hits in this speaker's turns." };
        var near = new Option<string?>("--near") { Description = "Only mentions of places within --km of this linked place." };
        var km = new Option<double?>("--km") { Description = "Radius for --near, in kilometres." };
        var json = new Option<bool>("--json") { Description = "One JSON object per hit and per line." };
        var command = new Command("search", "Search every interview indexed into an output folder.")
        {
            query, folder, label, language, speaker, near, km, json,
        };
        command.SetAction(parse =>
        {
            var request = SearchQuery.From(parse.GetValue(query) ?? "", parse.GetValue(label), parse.GetValue(language), parse.GetValue(speaker),
                parse.GetValue(near), parse.GetValue(km), out string? usage);
            if (request is null)
            {
                Console.Error.WriteLine($"switchtag search: {usage}");
                return ExitCodes.Usage;
            }
            return SearchRun.Execute(parse.GetValue(folder)!, request, parse.GetValue(json), Console.Out, Console.Error) == SearchRunResult.Searched
                ? ExitCodes.Success
                : ExitCodes.InputsRejected;
        });
        return command;
    }
}
