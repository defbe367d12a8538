using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Text;
using SwitchTag.LanguageId.Model;
using SwitchTag.LanguageId.Text;
using SwitchTag.Core.Languages;

namespace SwitchTag.LanguageId.Segmentation;

/// <summary>The langid stage. Identify scores a whole stretch; Segment labels every word jointly
/// with a Viterbi pass over languages (each change of language between words pays a fixed cost),
/// so a switch needs several words of evidence while one odd word stays in its sentence's language.
/// Neutral tokens (numbers, hesitations, transcriber tags, false starts) carry no evidence and take
/// the language of their neighbours; names (capitalised mid-sentence, all capitals, or known to the
/// name lexicon) count only NameWeight of a word, too little to pay for a switch on their own.
/// A language's own fillers (Profiles/&lt;code&gt;/hesitations.txt) carry no evidence against it.
/// <see cref="SegmentInterview"/> decides each turn within the languages of the whole interview.</summary>
public sealed partial class CodeSwitchSegmenter : ILanguageSegmenter
{
    /// <summary>Below this probability a stretch is reported as und.</summary>
    public const float MinConfidence = 0.2f;

    private const int EarlyStopCheckEvery = 64;
    private const float DecidedMargin = 30f;

    private readonly NgramLanguageModel _model;
    private readonly INameLexicon? _names;
    private readonly LanguageCode[] _codes;
    private readonly int[] _codeOfClass;
    private readonly NeutralWords _neutral;

    public CodeSwitchSegmenter(NgramLanguageModel model, INameLexicon? names = null, NeutralWords? neutral = null)
    {
        _model = model;
        _names = names;
        _neutral = neutral ?? NeutralWords.Default;
        _codes = model.ClassCodes.Distinct().Order(StringComparer.Ordinal).Select(c => new LanguageCode(c)).ToArray();
        _codeOfClass = model.ClassCodes.Select(c => Array.IndexOf(_codes, new LanguageCode(c))).ToArray();
        Languages = _codes;
    }

    public static CodeSwitchSegmenter Load(string modelPath, INameLexicon? names = null, NeutralWords? neutral = null) =>
        new(NgramLanguageModel.Load(modelPath), names, neutral);

    public NgramLanguageModel Model => _model;

    public IReadOnlyList<LanguageCode> Languages { get; }

    /// <summary>Words that look like names (capitalised mid-sentence, all capitals, or known to the
    /// lexicon) are left out when at least two other words remain, so "born in Szczebrzeszyn" stays
    /// English while a title-case headline or a short "Az Európai" still has words to go on.</summary>
    public LanguageGuess Identify(ReadOnlySpan<char> text)
    {
        var tokens = Tokenizer.Tokenize(text);
        var acc = new ScoreAccumulator(_model.ClassCount);
        Span<char> buffer = stackalloc char[NgramHasher.MaxWordChars];
        int words = 0, names = 0, lastName = -1;
        for (int t = 0; t < tokens.Count; t++)
        {
            var token = tokens[t];
            if (token.IsNeutral) continue;
            if (NameWeight(text, token, _model.Parameters) < 1) { names++; lastName = t; continue; }
            int len = WordNormalizer.Normalize(text[token.Start..token.End], buffer);
            _model.AddWord(buffer[..len], acc);
            words++;
            if (words % EarlyStopCheckEvery == 0 && IsDecided(acc)) break;
        }
        if (words < 2 && names > 0)
        {
            if (words == 0 && names == 1 && _names is not null && _names.IsKnownName(text[tokens[lastName].Start..tokens[lastName].End]))
                return new LanguageGuess(LanguageCode.Undetermined, 0);
            acc.Clear();
            foreach (var token in tokens)
            {
                if (token.IsNeutral) continue;
                int len = WordNormalizer.Normalize(text[token.Start..token.End], buffer);
                _model.AddWord(buffer[..len], acc);
            }
        }
        if (acc.FeatureHits == 0) return new LanguageGuess(LanguageCode.Undetermined, 0);
        var (code, p) = Best(acc);
        return p < MinConfidence ? new LanguageGuess(LanguageCode.Undetermined, 0) : new LanguageGuess(_codes[code], p);
    }

