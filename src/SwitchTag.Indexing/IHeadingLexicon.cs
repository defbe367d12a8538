using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Languages;

namespace SwitchTag.Indexing;

/// <summary>What heading building needs from the lexicon: a grouping key that folds spelling
/// variants, diacritics and inflections, the gazetteer places a name can mean (alternate names in
/// every language included), and how given names and surnames relate. Kept as an interface so
/// grouping is testable without the shipped files; the name-list members default to "nothing known".</summary>
public interface IHeadingLexicon
{
    string Key(string name, LanguageCode language);

    /// <summary>Every gazetteer place the name may denote; empty when the gazetteer does not know it.</summary>
    ImmutableArray<PlaceLink> Places(string name, LanguageCode language);

    /// <summary>The camp, ghetto, historical region or state the whole name denotes, whose own name a
    /// gazetteer link would replace; null when the name is none.</summary>
    ListedPlace? Listed(string name, LanguageCode language) => null;

    /// <summary>Whether the name is a continent or world region (Europe, South America): no town's part.</summary>
    bool IsWorldRegion(string name, LanguageCode language) => false;

    /// <summary>Whether a word is a listed first name of some language.</summary>
    bool IsFirstName(string word) => false;

    /// <summary>The sex a title gives the name after it ('f' for "Frau", "Mrs.", "paní"; 'm' for "Herr",
    /// "Mr.", "pan"), or null for no title or one of either sex ("Dr.").</summary>
    char? TitleSex(string word) => null;

    /// <summary>The sex the first-name lists give a given name, 'f' or 'm', or null when unknown or both.</summary>
    char? GivenNameSex(string word) => null;

    /// <summary>Whether the hypocoristics or equivalents lists know the word as a given name or one of
    /// its forms; they hold romanised forms ("Giorgos") the first-name lists have only in their own script.</summary>
    bool KnowsGivenName(string word) => false;

    /// <summary>A surname's spelling key: equal for Szwarc and Schwarz, Feigl and Feigel.</summary>
    string SurnameKey(string word, LanguageCode language) => Key(word, language);

    /// <summary>Whether two surnames can be one family's name, a woman's form beside the family form
    /// included (Nováková / Novák, Orlova / Orlov): weaker than equal surname keys.</summary>
    bool SameFamilyName(string a, LanguageCode languageA, string b, LanguageCode languageB) => SurnameKey(a, languageA) == SurnameKey(b, languageB);

    /// <summary>Whether one surname is the woman's form of the other (Novotná / Novotný, Hudecová /
    /// Hudec): said alone, the two are a wife or daughter and a husband or father, never one person.</summary>
    bool WomansAndMansForm(string a, string b) => false;

    /// <summary>Whether the text right before a name ends with a word that introduces a woman's birth
    /// name ("née", "geb.", "z domu").</summary>
    bool EndsWithBirthNameMarker(string before) => false;

    /// <summary>Whether a word is a kinship word of some language ("cousin", "ciocia", "Tante").</summary>
    bool IsKinshipWord(string word) => false;

    /// <summary>The relation a kinship word names ("father": parent, "brat": sibling), or null.</summary>
    string? KinshipRole(string word) => null;

    /// <summary>Whether a naming phrase stands right before a one-word name or just after it ("they
    /// called me Litsa", "Takis, we called him"): true when it names the speaker, false when the person
    /// said before, null when there is none.</summary>
    bool? NamingPhraseAround(string before, string after) => null;

    /// <summary>Whether the text before a name ends with a phrase saying the speaker went by that name
    /// ("I was Angela Georgiou"), and the text after it does not make it a possessive.</summary>
    bool SpeakerWentBy(string before, string after) => false;

    /// <summary>Whether the text before a name ends with a phrase giving that name to a new person
    /// ("we named"): a child named for a grandparent is another person.</summary>
    bool NamedBefore(string before) => false;

    /// <summary>Whether the text before a name ends with a phrase saying someone took that name ("she
    /// became", "Tibor became"): whether the phrase's subject is a pronoun, and its sex ('f', 'm');
    /// null when there is none.</summary>
    (bool Pronoun, char? Sex)? BecameBefore(string before, string after) => null;

    /// <summary>Whether one of the words speaks of a marriage ("married", "husband", "férjem").</summary>
    bool SpeaksOfMarriage(IEnumerable<string> words) => false;

    /// <summary>Whether two given names are one (equal keys), or diminutives of one full name (Irena /
    /// Irenko, Hanna / Hanka): certain evidence for a merge within one interview.</summary>
    bool SameGivenName(string a, LanguageCode languageA, string b, LanguageCode languageB) => Key(a, languageA) == Key(b, languageB);

    /// <summary>Bucket keys of a given name such that two names <see cref="SameGivenName"/> calls the same
    /// share a bucket (the first letters of their spelling keys, or a full name the lists give both), so
    /// a name is compared with a few candidates, not with every name of a long interview. The default,
    /// one bucket for all, compares every pair.</summary>
    IEnumerable<string> GivenNameBuckets(string name, LanguageCode language) => [""];

    /// <summary>Whether two given names are listed cross-language equivalents (Stanisław / Stanley):
    /// probable, not certain.</summary>
    bool EquivalentGivenNames(string a, string b) => false;
}

/// <summary>A place known by the name said, which a gazetteer link would rename: a site (camp, ghetto,
/// killing site) shown at the town it lies at or beside (<paramref name="At"/>, null when the gazetteer
/// lacks it), or a historical region or state (<paramref name="At"/> null) with the modern countries
/// holding it.</summary>
public sealed record ListedPlace(string Name, string Kind, bool IsSite, PlaceLink? At, ImmutableArray<string> Countries);

