using System.Collections.Immutable;
using System.Globalization;

namespace SwitchTag.Core.Languages;

/// <summary>The text formats of a profile folder: word lists one word a line, and
/// <c>stemming.txt</c> as <c>key: space-separated values</c> lines; <c>#</c> starts a comment line.</summary>
internal static class ProfileText
{
    public static LanguageProfile Parse(string code, string aliases, string stopWords, string titles, string particles, string stemming, string patronymics,
        string organisations, string demonyms, string hesitations, string tags, string loanwords, string interviewerLabels)
    {
        var org = KeyValues(code, "organisations.txt", organisations);
        return new(new LanguageCode(code), [.. Words(aliases).Select(a => new LanguageCode(a))], Words(stopWords), Words(titles), Words(particles),
            stemming.Length == 0 ? null : Stemming(code, stemming), Words(patronymics), org.GetValueOrDefault("heads", []), org.GetValueOrDefault("joins", []),
            Words(demonyms), Words(hesitations), Words(tags), Words(loanwords), Words(interviewerLabels));
    }

    private static Dictionary<string, ImmutableArray<string>> KeyValues(string code, string file, string text)
    {
        var keys = new Dictionary<string, ImmutableArray<string>>(StringComparer.Ordinal);
        foreach (var line in Lines(text))
        {
            int colon = line.IndexOf(':');
            if (colon <= 0) throw new InvalidDataException($"Languages/{code}/{file}: \"{line}\" is no key: values line");
            keys[line[..colon].Trim()] = [.. line[(colon + 1)..].Split(' ', StringSplitOptions.RemoveEmptyEntries)];
        }
        return keys;
    }

    private static IEnumerable<string> Lines(string text) =>
        text.Split('\n').Select(l => l.Trim()).Where(l => l.Length > 0 && !l.StartsWith('#'));

    private static ImmutableArray<string> Words(string text) => [.. Lines(text)];

    private static StemmingData Stemming(string code, string text)
    {
        var keys = KeyValues(code, "stemming.txt", text);
        ImmutableArray<string> Get(string key) => keys.GetValueOrDefault(key, []);
        var replacements = Get("replace").Select(r => r.Split('>') is [var from, var to] ? (from, to)
            : throw new InvalidDataException($"Languages/{code}/stemming.txt: replace wants from>to, not \"{r}\"")).ToImmutableArray();
        return new StemmingData(Get("endings"), Get("nominative"), replacements, Get("alternations"),
            Get("normalise").FirstOrDefault(), Get("allows").FirstOrDefault(),
            int.Parse(Get("fallback-rank").FirstOrDefault() ?? "0", CultureInfo.InvariantCulture));
    }
}
