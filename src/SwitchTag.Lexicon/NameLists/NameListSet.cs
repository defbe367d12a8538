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

    public static NameListSet Load(string lexiconDir)
    {
        var cues = PersonCues.Load(lexiconDir);
        var places = SpokenPlaces.Load(lexiconDir);
        // Read once: countries and continents are never "not a place", and continents are world regions.
        var territories = LexiconTsv.Rows(Path.Combine(lexiconDir, "territories.tsv")).Where(r => r.Length > 1).ToList();
        return new NameListSet(cues, NotPlaceWords.Load(lexiconDir, cues, places, territories), PlacePrepositions.Load(lexiconDir), NameVariants.Load(lexiconDir), places,
            FirstLevelRegions.Load(lexiconDir), WorldRegions.From(territories));
    }
}
