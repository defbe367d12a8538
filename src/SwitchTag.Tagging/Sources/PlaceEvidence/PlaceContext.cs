using SwitchTag.Core.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Tagging.Sources.PlaceEvidence;

/// <summary>Whether a gazetteer match's context says "place": a multi-word name matched whole ("New
/// Jersey", "Nowy Sącz"), a name right after a locative preposition ("w Tarnowie", "nach Wien"), or a
/// case ending on a town ("Krakowie": a form the gazetteer reaches only by inflection, of a place of
/// <see cref="TownPopulation"/> people or more, not opening a sentence: on the Universal NER and NorNE
/// dev files such a sentence-opening form was a place once in 15 times). A one-word listed first name naming no city of
/// <see cref="CityPopulation"/> is never supported by its context alone: Polish "z Hanką" is "with
/// Hanka", not "from Hanko" (but "to Milan" is Milano); nor is a word with a capitalised word right
/// after it ("do Jana Kowalskiego": a person's full name after the preposition), nor, by its case
/// ending alone, a word with a capitalised word right before it mid-sentence ("za Václava Koláře"). A case ending alone
/// does not make a place of a case form of a listed given name or short form: Czech "s Mílou" is
/// "with Míla", whatever city some language calls Mila.</summary>
public sealed class PlaceContext(Lexicon.Gazetteer gazetteer, PlacePrepositions prepositions, PersonCues cues, NameVariants variants)
{
    public const long TownPopulation = 50_000;
    public const long CityPopulation = 100_000;

    public bool Supports(Mention m, string turnText)
    {
        if (m.Text.Any(char.IsWhiteSpace)) return true;
        var candidates = gazetteer.Candidates(m.Text, m.Language);
        long largest = candidates.Count == 0 ? 0 : candidates[0].Place.Population;
        if (largest < CityPopulation && (cues.IsFirstName(NameFolding.Fold(m.Text)) || cues.IsFirstName(NameFolding.Stem(m.Text, m.Language)))) return false;
        if (FollowedByCapitalised(turnText, m.CharEnd)) return false;
        if (prepositions.Precedes(turnText, m.CharStart, m.Language)) return true;
        return candidates.Count > 0 && candidates.All(c => c.Kind == MatchKind.Inflected) && largest >= TownPopulation
            && !TextPosition.IsSentenceStart(turnText, m.CharStart) && !PrecededByCapitalised(turnText, m.CharStart)
            && !variants.KnowsGivenName(NameFolding.Stem(m.Text, m.Language));
    }

    /// <summary>A capitalised word right before, mid-sentence: a case form after it is the surname of a
    /// person's full name ("za Václava Koláře"), not a town reached by its ending.</summary>
    private static bool PrecededByCapitalised(string text, int start)
    {
        int end = start - 1;
        if (end < 1 || text[end] != ' ') return false;
        int from = end;
        while (from > 0 && char.IsLetter(text[from - 1])) from--;
        return from < end && char.IsUpper(text[from]) && !TextPosition.IsSentenceStart(text, from);
    }

    private static bool FollowedByCapitalised(string text, int end) =>
        end + 1 < text.Length && text[end] == ' ' && char.IsUpper(text[end + 1]);
}
