using System.Collections.Frozen;
using SwitchTag.Core.Languages;

namespace SwitchTag.Lexicon;

/// <summary>Words that are places somewhere but are far more often something else when written
/// capitalised in running text: the stop words and titles of every language profile
/// (SwitchTag.Core/Languages/*/stopwords.txt and titles.txt): function words (capitalised in titles
/// and at sentence start), titles and kinship words before a person's name, God, and English month
/// and day names. Folded spellings, chosen by hand.</summary>
internal static class GazetteerStopWords
{
    public static FrozenSet<string> Words => LanguageProfiles.Default.StopWords;
}
