using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon;

namespace SwitchTag.Tagging.Sources.Organisations;

/// <summary>Organisations marked by a capitalised head word (the language profiles'
/// <c>organisations.txt</c>: School, Scuola, Fiação, Bracia, Brothers, Line...) with capitalised
/// words before it ("Saint Florian School", "Lewin Brothers") or after it ("Fiação Santa Rita",
/// "Scuola Elementare Regina Margherita", "Textil Ortiz y Hermanos"), small joining words allowed
/// inside. The whole run is one organisation, so its parts are not a saint, a queen or a town.
/// A head word alone, or one followed by lower-case words, is no cue; a capitalised function word
/// opening the sentence ("The Atlantic Star Line") is left out of the run, a title inside it
/// ("Saint Florian School", "Santa Rita") is not.</summary>
public sealed class OrganisationCueSource : INameSource
{
    public static readonly MentionSource Organisation = new("organisation-cue");

    private const int MaxWordsBefore = 4, MaxWords = 7;

    public MentionSource Source => Organisation;

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        var profiles = LanguageProfiles.Default;
        // Offsets only: a turn of millions of words folds just the few words a stop-word check needs.
        var words = NameWords.Bounds(turnText);
        var found = ImmutableArray.CreateBuilder<Mention>();
        for (int i = 0; i < words.Count; i++)
        {
            if (!Capitalised(turnText, words[i]) || !profiles.OrganisationHeads.Contains(Lower(turnText, words[i]))) continue;
            int first = i;
            while (first > 0 && i - first < MaxWordsBefore && Joined(turnText, words[first - 1], words[first])
                   && Capitalised(turnText, words[first - 1])
                   && !(profiles.StopWords.Contains(Folded(turnText, words[first - 1])) && TextPosition.IsSentenceStart(turnText, words[first - 1].Start)))
                first--;
            int last = i;
            for (int k = i; k + 1 < words.Count && k + 1 - first < MaxWords && Joined(turnText, words[k], words[k + 1]);)
            {
                k++;
                if (Capitalised(turnText, words[k])) last = k;
                else if (!profiles.OrganisationJoins.Contains(Lower(turnText, words[k]))) break;
            }
            if (first == i && last == i) continue;
            int start = words[first].Start, end = words[last].End;
            found.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(turnText.AsSpan(start, end - start)), NameLabel.ORG, SpanLanguage.At(spans, start), 1.0, Organisation));
            i = last;
        }
        return found.ToImmutable();
    }

    private static bool Capitalised(string text, (int Start, int End) word) => char.IsUpper(text[word.Start]);

    private static string Lower(string text, (int Start, int End) word) => text[word.Start..word.End].ToLowerInvariant();

    private static string Folded(string text, (int Start, int End) word) => NameFolding.Fold(text[word.Start..word.End]);

    /// <summary>One space, a hyphen ("Italo-Platense") or a plural possessive ("Emigrants' Aid").</summary>
    private static bool Joined(string text, (int Start, int End) left, (int Start, int End) right) =>
        text.AsSpan(left.End, right.Start - left.End) is " " or "-" or "\u00A0" or "' ";
}