    public ImmutableArray<LanguageSpan> Segment(string text, LanguageCode mainLanguage) =>
        Segment(text, mainLanguage, _model.Parameters);

    /// <summary>Segment with explicit decoder parameters (the trainer uses this to fit them). The turn
    /// starts as if a word of the main language came before it (starting elsewhere costs
    /// <see cref="StartCostShare"/> of a switch), and a one-word run of the main language at either
    /// end of the turn stays a run: it is the turn's own language, not a loanword inside the other.</summary>
    public ImmutableArray<LanguageSpan> Segment(string text, LanguageCode mainLanguage, ModelParameters parameters)
    {
        if (string.IsNullOrEmpty(text)) return [];
        var evidence = CollectEvidence(text, parameters, null);
        if (evidence.Count == 0) return [new LanguageSpan(new CharSpan(0, text.Length), LanguageCode.Undetermined, 0)];
        int classes = _model.ClassCount;
        var start = new float[classes];
        var enter = new float[classes];
        var bonus = new float[classes];
        for (int c = 0; c < classes; c++)
        {
            bool main = _model.ClassCodes[c] == mainLanguage.Code;
            start[c] = main ? 0 : -StartCostShare * parameters.SwitchCost;
            enter[c] = parameters.SwitchCost;
            bonus[c] = main ? parameters.MainLanguageBonus : 0;
        }
        var labels = Decode(evidence, new DecoderPriors(start, enter, bonus));
        int mainCode = Array.IndexOf(_codes, mainLanguage);
        MergeShortIslands(text, evidence, labels, MinIslandWeight, (code, _, atEdge) => !(atEdge && code == mainCode));
        return BuildSpans(text, evidence, labels, null);
    }

    /// <summary>Chosen on the calibration split's synthetic turns (switch-point F1: no start cost 0.930,
    /// half a switch 0.932, a whole one 0.934), bounded by Miami dev read line by line, real speech
    /// where a turn often opens with a word of the other language (utterances whose switch points
    /// are found: 0.394, 0.382, 0.357; 0.370 before the edge rule): the largest share that keeps it
    /// above where it was.</summary>
    private const float StartCostShare = 0.5f;

    /// <summary>Scores every word of <paramref name="text"/> that carries evidence. With a
    /// <paramref name="cache"/> (normalised form to scores) each distinct word is scored once, and
    /// its occurrences share its emission arrays (never written after they are made).</summary>
    private TurnEvidence CollectEvidence(string text, ModelParameters parameters, Dictionary<string, ScoredWord>? cache)
    {
        var evidence = new TurnEvidence(Tokenizer.Tokenize(text));
        var tokens = evidence.Tokens;
        int classes = _model.ClassCount;
        ScoreAccumulator? acc = null;
        Span<char> buffer = stackalloc char[NgramHasher.MaxWordChars];
        var lookup = cache?.GetAlternateLookup<ReadOnlySpan<char>>();
        for (int t = 0; t < tokens.Count; t++)
        {
            var token = tokens[t];
            if (token.IsNeutral) continue;
            float weight = NameWeight(text, token, parameters);
            if (weight == 0) continue;
            int len = WordNormalizer.Normalize(text.AsSpan(token.Start, token.Length), buffer);
            var word = buffer[..len];
            if (lookup is not { } l || !l.TryGetValue(word, out var scored))
            {
                acc ??= new ScoreAccumulator(classes);
                acc.Clear();
                _model.AddWord(word, acc);
                var s = acc.FeatureHits == 0 ? [] : new float[classes];
                if (s.Length > 0) _model.LogLikelihoods(acc, s);
                scored = new ScoredWord(s, s.Length == 0 ? [] : _neutral.NeutralIn(word).ToArray());
                if (lookup is { } l2) l2[word] = scored;
            }
            if (scored.Scores.Length == 0) continue;
            var neutralIn = scored.NeutralIn;
            evidence.TokenIndex.Add(t);
            evidence.Scores.Add(scored.Scores);
            evidence.Weights.Add(weight);
            evidence.Emissions.Add(lookup is null
                ? Emission(scored.Scores, weight, neutralIn, parameters)
                : weight == 1 ? scored.PlainEmission ??= Emission(scored.Scores, 1, neutralIn, parameters)
                : scored.NameEmission ??= Emission(scored.Scores, weight, neutralIn, parameters));
        }
        return evidence;
    }

