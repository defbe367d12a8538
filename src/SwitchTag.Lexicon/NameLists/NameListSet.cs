namespace SwitchTag.Lexicon.NameLists;

/// <summary>The name lists of models/lexicon the cascade reads (models/namelists.md), built once per
/// run: person cues, words that are never places, prepositions that mark
/// a place, and person name variants. A missing folder gives empty lists: the cascade then runs on the model and
/// gazetteer alone.</summary>
public sealed record NameListSet(PersonCues Cues, NotPlaceWords NotPlaces, PlacePrepositions Prepositions, NameVariants Variants)
{
    /// <summary>The folder inside models/.</summary>
    public const string FolderName = "lexicon";

    public static NameListSet Empty { get; } = new(PersonCues.Empty, NotPlaceWords.Empty, PlacePrepositions.Empty, NameVariants.Empty);

    public static NameListSet Load(string lexiconDir)
    {
        var cues = PersonCues.Load(lexiconDir);
        return new NameListSet(cues, NotPlaceWords.Load(lexiconDir, cues), PlacePrepositions.Load(lexiconDir), NameVariants.Load(lexiconDir));
    }
}
