using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.LanguageId.Interview;
using SwitchTag.Core.Languages;
using SwitchTag.Core.Text;

namespace SwitchTag.LanguageId.Segmentation;

/// <summary>Interview-level segmentation: the languages of a whole interview first, then each turn
/// decided within them.</summary>
public sealed partial class CodeSwitchSegmenter
{
    private const int ProfileIterations = 30;
    private const float ProfileSmoothing = 0.1f;
    private const double ReportedShare = 0.001;

    /// <summary>Segments all turns of one interview, in order. First pass: the interview's language
    /// shares, as the mixture weights that best explain its turns (EM over turns, each turn scored
    /// as one language with capped word evidence, so a short turn in a close language cannot
    /// invent a language); languages with at least <see cref="InterviewParameters.MinShare"/> form
    /// the profile. Second pass: each turn is decoded with ln(share) as the prior of starting in and
    /// switching into a language (every language outside the profile gets
    /// <see cref="InterviewParameters.OutsideShare"/>: a third language needs strong evidence, but
    /// gets through when it has it), and with the previous turn's last language mixed into the
    /// starting prior, so "no." or "sí." follows the conversation. A language that the decoded
    /// words put at MinShare or more joins the profile, and the turns are decoded once more.</summary>
    public InterviewSegmentation SegmentInterview(IReadOnlyList<string> turns, InterviewParameters? parameters = null)
    {
        var p = parameters ?? InterviewParameters.Default;
        var mp = _model.Parameters;
        var cache = new Dictionary<string, ScoredWord>(StringComparer.Ordinal);
        var evidence = new TurnEvidence[turns.Count];
        for (int t = 0; t < turns.Count; t++) evidence[t] = CollectEvidence(turns[t] ?? "", mp, cache);

        var classShare = EstimateShares(evidence);
        var profile = ProfileOf(classShare, p);
        var decoded = DecodeTurns(turns, evidence, classShare, profile, p);
        // Turn-level shares give a language spoken only inside turns of another (a narrator's Polish
        // phrases in English answers) nothing; when the decoded words put such a language at MinShare
        // or more, it joins the profile with its share of the decoded words and the turns are
        // decoded again within it.
        double total = decoded.Words.Sum();
        if (total == 0) return decoded.Result;
        var joined = (double[])classShare.Clone();
        bool grew = false;
        for (int c = 0; c < joined.Length; c++)
        {
            var code = _model.ClassCodes[c];
            if (profile.Contains(new LanguageCode(code)) || decoded.Words[c] / total < p.MinShare) continue;
            joined[c] = decoded.Words[c] / total;
            grew = true;
        }
        if (!grew) return decoded.Result;
        double sum = joined.Sum();
        for (int c = 0; c < joined.Length; c++) joined[c] /= sum;
        return DecodeTurns(turns, evidence, joined, ProfileOf(joined, p), p).Result;
    }

