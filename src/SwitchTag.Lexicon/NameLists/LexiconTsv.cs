using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>Rows of a name-list file of models/lexicon (models/namelists.md): UTF-8, <c>#</c> header
/// lines, tab-separated cells, <c>|</c> between alternatives. A missing file has no rows.</summary>
internal static class LexiconTsv
{
    public static IEnumerable<string[]> Rows(string path)
    {
        if (!File.Exists(path)) yield break;
        foreach (var line in File.ReadLines(path))
        {
            if (line.Length == 0 || line[0] == '#') continue;
            yield return line.Split('\t');
        }
    }

    public static string[] Alternatives(string cell) => cell.Split('|', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);

    /// <summary>The language folders present (ISO 639-1 codes).</summary>
    public static IEnumerable<(LanguageCode Language, string Folder)> Languages(string lexiconDir)
    {
        var root = Path.Combine(lexiconDir, "Languages");
        if (!Directory.Exists(root)) yield break;
        foreach (var folder in Directory.GetDirectories(root).Order(StringComparer.Ordinal))
            yield return (new LanguageCode(Path.GetFileName(folder)), folder);
    }
}
