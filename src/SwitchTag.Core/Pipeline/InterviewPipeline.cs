using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Core.Languages;

namespace SwitchTag.Core.Pipeline;

/// <summary>Chains the stages in one direction: turns, the interview's languages (all turns at once,
/// so short turns are judged with the whole interview's evidence), names, index.</summary>
public sealed class InterviewPipeline(ILanguageSegmenter languages, INameTagger names, IIndexBuilder index)
{
    public InterviewIndex Run(Transcript transcript, LanguageCode? mainLanguage = null)
    {
        var turns = TurnBuilder.Build(transcript);
        var result = languages.SegmentInterview(turns, mainLanguage);
        var spans = result.Spans;
        var mentions = ImmutableArray.CreateBuilder<Mention>();
        foreach (var turn in turns)
            mentions.AddRange(names.Tag(turn.Id, turn.Text, spans[turn.Id.Index]));
        // Drained: the builder lets go of its array, which would otherwise stay beside the list while the index is built.
        return index.Build(transcript, turns, result.MainLanguage, spans, mentions.DrainToImmutable()) with
        {
            LanguageProfile = result.Profile,
            MainLanguageDecision = result.MainBasis,
        };
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