    /// <summary>A word's raw log-likelihoods per class (empty when no feature was known), the
    /// languages it is a filler or loanword in, and, once needed, its emission as an ordinary word
    /// and as a name-like one (a word's weight is 1 or the name weight, and its filler languages
    /// are its own, so these two are all it can have).</summary>
    private sealed class ScoredWord(float[] scores, string[] neutralIn)
    {
        public float[] Scores { get; } = scores;

        public string[] NeutralIn { get; } = neutralIn;

        public float[]? PlainEmission { get; set; }

        public float[]? NameEmission { get; set; }
    }

    /// <summary>The decoder's per-class score of one word: tempered log-likelihood relative to the
    /// word's best class, floored at <c>-EmissionCap</c>, times the word's weight; a filler of a
    /// language scores that language as if it were its best.</summary>
    private float[] Emission(float[] scores, float weight, ReadOnlySpan<string> neutralIn, ModelParameters p)
    {
        float best = float.NegativeInfinity;
        foreach (var v in scores) best = Math.Max(best, v);
        var e = new float[scores.Length];
        for (int c = 0; c < e.Length; c++)
            e[c] = weight * Math.Max((scores[c] - best) * p.Temperature, -p.EmissionCap);
        foreach (var code in neutralIn)
            for (int c = 0; c < e.Length; c++)
                if (_model.ClassCodes[c] == code) e[c] = 0;
        return e;
    }

    /// <summary>Viterbi over classes: staying is free, switching into class c costs
    /// <c>Enter[c]</c>; each word adds its emission plus <c>Bonus[c]</c>. With the per-turn main
    /// language bonus, after a switch the turn returns to the main language rather than drifting
    /// to whichever language suits the last word.</summary>
    private int[] Decode(TurnEvidence evidence, DecoderPriors priors)
    {
        int classes = _model.ClassCount, n = evidence.Count;
        var current = new float[classes];
        var next = new float[classes];
        // One bit per word and class: a turn of millions of words keeps its back-pointers small.
        var switched = new ulong[((long)n * classes + 63) >> 6];
        var switchedFrom = new int[n];
        for (int c = 0; c < classes; c++) current[c] = priors.Start[c] + evidence.Emissions[0][c] + priors.Bonus[c];
        for (int w = 1; w < n; w++)
        {
            var e = evidence.Emissions[w];
            int bestPrev = ArgMax(current);
            switchedFrom[w] = bestPrev;
            for (int c = 0; c < classes; c++)
            {
                float switchFrom = current[bestPrev] - priors.Enter[c];
                bool sw = c != bestPrev && switchFrom > current[c];
                if (sw) Set(switched, (long)w * classes + c);
                next[c] = (sw ? switchFrom : current[c]) + e[c] + priors.Bonus[c];
            }
            (current, next) = (next, current);
        }
        var labels = new int[n];
        int state = ArgMax(current);
        for (int w = n - 1; w >= 0; w--)
        {
            labels[w] = state;
            if (IsSet(switched, (long)w * classes + state)) state = switchedFrom[w];
        }
        return labels;
    }

