using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;

namespace SwitchTag.Core.Pipeline;

/// <summary>Chains the stages in one direction: turns, the interview's languages (all turns at once,
/// so short turns are judged with the whole interview's evidence), names, index. The index's
/// transcript holds no cue texts: the turns hold them.</summary>
public sealed class InterviewPipeline(ILanguageSegmenter languages, INameTagger names, IIndexBuilder index)
{
    public InterviewIndex Run(Transcript transcript, LanguageCode? mainLanguage = null)
    {
        var turns = TurnBuilder.Build(transcript);
        transcript = transcript.WithoutCueTexts();
        bool isLong = LongTalk.IsLong(turns);
        var result = languages.SegmentInterview(turns, mainLanguage);
        CollectIf(isLong);
        var spans = result.Spans;
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        foreach (var turn in turns)
            mentions.AddRange(names.Tag(turn.Id, turn.Text, spans[turn.Id.Index]));
        CollectIf(isLong);
        // Drained: the builder lets go of its array, which would otherwise stay beside the list while the index is built.
        var built = index.Build(transcript, turns, result.MainLanguage, spans, mentions.DrainToImmutable()) with
        {
            LanguageProfile = result.Profile,
            MainLanguageDecision = result.MainBasis,
        };
        CollectIf(isLong);
        return built;
    }

    /// <summary>Each stage of a long interview leaves large arrays of the whole talk behind (word
    /// tables, language evidence, proposals), which only a full collection takes back, and the GC
    /// let them pile up into the next stage. One full collection after each stage of a long
    /// interview costs a fraction of a second against the tens of seconds the stage took (one
    /// 200k-cue turn, two paired runs: peak resident 859 -> 710 and 759 -> 715 MB); it also gives
    /// the freed memory back (<see cref="LongTalk.Compact"/>).</summary>
    private static void CollectIf(bool isLong)
    {
        if (isLong) LongTalk.Compact();
    }
}

/// <summary>The interview's main language: the language holding most characters of confident talk.</summary>
public static class MainLanguage
{
    public static LanguageCode Detect(ILanguageSegmenter languages, ImmutableArray<Turn> turns)
    {
        var weight = new Dictionary<LanguageCode, double>();
        foreach (var turn in turns)
        {
            var guess = languages.Identify(turn.Text);
            if (guess.Language.IsUndetermined) continue;
            weight[guess.Language] = weight.GetValueOrDefault(guess.Language) + turn.Text.Length * guess.Confidence;
        }
        return weight.Count == 0 ? LanguageCode.Undetermined : weight.MaxBy(kv => kv.Value).Key;
    }
}
