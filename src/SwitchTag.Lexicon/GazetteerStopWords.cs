using System.Collections.Frozen;

namespace SwitchTag.Lexicon;

/// <summary>Words that are places somewhere but are far more often something else when written
/// capitalised in running text: function words (capitalised in titles and at sentence start),
/// titles and kinship words before a person's name, God, and English month and day names. Folded
/// spellings, chosen by hand.</summary>
internal static class GazetteerStopWords
{
    public static FrozenSet<string> Words { get; } = new[]
    {
        // English function words and pronouns
        "the", "of", "and", "in", "on", "at", "to", "for", "by", "as", "is", "it", "he", "she", "we", "they",
        "you", "his", "her", "our", "but", "or", "if", "so", "no", "yes", "not", "all", "one", "two", "ten",
        "this", "that", "then", "there", "here", "when", "what", "who", "why", "how", "well", "also",
        "after", "before", "about", "over", "under", "into", "from", "with", "without", "some", "many", "much",
        // name particles and articles of European languages
        "van", "von", "de", "la", "le", "les", "el", "los", "las", "das", "der", "die", "den", "dem", "des",
        "und", "ein", "eine", "mit", "auf", "aus", "bei", "nach", "da", "du", "au", "en", "et", "il", "lo",
        "gli", "un", "une", "con", "per", "sur", "sous", "del", "della", "di", "do", "dos", "das", "y", "e",
        // Slavic prepositions and particles
        "na", "nad", "pod", "po", "za", "od", "we", "ze", "nie", "tak", "jak", "ale", "bez", "przy", "pri",
        "во", "на", "за", "по", "под", "над", "без", "при", "не", "да", "нет", "так", "как",
        // titles before a person's name
        "mr", "mrs", "ms", "dr", "sir", "lord", "lady", "pan", "pani", "herr", "frau", "madame", "monsieur",
        "saint", "san", "santa", "st", "don", "dona", "seu", "mister", "miss", "senhor", "senhora", "senor",
        "senora", "signor", "signora", "uncle", "aunt", "tante", "onkel", "bobe", "zayde",
        // God, in the narrators' exclamations ("thank God", "Gott sei Dank", "Boże")
        "god", "gott", "dios", "deus", "dio", "dieu", "bog", "boze", "бог", "боже",
        // English months and days (capitalised mid-sentence, and towns in several countries)
        "january", "february", "march", "april", "may", "june", "july", "august", "september", "october",
        "november", "december", "monday", "tuesday", "wednesday", "thursday", "friday", "saturday", "sunday",
    }.ToFrozenSet(StringComparer.Ordinal);
}
