using SwitchTag.Core.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Tagging.Sources.Vetoes;

/// <summary>A one-word place with nothing in its context saying "place" (no locative preposition
/// right before it), found either as a bare gazetteer match (no case ending that made it place
/// evidence, no model calling it anything) or as a model place at the start of a sentence, where
/// every word is capitalised. It is dropped when it is an ordinary word of some language (written in
/// lower case in the language-ID training text: <see cref="NameCaution.CommonWord"/>), or, for the
/// model's sentence-initial place, when the gazetteer meets it only through a case ending and never
/// as written (Portuguese "Nasci", I was born, read as an inflected "Nasca", is not Nazca; a word
/// that rare in the training text escapes the first test). Capitalised mid-sentence, the model's
/// place stands.</summary>
public sealed class OrdinaryWordVeto(Lexicon.Gazetteer gazetteer, PlacePrepositions prepositions) : IMentionVeto
{
    public bool Vetoes(Mention mention, string turnText)
    {
        if (mention.Label != NameLabel.LOC || mention.Text.Any(char.IsWhiteSpace) || prepositions.Precedes(turnText, mention.CharStart, mention.Language)) return false;
        bool sentenceStartModel = mention.Source == MentionSource.Model && TextPosition.IsSentenceStart(turnText, mention.CharStart);
        if (mention.Source != MentionSource.Gazetteer && !sentenceStartModel) return false;
        if (gazetteer.Cautions.GetValueOrDefault(NameFolding.Fold(mention.Text)).HasFlag(NameCaution.CommonWord)) return true;
        return sentenceStartModel && gazetteer.Candidates(mention.Text, mention.Language) is { Count: > 0 } found && found.All(c => c.Kind == MatchKind.Inflected);
    }
}
