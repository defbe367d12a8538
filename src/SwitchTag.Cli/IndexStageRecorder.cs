using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Indexing;

namespace SwitchTag.Cli;

/// <summary>The index stage as the pipeline sees it, keeping the decision outcomes of the one
/// interview it built so the command can report them.</summary>
public sealed class IndexStageRecorder(IndexBuilder inner) : IIndexBuilder
{
    public ImmutableArray<DecisionOutcome> Outcomes { get; private set; } = [];

    public InterviewIndex Build(Transcript transcript, ImmutableArray<Turn> turns, string mainLanguage,
        ImmutableArray<ImmutableArray<LanguageSpan>> spans, ImmutableArray<Mention> mentions)
    {
        var (index, outcomes) = inner.BuildWithOutcomes(transcript, turns, mainLanguage, spans, mentions);
        Outcomes = outcomes;
        return index;
    }
}
