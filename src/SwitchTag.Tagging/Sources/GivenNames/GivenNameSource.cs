using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Tagging.Sources.GivenNames;

/// <summary>One-word persons the model misses: a capitalised word that the name lists know as a given
/// name or one of its short forms, a case form of one included ("Staś", "Stasiem", "Beto", "Malke"),
/// said alone. It is proposed only where little else can be meant: not an ordinary word of the span's
/// language (<see cref="PersonCues.IsOrdinaryWord"/>: "Will", Spanish "Rosario"), no stop word, month,
/// title, kinship word, people's or language's name, no word beside another capitalised one (the model
/// reads whole names), no full name after a locative preposition ("na Kazimierzu": a district; a short
/// form there is a person: "ze Stasiem"), and not in
/// German or Luxembourgish talk, where every noun is capitalised. It ranks below the model and above
/// the bare gazetteer (a listed first name the gazetteer also has as a village is far more often the
/// person: "Roza, really"), so a place the sentence supports or a label the model gave stands; its
/// confidence says it is the weakest person evidence.</summary>
public sealed class GivenNameSource(PersonCues cues, NotPlaceWords notPlaces, NameVariants variants, PlacePrepositions prepositions) : INameSource
{
    public const double Confidence = 0.6;
    private const int MinLetters = 3;
    private static readonly LanguageCode German = new("de"), Luxembourgish = new("lb");

    public MentionSource Source => MentionSource.GivenName;

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        var words = NameWords.Bounds(turnText);
        var found = ImmutableArray.CreateBuilder<Mention>();
        for (int i = 0; i < words.Count; i++)
        {
            var (start, end) = words[i];
            if (end - start < MinLetters || !char.IsUpper(turnText[start])) continue;
            var word = turnText.AsSpan(start, end - start);
            if (!AllLetters(word)) continue;
            var language = SpanLanguage.At(spans, start);
            if (language == German || language == Luxembourgish) continue;
            if (i > 0 && NamesBeside(turnText, words[i - 1], words[i])) continue;
            if (i + 1 < words.Count && NamesBeside(turnText, words[i + 1], words[i])) continue;
            if (!IsGivenName(word.ToString(), language, afterPreposition: prepositions.Precedes(turnText, start, language))) continue;
            found.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(word), NameLabel.PER, language, Confidence, MentionSource.GivenName));
        }
        return found.ToImmutable();
    }

    /// <summary>A listed given name or short form, as said or with a case ending of the span's language
    /// stripped, that is no ordinary word there and no other kind of capitalised word. After a locative
    /// preposition only a short form of family talk counts ("ze Stasiem", with Staś): a full name there may
    /// be a district or church named after a person ("na Kazimierzu").</summary>
    private bool IsGivenName(string word, LanguageCode language, bool afterPreposition)
    {
        var folded = NameFolding.Fold(word);
        if (LanguageProfiles.Default.StopWords.Contains(folded) || notPlaces.Words.Contains(folded) || cues.IsMarker(word)
            || cues.IsOrdinaryWord(folded, language))
            return false;
        var stem = NameFolding.Stem(word, language);
        bool stemCounts = stem != folded && !cues.IsOrdinaryWord(stem, language);
        if (afterPreposition) return variants.ShortForms.Contains(folded) || stemCounts && variants.ShortForms.Contains(stem);
        return Listed(folded) || stemCounts && Listed(stem);
    }

    private bool Listed(string folded) => cues.IsFirstName(folded) || variants.ListedForms.Contains(folded);

    private static bool AllLetters(ReadOnlySpan<char> word)
    {
        foreach (char c in word)
            if (!char.IsLetter(c) && char.GetUnicodeCategory(c) != System.Globalization.UnicodeCategory.NonSpacingMark) return false;
        return true;
    }

    /// <summary>Whether <paramref name="other"/> is a capitalised word joined to the candidate by one
    /// space or hyphen that is no stop word: then the two may be one name ("Rosa Luxemburg", "Santa
    /// Maria"), which is the model's to read. A sentence-opening "There" or "And" is no name.</summary>
    private static bool NamesBeside(string text, (int Start, int End) other, (int Start, int End) candidate)
    {
        var (left, right) = other.Start < candidate.Start ? (other, candidate) : (candidate, other);
        var gap = text.AsSpan(left.End, right.Start - left.End);
        if (gap is not (" " or "-" or "\u00A0") || !char.IsUpper(text[other.Start])) return false;
        return !LanguageProfiles.Default.StopWords.Contains(NameFolding.Fold(text[other.Start..other.End]));
    }
}
