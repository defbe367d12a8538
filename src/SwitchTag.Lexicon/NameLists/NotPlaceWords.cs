using System.Collections.Frozen;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>Words that name no place and no person whatever a tagger says: language names (CLDR),
/// nationality adjectives (i18n-nationality), the peoples, faiths and groups marked <c>never</c>, and
/// titles and kinship words standing alone ("Tante", "Тато"). Folded, every language at once, since an
/// interview mixes them ("Yiddish" in Polish talk). Peoples marked <c>also-place</c> (Polish "Niemcy",
/// Germany) are left out: there the context decides. So are the names of territories (CLDR) and of
/// listed historical regions and states: a language name of one language that is a place name in
/// another (Finnish "galicia", the Galician language) is a place.</summary>
public sealed record NotPlaceWords(FrozenSet<string> Words)
{
    public static NotPlaceWords Empty { get; } = new(FrozenSet<string>.Empty);

    /// <summary>Whether the whole name (folded words) is one of the words.</summary>
    public bool Contains(string name) => Words.Contains(NameFolding.FoldedWords(name));

    internal static NotPlaceWords Load(string lexiconDir, PersonCues cues, SpokenPlaces places, IEnumerable<string[]> territories)
    {
        var words = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (_, folder) in LexiconTsv.Languages(lexiconDir))
        {
            words.UnionWith(LexiconTsv.Rows(Path.Combine(folder, "language-names.tsv")).Select(r => NameFolding.FoldedWords(r[0])));
            words.UnionWith(LexiconTsv.Rows(Path.Combine(folder, "nationalities.tsv")).Select(r => NameFolding.FoldedWords(r[0])));
            words.UnionWith(LexiconTsv.Rows(Path.Combine(folder, "peoples.tsv"))
                .Where(r => r.Length > 1 && r[1].Trim() == "never").Select(r => NameFolding.FoldedWords(r[0])));
        }
        words.UnionWith(cues.Titles.Select(NameFolding.FoldedWords));
        words.UnionWith(cues.Kinship.Select(NameFolding.FoldedWords));
        words.ExceptWith(places.Names);
        words.ExceptWith(territories.SelectMany(r => LexiconTsv.Alternatives(r[1])).Select(NameFolding.FoldedWords));
        words.Remove("");
        return new NotPlaceWords(words.ToFrozenSet(StringComparer.Ordinal));
    }
}