    /// <summary>The second pass: each turn decoded within <paramref name="profile"/>; also the decoded
    /// word weight per class, over all turns.</summary>
    private (InterviewSegmentation Result, double[] Words) DecodeTurns(IReadOnlyList<string> turns, TurnEvidence[] evidence,
        double[] classShare, InterviewLanguages profile, InterviewParameters p)
    {
        int classes = _model.ClassCount;
        var logPrior = new float[classes];
        for (int c = 0; c < classes; c++)
            logPrior[c] = (float)Math.Log(profile.Contains(new LanguageCode(_model.ClassCodes[c])) ? Math.Max(classShare[c], p.OutsideShare) : p.OutsideShare);

        var enter = new float[classes];
        for (int c = 0; c < classes; c++) enter[c] = p.SwitchCost - p.EnterWeight * logPrior[c];
        var noBonus = new float[classes];
        var words = new double[classes];
        var guesses = ImmutableArray.CreateBuilder<LanguageGuess>(turns.Count);
        var spans = ImmutableArray.CreateBuilder<ImmutableArray<LanguageSpan>>(turns.Count);
        int previousCode = -1;
        var startPriors = new Dictionary<int, float[]>();
        for (int t = 0; t < turns.Count; t++)
        {
            string text = turns[t] ?? "";
            var ev = evidence[t];
            if (text.Length == 0) { spans.Add([]); guesses.Add(new LanguageGuess(LanguageCode.Undetermined, 0)); continue; }
            if (ev.Count == 0)
            {
                spans.Add([new LanguageSpan(new CharSpan(0, text.Length), LanguageCode.Undetermined, 0)]);
                guesses.Add(new LanguageGuess(LanguageCode.Undetermined, 0));
                continue;
            }
            if (!startPriors.TryGetValue(previousCode, out var start))
                startPriors[previousCode] = start = StartPrior(logPrior, previousCode, p);
            var labels = Decode(ev, new DecoderPriors(start, enter, noBonus));
            // A lone name ("Irena Kowalczyk.") is no switch even into a language of the interview.
            MergeShortIslands(text, ev, labels, p.MinIslandWeight, (code, namesOnly, _) => namesOnly || !profile.Contains(_codes[code]));
            if (p.KeepKnownWords) MergeKnownWords(text, ev, labels);
            for (int w = 0; w < labels.Length; w++) words[labels[w]] += ev.Weights[w];
            var posterior = CodePosterior(ev, 0, ev.Count, logPrior);
            spans.Add(Calibrate(BuildSpans(text, ev, labels, logPrior, posterior), ev, profile, p));
            int best = ArgMax(posterior);
            double confidence = p.Calibration.Apply(posterior[best], WordsIn(ev, 0, text.Length), ShareOf(profile, _codes[best], p));
            guesses.Add(posterior[best] < MinConfidence ? new LanguageGuess(LanguageCode.Undetermined, 0) : new LanguageGuess(_codes[best], Math.Round(confidence, 4)));
            previousCode = _codeOfClass[labels[^1]];
        }
        return (new InterviewSegmentation(profile, guesses.MoveToImmutable(), spans.MoveToImmutable()), words);
    }

    private static ImmutableArray<LanguageSpan> Calibrate(ImmutableArray<LanguageSpan> spans, TurnEvidence evidence,
        InterviewLanguages profile, InterviewParameters p) =>
        spans.Select(s => s with
        {
            Confidence = Math.Round(p.Calibration.Apply(s.Confidence, WordsIn(evidence, s.CharStart, s.CharEnd), ShareOf(profile, s.Language, p)), 4),
        }).ToImmutableArray();

