using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;

namespace SwitchTag.Tagging.Sources.Regions;

/// <summary>First-level regions (states, voivodeships, provinces: models/lexicon/regions.tsv) said
/// with context that makes them places: the whole name of two or more capitalised words ("Minas
/// Gerais", "New South Wales"), or one word right after a locative preposition ("from Asturias",
/// "nach Bayern"); never a part of a longer capitalised name ("to South America" is not the
/// Cameroonian region South, "New York City" not the state). Proposed as <see cref="MentionSource.PlaceEvidence"/>, like a gazetteer town in
/// such a context. The city gazetteer has no regions, so without this source only the model could
/// find them. Longest names first, non-overlapping; names are matched as written (folded), without
/// case endings.</summary>
public sealed class RegionSource(FirstLevelRegions regions, PlacePrepositions prepositions) : INameSource
{
    /// <summary>Longest region name tried, in words ("Provence-Alpes-Côte d'Azur" is four).</summary>
    private const int MaxWords = 5;

    public MentionSource Source => MentionSource.PlaceEvidence;

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText) || regions.ByName.Count == 0) return [];
        // Offsets only: folding every word of a long turn would be work and memory for nothing.
        var words = NameWords.Bounds(turnText);
        var found = ImmutableArray.CreateBuilder<Mention>();
        for (int i = 0; i < words.Count; i++)
        {
            if (!Capitalised(turnText, words[i])) continue;
            for (int j = Math.Min(words.Count, i + MaxWords) - 1; j >= i; j--)
            {
                if (!Capitalised(turnText, words[j]) || !Joined(turnText, words, i, j)) continue;
                int start = words[i].Start, end = words[j].End;
                if (j == i && !prepositions.Precedes(turnText, start)) continue;
                if (j + 1 < words.Count && Capitalised(turnText, words[j + 1]) && Joined(turnText, words, j, j + 1)) continue;
                if (regions.Find(SharedStrings.Of(turnText.AsSpan(start, end - start))).IsEmpty) continue;
                found.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(turnText.AsSpan(start, end - start)), NameLabel.LOC, SpanLanguage.At(spans.IsDefault ? [] : spans, start), 1.0, Source));
                i = j;
                break;
            }
        }
        return found.ToImmutable();
    }

    private static bool Capitalised(string text, (int Start, int End) w) => NameWords.StartsUpper(text.AsSpan(w.Start, w.End - w.Start));

    /// <summary>Words i..j form one name: only spaces or hyphens between them, no sentence break.</summary>
    private static bool Joined(string text, List<(int Start, int End)> words, int i, int j)
    {
        for (int k = i + 1; k <= j; k++)
            if (!NameWords.IsNameGap(text.AsSpan(words[k - 1].End, words[k].Start - words[k - 1].End))) return false;
        return true;
    }
}
