using SwitchTag.Core.Documents;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Tagging.Sources.Vetoes;

/// <summary>A mention that is, as a whole, a language name, nationality word, people, or a title or
/// kinship word alone ("Yiddish", "German", "Němci", "Tante"): never a place, person or organisation.
/// Multi-word names holding such a word ("New Jersey", "Jewish Quarter") are unaffected.</summary>
public sealed class NotPlaceWordVeto(NotPlaceWords words) : IMentionVeto
{
    public bool Vetoes(Mention mention, string turnText) => words.Contains(mention.Text);
}
