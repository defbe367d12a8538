using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Ids;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;
using SwitchTag.Lexicon;

namespace SwitchTag.Tagging.Sources.Model;

/// <summary>Names the shipped model tags in the turn's words. Mentions in scripts the model never saw
/// in training are dropped (<see cref="TrainedScripts"/>). The model reads a whole turn (window by window, <see cref="SequenceTagger.SpansOf"/>) but
/// learnt from single sentences, so a span running over a sentence end ("Paco. Paco", "Stanley.
/// Stanley Kowalczyk") is cut there (<see cref="Pieces"/>).</summary>
public sealed class NameModelSource(NerModel model) : INameSource
{
    private readonly SequenceTagger _tagger = new(model);

    public MentionSource Source => MentionSource.Model;

    public ImmutableArray<Mention> Find(TurnId turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        var words = new TokenizedText(turnText);
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        foreach (var s in _tagger.SpansOf(words.Texts))
        {
            foreach (var (from, to) in Pieces(words, s.Start, s.End, turnText))
            {
                int start = words[from].Start, end = words[to - 1].End;
                if (!TrainedScripts.Covers(turnText.AsSpan(start, end - start))) continue;
                mentions.Add(new Mention(turn, new CharSpan(start, end), SharedStrings.Of(turnText.AsSpan(start, end - start)), s.Label, SpanLanguage.At(spans, start), s.Confidence, MentionSource.Model));
            }
        }
        return mentions.ToImmutable();
    }

    /// <summary>The word ranges of a tagged span, cut before every word that opens a sentence
    /// (<see cref="TextPosition.IsSentenceStart"/>) unless the break is a dot after a short capitalised
    /// word (St. Louis, Dr. Roth), with punctuation at either edge of a piece dropped ("Hanna." is Hanna).
    /// A piece that is one stop word or title of any language ("I", "God", "Pani") is no name, and a
    /// one-letter stop word at its start is not part of it.</summary>
    public static IEnumerable<(int From, int To)> Pieces(IReadOnlyList<WordToken> words, int from, int to, string text)
    {
        int start = from;
        for (int k = from + 1; k < to; k++)
        {
            if (!HasLetterOrDigit(words[k].Text) || !TextPosition.IsSentenceStart(text, words[k].Start) || AfterAbbreviation(words, k)) continue;
            if (Trim(words, start, k) is { } piece && !IsStopWord(words, piece)) yield return piece;
            start = k;
        }
        if (Trim(words, start, to) is { } last && !IsStopWord(words, last)) yield return last;
    }

    private static bool IsStopWord(IReadOnlyList<WordToken> words, (int From, int To) piece) =>
        piece.To - piece.From == 1 && LanguageProfiles.Default.StopWords.Contains(NameFolding.Fold(words[piece.From].Text));

    private static (int, int)? Trim(IReadOnlyList<WordToken> words, int from, int to)
    {
        while (from < to && !HasLetterOrDigit(words[from].Text)) from++;
        while (to > from && !HasLetterOrDigit(words[to - 1].Text)) to--;
        // A one-letter stop word opening a longer span is a preposition the model took in at a
        // sentence start ("W Krakowie", "S Imrichom", "В Москве"); an initial is followed by its dot.
        // So is a Cyrillic one of any length ("Зі Степаном", "Во Львове"): the Latin-script lists hold
        // articles and particles that open real names (El Paso, De Vries), the Cyrillic ones do not.
        if (to - from > 1 && (words[from].Text.Length == 1 || IsCyrillic(words[from].Text)) && HasLetterOrDigit(words[from + 1].Text)
            && LanguageProfiles.Default.StopWords.Contains(NameFolding.Fold(words[from].Text)))
            from++;
        return from < to ? (from, to) : null;
    }

    private static bool AfterAbbreviation(IReadOnlyList<WordToken> words, int k) =>
        k >= 2 && words[k - 1].Text == "." && words[k - 2].Text is { Length: <= 3 } w && char.IsUpper(w[0]) && w.All(char.IsLetter);

    private static bool HasLetterOrDigit(string word) => word.Any(char.IsLetterOrDigit);

    private static bool IsCyrillic(string word) => word.All(c => c is >= '\u0400' and <= '\u04FF');
}
