using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Tagging.Sources.PlaceEvidence;

namespace SwitchTag.Tagging.Sources.Vetoes;

/// <summary>A bare gazetteer match (one word, no locative preposition before it, the model silent on
/// it) is kept only for a city of <see cref="PlaceContext.CityPopulation"/> people or more, said
/// mid-sentence by one of its names: a case form the context did not support as a place (Czech "s
/// Mílou", with Míla) is not one.
/// A capitalised word at a sentence start is no evidence of a name, and mid-sentence a small town's
/// name is more often someone's surname or an ordinary word: on the Universal NER and NorNE dev
/// files (`switchtag eval ner --per-as-loc` with the matches printed, 3 December) such matches were
/// places 5 times in 72 at a sentence start and 19 times in 79 mid-sentence for towns under 100,000
/// people (17 of them gold persons), against 25 in 46 for larger places.</summary>
public sealed class BarePlaceVeto(Lexicon.Gazetteer gazetteer, PlacePrepositions prepositions) : IMentionVeto
{
    public bool Vetoes(Mention mention, string turnText)
    {
        if (mention.Source != MentionSource.Gazetteer || mention.Label != NameLabel.LOC || prepositions.Precedes(turnText, mention.CharStart, mention.Language)) return false;
        if (TextPosition.IsSentenceStart(turnText, mention.CharStart)) return true;
        var candidates = gazetteer.Candidates(mention.Text, mention.Language);
        return candidates.Count == 0 || candidates.Max(c => c.Place.Population) < PlaceContext.CityPopulation
            || candidates.All(c => c.Kind == MatchKind.Inflected);
    }
}
