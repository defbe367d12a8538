using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Lexicon;

namespace SwitchTag.Tagging;

/// <summary>The tag stage. Authority-list matches come first and are final: a model mention that
/// overlaps one is dropped (never split, shortened or relabelled), and a gazetteer match that
/// overlaps one is dropped too, so a listed person is never tagged as a place or organisation and
/// a listed place never as a person. In <see cref="TaggingMode.RulesThenModel"/> the model then
/// tags the rest of the turn; a model mention wins over a gazetteer match it overlaps (it has seen
/// the context: "Jordan Peterson" is a person, not the country), and gazetteer matches elsewhere are
/// kept. Model mentions in scripts the model never saw in training (Greek, Arabic...) are dropped
/// (<see cref="TrainedScripts"/>). Rule matching runs once per language of the turn's spans, a match counting for the
/// language of the span it starts in.</summary>
public sealed class NameTagger : INameTagger
{
    private readonly SequenceTagger? _model;
    private readonly AuthorityList _authority;
    private readonly Gazetteer _gazetteer;
    private readonly TaggingMode _mode;

    public NameTagger(NerModel? model = null, AuthorityList? authority = null, Gazetteer? gazetteer = null,
        TaggingMode mode = TaggingMode.RulesThenModel)
    {
        _model = model is null ? null : new SequenceTagger(model);
        _authority = authority ?? AuthorityList.Empty;
        _gazetteer = gazetteer ?? Gazetteer.Empty;
        _mode = mode;
    }

    public ImmutableArray<Mention> Tag(int turnIndex, string turnText, ImmutableArray<LanguageSpan> spans)
    {
        if (string.IsNullOrEmpty(turnText)) return [];
        if (spans.IsDefault) spans = [];
        var authority = RuleMatches(turnText, spans, _authority.Find);
        var gazetteer = RuleMatches(turnText, spans, _gazetteer.Find);
        var rules = NameMatchSelection.Combine(authority, gazetteer);
        var mentions = new List<Mention>();
        var models = new List<Mention>();
        if (_mode == TaggingMode.RulesThenModel && _model is not null)
        {
            var words = WordTokenizer.Tokenize(turnText);
            var tagged = _model.Spans([words.Select(w => w.Text).ToArray()])[0];
            foreach (var s in tagged)
            {
                int start = words[s.Start].Start, end = words[s.End - 1].End;
                if (authority.Any(a => a.CharStart < end && start < a.CharEnd)) continue;
                if (!TrainedScripts.Covers(turnText.AsSpan(start, end - start))) continue;
                models.Add(new Mention(turnIndex, start, end, turnText[start..end], s.Label, LanguageAt(spans, start), s.Confidence, MentionSource.Model));
            }
        }
        foreach (var r in rules)
        {
            if (r.Source == MentionSource.Gazetteer && models.Any(m => m.CharStart < r.CharEnd && r.CharStart < m.CharEnd)) continue;
            mentions.Add(new Mention(turnIndex, r.CharStart, r.CharEnd, turnText[r.CharStart..r.CharEnd], r.Label,
                LanguageAt(spans, r.CharStart), 1.0, r.Source));
        }
        mentions.AddRange(models);
        return [.. mentions.OrderBy(m => m.CharStart).ThenBy(m => m.CharEnd)];
    }

    private static ImmutableArray<NameMatch> RuleMatches(string text, ImmutableArray<LanguageSpan> spans, Func<string, string, ImmutableArray<NameMatch>> find)
    {
        var languages = spans.Select(s => s.Language).Distinct(StringComparer.Ordinal).DefaultIfEmpty("und");
        var matches = new List<NameMatch>();
        foreach (var language in languages)
            matches.AddRange(find(text, language).Where(m => spans.IsEmpty || LanguageAt(spans, m.CharStart) == language));
        return NameMatchSelection.LongestFirst(matches);
    }

    private static string LanguageAt(ImmutableArray<LanguageSpan> spans, int charStart)
    {
        foreach (var s in spans)
            if (s.CharStart <= charStart && charStart < s.CharEnd) return s.Language;
        return spans.IsEmpty ? "und" : spans.MinBy(s => Math.Min(Math.Abs(s.CharStart - charStart), Math.Abs(s.CharEnd - charStart)))!.Language;
    }
}
