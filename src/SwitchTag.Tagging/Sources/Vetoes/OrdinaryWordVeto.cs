using SwitchTag.Core.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Tagging.Sources.Vetoes;

/// <summary>A one-word place that is an ordinary word of some language (written in lower case in the
/// language-ID training text: <see cref="NameCaution.CommonWord"/>) with nothing in its context
/// saying "place": no locative preposition right before it, and either a bare gazetteer match (no
/// case ending that made it place evidence, no model calling it anything) or a model place at the
/// start of a sentence (Portuguese "Nasci", I was born, is not Nazca).
/// Capitalised mid-sentence, the model's place stands.</summary>
public sealed class OrdinaryWordVeto(Lexicon.Gazetteer gazetteer, PlacePrepositions prepositions) : IMentionVeto
{
    public bool Vetoes(Mention mention, string turnText) =>
        mention.Label == NameLabel.LOC && !mention.Text.Any(char.IsWhiteSpace)
        && (mention.Source == MentionSource.Gazetteer
            || mention.Source == MentionSource.Model && TextPosition.IsSentenceStart(turnText, mention.CharStart))
        && !prepositions.Precedes(turnText, mention.CharStart)
        && gazetteer.Cautions.GetValueOrDefault(NameFolding.Fold(mention.Text)).HasFlag(NameCaution.CommonWord);
}
