using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources.Cues;

/// <summary>Persons marked by a title or a kinship word right before their name ("Mr. Roth", "pani
/// Hanka", "uncle Kurt", "Reb Yosl"): the capitalised words after the marker (up to three, joined by
/// spaces or hyphens) are a person, whatever a gazetteer or model says of them. The marker itself is
/// left out of the span, so "Mister Hnatyuk" joins the heading of Mykola Hnatyuk. A marker that
/// starts a multi-word place name ("Prince Edward Island", "General Santos") is no marker.
/// A given name followed by a patronymic (the language profiles' <c>patronymics.txt</c>: "Lidiya
/// Petrovna", "Иван Петрович"), with a capitalised surname after it when there is one, is a person too;
/// so is a name set off by commas after a kinship word ("My mother, Assunta, she made the bread"),
/// unless the gazetteer reaches over it (a list of towns after "my father,") and it is no listed
/// first name said alone ("My mother, Sofia, was from Kavala").</summary>
public sealed class PersonCueSource(PersonCues cues, NotPlaceWords notPlaces, Lexicon.Gazetteer gazetteer, NameVariants? variants = null) : INameSource
{
    private readonly NameVariants _variants = variants ?? NameVariants.Empty;

    private const int MaxNameWords = 3;

    public MentionSource Source => MentionSource.Cue;

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        // Offsets only: a turn of millions of words folds just the capitalised words a check needs.
        var words = NameWords.Bounds(turnText);
        var found = ImmutableArray.CreateBuilder<Mention>();
        RangeReach? places = null;
        for (int i = 0; i + 1 < words.Count; i++)
        {
            if (!cues.IsMarker(WordAt(turnText, words[i]))) continue;
            int first = i + 1;
            while (first < words.Count && cues.IsMarker(WordAt(turnText, words[first])) && Joined(turnText, words[first - 1], words[first], Abbreviation(turnText, words[first - 1]))) first++;
            if (first >= words.Count || !Joined(turnText, words[first - 1], words[first], Abbreviation(turnText, words[first - 1]))) continue;
            int last = NameEnd(turnText, words, first, afterTitle: !cues.IsKinship(WordAt(turnText, words[first - 1])));
            if (last < 0) continue;
            // The span starts at the name's first word, a leading particle included ("Herr von Braun").
            places ??= new RangeReach(RuleMatching.Find(turn, turnText, spans, gazetteer.Find).Select(p => (p.CharStart, p.CharEnd)));
            // A place holding the marker and reaching past it ("Prince Edward Island").
            if (places.Reaches(words[i].Start, words[i].End)) continue;
            if (first == last && InflectedTown(words[first], turnText, spans)) continue;
            int start = words[first].Start, end = words[last].End;
            found.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(turnText.AsSpan(start, end - start)), NameLabel.PER, SpanLanguage.At(spans, start), 1.0, MentionSource.Cue));
            i = last;
        }
        for (int i = 0; i + 1 < words.Count; i++)
        {
            if (!cues.IsKinship(WordAt(turnText, words[i])) || turnText.AsSpan(words[i].End, words[i + 1].Start - words[i].End) is not ", "
                || !IsNameWord(turnText, words[i + 1])) continue;
            int first = i + 1, last = first;
            while (last + 1 < words.Count && last + 1 - first < MaxNameWords && Joined(turnText, words[last], words[last + 1], allowDot: false)
                   && IsNameWord(turnText, words[last + 1]))
                last++;
            int start = words[first].Start, end = words[last].End;
            if (!ClosesApposition(turnText, end) || found.Any(m => m.CharStart < end && start < m.CharEnd)) continue;
            places ??= new RangeReach(RuleMatching.Find(turn, turnText, spans, gazetteer.Find).Select(p => (p.CharStart, p.CharEnd)));
            if (places.Overlaps(start, end) && !(FirstName(turnText, words[first]) && !ListGoesOn(turnText, words, last))) continue;
            if (first == last && InflectedTown(words[first], turnText, spans)) continue;
            found.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(turnText.AsSpan(start, end - start)), NameLabel.PER, SpanLanguage.At(spans, start), 1.0, MentionSource.Cue));
            i = last;
        }
        for (int i = 0; i + 1 < words.Count; i++)
        {
            if (!IsNameWord(turnText, words[i]) || !Joined(turnText, words[i], words[i + 1], allowDot: false) || !IsPatronymic(turnText, words[i + 1])) continue;
            int last = i + 1;
            if (last + 1 < words.Count && Joined(turnText, words[last], words[last + 1], allowDot: false) && IsNameWord(turnText, words[last + 1])) last++;
            int start = words[i].Start, end = words[last].End;
            if (found.Any(m => m.CharStart < end && start < m.CharEnd)) continue;
            found.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(turnText.AsSpan(start, end - start)), NameLabel.PER, SpanLanguage.At(spans, start), 1.0, MentionSource.Cue));
            i = last;
        }
        return found.ToImmutable();
    }

    /// <summary>The last word of the name starting at <paramref name="first"/> after a marker: up to
    /// <see cref="MaxNameWords"/> capitalised words, with name particles of two letters or more before
    /// or between them ("Mrs. Van den Berg", "Herr von Braun"); -1 when no capitalised word comes.
    /// One-letter particles (e, i, y) are also the word "and", so they never join a name here. After a
    /// title, a people's or language's name is a surname ("Dr. Berliner", "Frau Deutsch", "Pan Polak");
    /// after a kinship word it is not ("my uncle, Polish by birth").</summary>
    private int NameEnd(string text, IReadOnlyList<(int Start, int End)> words, int first, bool afterTitle)
    {
        int last = -1, names = 0;
        for (int k = first; k < words.Count && names < MaxNameWords; k++)
        {
            if (k > first && !Joined(text, words[k - 1], words[k], allowDot: false)) break;
            var word = WordAt(text, words[k]);
            if (cues.IsMarker(word) && k > first) break;
            if (IsNameWord(text, words[k]) || (afterTitle && IsSurnameAfterTitle(text, words[k]))) { last = k; names++; }
            else if (!(word.Length > 1 && LanguageProfiles.Default.NameParticles.Contains(word.ToLowerInvariant()))) break;
        }
        return last;
    }

    /// <summary>A listed first name ("My mother, Sofia, was from Kavala"): a person, though a city has the name.</summary>
    private bool FirstName(string text, (int Start, int End) word) => cues.IsFirstName(NameFolding.Fold(WordAt(text, word)));

    /// <summary>Another capitalised word after a comma: a list ("my father, Sofia, Varna, everywhere"), not an apposition.</summary>
    private static bool ListGoesOn(string text, IReadOnlyList<(int Start, int End)> words, int last) =>
        last + 1 < words.Count && text.AsSpan(words[last].End, words[last + 1].Start - words[last].End) is ", " && char.IsUpper(text[words[last + 1].Start]);

    /// <summary>A name in apposition ends the clause part: a comma, a full stop, a colon or the end of
    /// the turn right after it ("My mother, Assunta, she made the bread").</summary>
    private static bool ClosesApposition(string text, int end) =>
        end == text.Length || text[end] is ',' or '.' or ';' or ':' or '!' or '?';

    private static bool IsPatronymic(string text, (int Start, int End) word) =>
        char.IsUpper(text[word.Start]) && LanguageProfiles.Default.IsPatronymic(text.AsSpan(word.Start, word.End - word.Start));

    private bool IsNameWord(string text, (int Start, int End) word) =>
        char.IsUpper(text[word.Start]) && word.End - word.Start > 1 && !notPlaces.Words.Contains(NameFolding.Fold(WordAt(text, word)));

    /// <summary>A capitalised word of two letters or more that is no title or kinship word: people's
    /// and language names are surnames too.</summary>
    private bool IsSurnameAfterTitle(string text, (int Start, int End) word) =>
        char.IsUpper(text[word.Start]) && word.End - word.Start > 1 && !cues.IsMarker(WordAt(text, word));

    /// <summary>A title short enough to be an abbreviation ("Mr.", "Dr.", "ks."): only then may a dot
    /// stand between marker and name; after "my brother." a new sentence begins.</summary>
    private bool Abbreviation(string text, (int Start, int End) marker) => cues.IsAbbreviation(WordAt(text, marker));

    private static string WordAt(string text, (int Start, int End) word) => text[word.Start..word.End];

    /// <summary>A case form of a town ("nagyapám Debrecenbe költözött": my grandfather moved to
    /// Debrecen): the kinship word there is the subject, not a mark on the name. A listed given name or
    /// short form is the name the kinship word marks ("ciocia Rózia", whatever town "Rózia" inflects).</summary>
    private bool InflectedTown((int Start, int End) word, string text, ImmutableArray<LanguageSpan> spans)
    {
        var language = SpanLanguage.At(spans, word.Start);
        var said = WordAt(text, word);
        if (FirstName(text, word) || _variants.KnowsGivenName(said) || _variants.KnowsGivenName(NameFolding.Stem(said, language))) return false;
        var candidates = gazetteer.Candidates(said, language);
        return candidates.Count > 0 && candidates.All(c => c.Kind == MatchKind.Inflected)
            && candidates[0].Place.Population >= Lexicon.Gazetteer.VillagePopulation;
    }

    /// <summary>One space or hyphen between the words; after an abbreviated title also "Mr. Roth".</summary>
    private static bool Joined(string text, (int Start, int End) left, (int Start, int End) right, bool allowDot)
    {
        var gap = text.AsSpan(left.End, right.Start - left.End);
        return gap is " " or "-" or "\u00A0" || (allowDot && gap is ". ");
    }
}