    /// <summary>Words (letters, not numbers or fillers of every language) starting in [start, end) of
    /// <paramref name="tokens"/> (in text order, as the tokenizer gives them). Only the tokens in the
    /// range are visited, so counting every span of a long turn costs one pass over the turn.</summary>
    public static int WordsIn(IReadOnlyList<Text.Token> tokens, int start, int end)
    {
        int lo = 0, hi = tokens.Count;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (tokens[mid].Start < start) lo = mid + 1; else hi = mid;
        }
        int words = 0;
        for (int i = lo; i < tokens.Count && tokens[i].Start < end; i++)
            if (tokens[i].Kind == Text.TokenKind.Word) words++;
        return words;
    }

    private static int WordsIn(TurnEvidence evidence, int start, int end) => WordsIn(evidence.Tokens, start, end);

    /// <summary>A language's share of the interview as the calibration sees it (outside the profile:
    /// <see cref="InterviewParameters.OutsideShare"/>).</summary>
    public static double ShareOf(InterviewLanguages profile, LanguageCode language, InterviewParameters p) =>
        profile.Spoken.FirstOrDefault(s => s.Language == language)?.Share ?? p.OutsideShare;

    /// <summary>A one-word island whose word the surrounding language also uses as a word of its own
    /// (its training text kept the whole word: "café", "horrible", "principal" in English) is a
    /// loanword or cognate, not a switch, and takes the surrounding language.</summary>
    private void MergeKnownWords(string text, TurnEvidence evidence, int[] labels)
    {
        int n = labels.Length;
        Span<char> buffer = stackalloc char[SwitchTag.LanguageId.Model.NgramHasher.MaxWordChars];
        Span<bool> kept = stackalloc bool[_model.ClassCount];
        for (int w = 0; w < n; w++)
        {
            int code = _codeOfClass[labels[w]];
            bool before = w > 0 && _codeOfClass[labels[w - 1]] != code;
            bool after = w + 1 < n && _codeOfClass[labels[w + 1]] != code;
            if (w > 0 && !before || w + 1 < n && !after || !before && !after) continue;
            int neighbour = before ? labels[w - 1] : labels[w + 1];
            if (before && after && _codeOfClass[labels[w - 1]] != _codeOfClass[labels[w + 1]]) continue;
            var token = evidence.Tokens[evidence.TokenIndex[w]];
            int len = Text.WordNormalizer.Normalize(text.AsSpan(token.Start, token.Length), buffer);
            _model.WholeWordClasses(buffer[..len], kept);
            int neighbourCode = _codeOfClass[neighbour];
            for (int c = 0; c < kept.Length; c++)
                if (kept[c] && _codeOfClass[c] == neighbourCode)
                {
                    labels[w] = BestClassOf(neighbourCode, evidence.Scores[w]);
                    break;
                }
        }
    }

    /// <summary>Mixture weights per class maximising the likelihood of the turns, each turn one
    /// language: EM with a small Dirichlet smoothing, turns weighted by their words.</summary>
    private double[] EstimateShares(TurnEvidence[] evidence)
    {
        int classes = _model.ClassCount;
        // Per turn only the classes within Negligible nats of its best matter: below that a class's
        // posterior stays under e^-40 whatever the shares (they are at least ~e^-15).
        var turns = new List<(float Weight, int[] Classes, float[] Scores)>();
        var sum = new float[classes];
        foreach (var ev in evidence)
        {
            if (ev.Count == 0) continue;
            Array.Clear(sum);
            foreach (var e in ev.Emissions) for (int c = 0; c < classes; c++) sum[c] += e[c];
            float max = sum.Max();
            var kept = Enumerable.Range(0, classes).Where(c => sum[c] >= max - Negligible).ToArray();
            turns.Add((ev.TotalWeight, kept, kept.Select(c => sum[c]).ToArray()));
        }
        var share = Enumerable.Repeat(1.0 / classes, classes).ToArray();
        var logShare = new double[classes];
        var next = new double[classes];
        var post = new double[classes];
        for (int it = 0; it < ProfileIterations && turns.Count > 0; it++)
        {
            Array.Fill(next, ProfileSmoothing);
            for (int c = 0; c < classes; c++) logShare[c] = Math.Log(share[c]);
            foreach (var (weight, kept, score) in turns)
            {
                double max = double.NegativeInfinity;
                for (int k = 0; k < kept.Length; k++) max = Math.Max(max, post[k] = logShare[kept[k]] + score[k]);
                double total = 0;
                for (int k = 0; k < kept.Length; k++) total += post[k] = Math.Exp(post[k] - max);
                for (int k = 0; k < kept.Length; k++) next[kept[k]] += weight * post[k] / total;
            }
            double all = next.Sum(), change = 0;
            for (int c = 0; c < classes; c++)
            {
                double updated = next[c] / all;
                change = Math.Max(change, Math.Abs(updated - share[c]));
                share[c] = updated;
            }
            if (change < Converged) break;
        }
        return share;
    }

    private const float Negligible = 40;
    private const double Converged = 1e-5;

    private InterviewLanguages ProfileOf(double[] classShare, InterviewParameters p)
    {
        var byCode = new double[_codes.Length];
        for (int c = 0; c < classShare.Length; c++) byCode[_codeOfClass[c]] += classShare[c];
        var shares = Enumerable.Range(0, _codes.Length).Where(i => byCode[i] >= ReportedShare)
            .OrderByDescending(i => byCode[i]).ThenBy(i => _codes[i])
            .Select(i => new SpokenLanguage(_codes[i], Math.Round(byCode[i], 4))).ToImmutableArray();
        return new InterviewLanguages(shares.Where(s => s.Share >= p.MinShare).ToImmutableArray(), shares);
    }

    /// <summary>ln of the profile's shares mixed with the previous turn's last language.</summary>
    private float[] StartPrior(float[] logPrior, int previousCode, InterviewParameters p)
    {
        int classes = logPrior.Length;
        var start = new float[classes];
        int sameCode = 0;
        if (previousCode >= 0) for (int c = 0; c < classes; c++) if (_codeOfClass[c] == previousCode) sameCode++;
        for (int c = 0; c < classes; c++)
        {
            double prior = Math.Exp(logPrior[c]);
            double context = previousCode >= 0 && _codeOfClass[c] == previousCode ? 1.0 / sameCode : 0;
            double mixed = previousCode >= 0 ? (1 - p.Context) * prior + p.Context * context : prior;
            start[c] = p.StartWeight * (float)Math.Log(mixed);
        }
        return start;
    }
}
