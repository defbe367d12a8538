using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Text;

namespace SwitchTag.Tagging.Sources.Model;

/// <summary>Names the shipped model tags in the turn's words. Mentions in scripts the model never saw
/// in training are dropped (<see cref="TrainedScripts"/>).</summary>
public sealed class NameModelSource(NerModel model) : INameSource
{
    private readonly SequenceTagger _tagger = new(model);

    public MentionSource Source => MentionSource.Model;

    public ImmutableArray<Mention> Find(int turn, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        var words = WordTokenizer.Tokenize(turnText);
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        foreach (var s in _tagger.Spans([words.Select(w => w.Text).ToArray()])[0])
        {
            int start = words[s.Start].Start, end = words[s.End - 1].End;
            if (!TrainedScripts.Covers(turnText.AsSpan(start, end - start))) continue;
            mentions.Add(new Mention(turn, new CharSpan(start, end), turnText[start..end], s.Label, SpanLanguage.At(spans, start), s.Confidence, MentionSource.Model));
        }
        return mentions.ToImmutable();
    }
}
