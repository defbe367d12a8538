using System.CommandLine;
using System.Globalization;
using SwitchTag.Core.Documents;
using SwitchTag.Store;

namespace SwitchTag.Cli;

/// <summary><c>switchtag search QUERY --in DIR</c>: searches the collection store of an output folder
/// (DESIGN.md contract: with <c>--json</c> one JSON object per hit and per line). Exit code 0 with or
/// without hits; 1 when the folder has no store; 2 for bad options.</summary>
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
            string text = parse.GetValue(query) ?? "";
            NameLabel? only = null;
            if (parse.GetValue(label) is { } l)
            {
                if (!Enum.TryParse<NameLabel>(l, ignoreCase: true, out var parsed) || !Enum.IsDefined(parsed)) return Usage($"--label wants PER, LOC or ORG, not \"{l}\"");
                only = parsed;
            }
            NearPlace? radius = null;
            if (parse.GetValue(near) is { } place)
            {
                if (parse.GetValue(km) is not { } r || r < 0 || double.IsNaN(r)) return Usage("--near wants --km N (a radius of zero or more)");
                radius = new NearPlace(place, r);
            }
            else if (parse.GetValue(km) is not null) return Usage("--km goes with --near PLACE");
            if (text.Trim().Length == 0 && radius is null) return Usage("give a QUERY, or --near PLACE --km N");

            string dir = parse.GetValue(folder)!;
            if (CollectionStore.FindFile(dir) is null)
            {
                Console.Error.WriteLine($"switchtag search: no collection store in {dir} (run 'switchtag index ... --out {dir}' first)");
                return ExitCodes.InputsRejected;
            }
            IReadOnlyList<SearchHit> hits;
            try
            {
                using var store = CollectionStore.Open(dir);
                hits = store.Search(new SearchQuery(text, only, parse.GetValue(language), parse.GetValue(speaker), radius));
            }
            catch (Exception e) when (e is Microsoft.Data.Sqlite.SqliteException or InvalidDataException)
            {
                Console.Error.WriteLine($"switchtag search: the collection store in {dir} cannot be read: {e.Message}");
                return ExitCodes.InputsRejected;
            }
            bool asJson = parse.GetValue(json);
            foreach (var hit in hits) Console.Out.WriteLine(asJson ? hit.ToJson() : hit.ToString());
            if (!asJson) Console.Error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{hits.Count} hits"));
            return ExitCodes.Success;
        });
        return command;
    }

    private static int Usage(string message)
    {
        Console.Error.WriteLine($"switchtag search: {message}");
        return ExitCodes.Usage;
    }
}