    private static void Set(ulong[] bits, long i) => bits[i >> 6] |= 1UL << (int)(i & 63);

    private static bool IsSet(ulong[] bits, long i) => (bits[i >> 6] & (1UL << (int)(i & 63))) != 0;

    /// <summary>At most one ordinary word of evidence (or only names) between words of another
    /// language in the same script is a loanword, a cognate or a name ("voyage?", "Kurt. [pause] Kurt"),
    /// not a switch: such an island takes the language of the run before it (or after it, at the
    /// start). A different script is evidence enough. Only islands whose language passes
    /// <paramref name="mergeable"/> (given the island's code, whether all its words are name-like and
    /// whether it is at the start or end of the turn) are merged.</summary>
    private void MergeShortIslands(string text, TurnEvidence evidence, int[] labels, float minWeight, Func<int, bool, bool, bool> mergeable)
    {
        var tokens = evidence.Tokens;
        int n = labels.Length;
        int start = 0;
        while (start < n)
        {
            int end = start;
            while (end + 1 < n && _codeOfClass[labels[end + 1]] == _codeOfClass[labels[start]]) end++;
            bool hasBefore = start > 0, hasAfter = end + 1 < n;
            if (hasBefore || hasAfter)
            {
                float weight = 0;
                bool namesOnly = true;
                for (int w = start; w <= end; w++)
                {
                    weight += evidence.Weights[w];
                    namesOnly &= evidence.Weights[w] < 1;
                }
                int neighbour = hasBefore ? start - 1 : end + 1;
                if (weight < minWeight && mergeable(_codeOfClass[labels[start]], namesOnly, !(hasBefore && hasAfter)) && SameScript(text, tokens[evidence.TokenIndex[start]], tokens[evidence.TokenIndex[neighbour]]))
                {
                    int code = _codeOfClass[labels[neighbour]];
                    for (int w = start; w <= end; w++) labels[w] = BestClassOf(code, evidence.Scores[w]);
                }
            }
            start = end + 1;
        }
    }

    /// <summary>Just above one ordinary word: a word plus a name-like one ("dzięki Bogu", 1 + NameWeight)
    /// is a switch.</summary>
    private const float MinIslandWeight = 1.1f;

    private int BestClassOf(int code, float[] wordScores)
    {
        int best = -1;
        for (int c = 0; c < wordScores.Length; c++)
            if (_codeOfClass[c] == code && (best < 0 || wordScores[c] > wordScores[best])) best = c;
        return best;
    }

    private static bool SameScript(string text, Token a, Token b) =>
        WritingScripts.OfFirstLetter(text.AsSpan(a.Start, a.Length)) == WritingScripts.OfFirstLetter(text.AsSpan(b.Start, b.Length));

    /// <summary>One span per run of words in one language. A span's confidence is its language's
    /// posterior over the span's words (weighted log-likelihoods, tempered), with
    /// <paramref name="logPrior"/> per class when given; <paramref name="wholeTurn"/>, when given, is
    /// that posterior over all the turn's words, already computed by the caller.</summary>
    private ImmutableArray<LanguageSpan> BuildSpans(string text, TurnEvidence evidence, int[] labels, float[]? logPrior, float[]? wholeTurn = null)
    {
        var tokens = evidence.Tokens;
        var spans = ImmutableArray.CreateBuilder<LanguageSpan>();
        int runStart = 0, runFirst = 0;
        for (int w = 1; w <= evidence.Count; w++)
        {
            if (w < evidence.Count && _codeOfClass[labels[w]] == _codeOfClass[labels[runFirst]]) continue;
            // A run ends where the next run's first word starts, so neutral tokens between two
            // runs stay with the earlier language and the spans cover the text without gaps.
            int end = w < evidence.Count ? tokens[evidence.TokenIndex[w]].Start : text.Length;
            int code = _codeOfClass[labels[runFirst]];
            var posterior = runFirst == 0 && w == evidence.Count && wholeTurn is not null ? wholeTurn : CodePosterior(evidence, runFirst, w, logPrior);
            spans.Add(new LanguageSpan(new CharSpan(runStart, end), _codes[code], Math.Round(posterior[code], 4)));
            runStart = end;
            runFirst = w;
        }
        return spans.ToImmutable();
    }

