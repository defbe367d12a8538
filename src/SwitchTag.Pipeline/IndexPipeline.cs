using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Stages;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.LanguageId.Interview;
using SwitchTag.Output;
using SwitchTag.Core.Languages;

namespace SwitchTag.Pipeline;

/// <summary>The stages of one run, loaded: reads a transcript, runs turns, language spans, names,
/// times, headings, worklist and the reviewers' decisions on it, and writes the outputs. Built by
/// <see cref="IndexPipelineBuilder"/>; holds no per-interview state, so one instance serves a run.</summary>
public sealed class IndexPipeline(
    TranscriptReaders readers,
    ILanguageSegmenter languages,
    INameTagger names,
    IHeadingLexicon lexicon,
    TranscriptFormat? format,
    LanguageCode? mainLanguage,
    ImmutableArray<Decision> decisions,
    OutputWriters writers)
{
    public ILanguageSegmenter Languages => languages;
    public INameTagger Names => names;
    public IHeadingLexicon Lexicon => lexicon;
    public ImmutableArray<Decision> Decisions => decisions;
    public OutputWriters Writers => writers;

    public ReadResult Read(string path) => TranscriptFile.Read(path, format, readers);

    /// <summary>The finished index of one transcript; the decisions' outcomes are on it.</summary>
    public InterviewIndex Run(Transcript transcript) =>
        new InterviewPipeline(languages, names, new IndexBuilder(lexicon, decisions, checkLanguageBelow: StretchCalibration.CheckBelow)).Run(transcript, mainLanguage);

    /// <summary>Every per-interview output into <paramref name="folder"/>.</summary>
    public void Write(InterviewIndex index, string folder) => writers.WriteInterview(index, folder);

    /// <summary>Every collection output into <paramref name="outDir"/>.</summary>
    public void WriteCollection(IReadOnlyList<CollectionEntry> entries, string outDir) => writers.WriteCollection(entries, outDir);
}
