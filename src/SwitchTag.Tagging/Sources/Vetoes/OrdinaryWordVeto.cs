using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources.Vetoes;

/// <summary>A one-word place from the model that is an ordinary word of some language (written in
/// lower case in the language-ID training text: <see cref="NameCaution.CommonWord"/>) and stands at
/// the start of a sentence with no locative preposition before it: Portuguese "Nasci" (I was born)
/// is not Nazca. Capitalised mid-sentence, the model's place stands.</summary>
public sealed class OrdinaryWordVeto(Lexicon.Gazetteer gazetteer, PlacePrepositions prepositions) : IMentionVeto
{
    public bool Vetoes(Mention mention, string turnText) =>
        mention.Source == MentionSource.Model && mention.Label == NameLabel.LOC && !mention.Text.Any(char.IsWhiteSpace)
        && gazetteer.Cautions.GetValueOrDefault(NameFolding.Fold(mention.Text)).HasFlag(NameCaution.CommonWord)
        && TextPosition.IsSentenceStart(turnText, mention.CharStart)
        && !prepositions.Precedes(turnText, mention.CharStart);
}