    /// <summary>Posterior per code of words [from, to) of a turn: log-likelihoods add over words.</summary>
    private float[] CodePosterior(TurnEvidence evidence, int from, int to, float[]? logPrior)
    {
        int classes = _model.ClassCount;
        Span<float> z = stackalloc float[classes];
        float t = _model.Parameters.Temperature;
        for (int i = from; i < to; i++)
        {
            var s = evidence.Scores[i];
            float weight = evidence.Weights[i];
            for (int c = 0; c < classes; c++) z[c] += weight * s[c] * t;
        }
        if (logPrior is not null) for (int c = 0; c < classes; c++) z[c] += logPrior[c];
        float max = float.NegativeInfinity;
        foreach (var v in z) max = Math.Max(max, v);
        var byCode = new float[_codes.Length];
        float sum = 0;
        for (int c = 0; c < classes; c++) sum += z[c] = MathF.Exp(z[c] - max);
        for (int c = 0; c < classes; c++) byCode[_codeOfClass[c]] += z[c] / sum;
        return byCode;
    }

    /// <summary>1 for an ordinary word; 0 for a name the lexicon knows; NameWeight for a word that
    /// only looks like a name (capitalised mid-sentence or all capitals).</summary>
    private float NameWeight(ReadOnlySpan<char> text, Token token, ModelParameters p)
    {
        var word = text.Slice(token.Start, token.Length);
        if (_names is not null && _names.IsKnownName(word)) return 0;
        if (word.Length < 2 || !char.IsUpper(word[0])) return 1;
        if (IsAllUpper(word)) return p.NameWeight;
        return TextPosition.IsSentenceStart(text, token.Start) ? 1 : p.NameWeight;
    }

    private static bool IsAllUpper(ReadOnlySpan<char> word)
    {
        foreach (char c in word) if (char.IsLower(c)) return false;
        return true;
    }

    /// <summary>Long stretches: stop reading once the leader is ahead by <see cref="DecidedMargin"/>
    /// tempered nats (a posterior ratio beyond e^30, which more words will not overturn in practice).</summary>
    private bool IsDecided(ScoreAccumulator acc)
    {
        Span<float> scores = stackalloc float[_model.ClassCount];
        _model.LogLikelihoods(acc, scores);
        int best = ArgMax(scores);
        float second = float.NegativeInfinity;
        for (int c = 0; c < scores.Length; c++)
            if (c != best && _codeOfClass[c] != _codeOfClass[best]) second = Math.Max(second, scores[c]);
        return (scores[best] - second) * _model.Parameters.Temperature > DecidedMargin;
    }

    private (int Code, float Probability) Best(ScoreAccumulator acc)
    {
        var scores = new float[_model.ClassCount];
        _model.LogLikelihoods(acc, scores);
        var byCode = CodePosterior(scores);
        int best = ArgMax(byCode);
        return (best, byCode[best]);
    }

    private float[] CodePosterior(ReadOnlySpan<float> scores)
    {
        int classes = _model.ClassCount;
        Span<float> probabilities = stackalloc float[classes];
        _model.Posterior(scores, probabilities);
        var byCode = new float[_codes.Length];
        for (int c = 0; c < classes; c++) byCode[_codeOfClass[c]] += probabilities[c];
        return byCode;
    }

    private static int ArgMax(ReadOnlySpan<float> values)
    {
        int best = 0;
        for (int i = 1; i < values.Length; i++) if (values[i] > values[best]) best = i;
        return best;
    }
}
