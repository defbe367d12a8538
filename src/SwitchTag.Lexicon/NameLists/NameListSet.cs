using System.Collections.Frozen;

namespace SwitchTag.Lexicon.NameLists;

/// <summary>The name lists of models/lexicon the cascade reads (models/namelists.md), built once per
/// run: person cues, words that are never places, prepositions that mark
/// a place, person name variants, camps and historical regions whose spoken names a link would
/// rename, first-level regions the city gazetteer lacks, and continents. A missing folder gives empty lists: the
/// cascade then runs on the model and gazetteer alone.</summary>
public sealed record NameListSet(PersonCues Cues, NotPlaceWords NotPlaces, PlacePrepositions Prepositions, NameVariants Variants, SpokenPlaces Places,
    FirstLevelRegions Regions, WorldRegions WorldRegions)
{
    /// <summary>The folder inside models/.</summary>
    public const string FolderName = "lexicon";

    public static NameListSet Empty { get; } = new(PersonCues.Empty, NotPlaceWords.Empty, PlacePrepositions.Empty, NameVariants.Empty, SpokenPlaces.Empty, FirstLevelRegions.Empty, WorldRegions.Empty);

    /// <summary>Spelling keys (<see cref="NameVariants.Key"/>) of the first names listed only in Cyrillic,
    /// Greek or Hebrew script: the lists have "Оксана" and "Микола", a narrator's English says "Oksana"
    /// and "Mykola".</summary>
    public FrozenSet<string> RomanisedFirstNames { get; init; } = FrozenSet<string>.Empty;

    /// <summary>Whether a word is a listed first name as written (folded), or, written in Latin script,
    /// a romanisation of one listed in another script.</summary>
    public bool IsFirstName(string word)
    {
        if (Cues.IsFirstName(NameFolding.Fold(word))) return true;
        return RomanisedFirstNames.Count > 0 && word.All(c => c <= LastLatin) && RomanisedFirstNames.Contains(Variants.Key(word));
    }

    /// <summary>The sex the first-name lists give a given name ('f' or 'm'), as written or, in Latin
    /// script, romanised from another script's list; null when unknown or listed as both.</summary>
    public char? GivenNameSex(string word)
    {
        if (Cues.FirstNameSexes.TryGetValue(NameFolding.Fold(word), out var sex)) return sex;
        return RomanisedSexes.Count > 0 && word.All(c => c <= LastLatin) && RomanisedSexes.TryGetValue(Variants.Key(word), out sex) ? sex : null;
    }

    /// <summary>Spelling keys of the first names listed only in another script, with their sex, as
    /// <see cref="RomanisedFirstNames"/>; keys two names of different sexes share are left out.</summary>
    public FrozenDictionary<string, char> RomanisedSexes { get; init; } = FrozenDictionary<string, char>.Empty;

    /// <summary>Last code point of the Latin blocks (Latin Extended-B).</summary>
    private const char LastLatin = '\u024F';

    public static NameListSet Load(string lexiconDir)
    {
        var cues = PersonCues.Load(lexiconDir);
        var places = SpokenPlaces.Load(lexiconDir);
        var variants = NameVariants.Load(lexiconDir);
        // Read once: countries and continents are never "not a place", and continents are world regions.
        var territories = LexiconTsv.Rows(Path.Combine(lexiconDir, "territories.tsv")).Where(r => r.Length > 1).ToList();
        return new NameListSet(cues, NotPlaceWords.Load(lexiconDir, cues, places, territories), PlacePrepositions.Load(lexiconDir), variants, places,
            FirstLevelRegions.Load(lexiconDir), WorldRegions.From(territories))
        {
            RomanisedFirstNames = cues.FirstNames.Where(f => f.Any(c => c > LastLatin)).Select(variants.Key).ToFrozenSet(StringComparer.Ordinal),
            RomanisedSexes = cues.FirstNameSexes.Where(x => x.Key.Any(c => c > LastLatin))
                .GroupBy(x => variants.Key(x.Key), x => x.Value)
                .Where(g => g.Distinct().Count() == 1)
                .ToFrozenDictionary(g => g.Key, g => g.First(), StringComparer.Ordinal),
        };
    }
}
