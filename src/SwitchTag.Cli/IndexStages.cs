using System.Collections.Immutable;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Pipeline;
using SwitchTag.Core.Stages;
using SwitchTag.Indexing;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.Lexicon;
using SwitchTag.Tagging;

namespace SwitchTag.Cli;

/// <summary>The shipped models loaded once for a whole run, and the pipeline built from them.</summary>
public sealed class IndexStages
{
    public required CodeSwitchSegmenter Languages { get; init; }
    public required NameTagger Names { get; init; }
    public required IndexLexicon Lexicon { get; init; }
    public required ImmutableArray<Diagnostic> Notes { get; init; }

    /// <summary>Loads langid, gazetteer, authority list and (for <see cref="TaggingMode.RulesThenModel"/>)
    /// the name model. Returns null with <paramref name="error"/> when a required file is unusable.</summary>
    public static IndexStages? Load(TaggingMode mode, string? authorityPath, out string? error)
    {
        error = null;
        var notes = ImmutableArray.CreateBuilder<Diagnostic>();
        string langid = ModelLocator.PathOf("langid.bin");
        if (!File.Exists(langid)) { error = $"the language model {langid} is missing"; return null; }

        var gazetteer = Gazetteer.Load(ModelLocator.PathOf(Gazetteer.FileName));
        notes.AddRange(gazetteer.Problems.Select(p => p with { Severity = Severity.Warning, Message = p.Message + "; places get no coordinates" }));

        AuthorityList? authority = null;
        if (authorityPath is not null)
        {
            var (list, problems) = AuthorityList.Load(authorityPath);
            if (list.Entries.IsEmpty && problems.Any(p => p.Severity == Severity.Error))
            {
                error = string.Join(Environment.NewLine, problems);
                return null;
            }
            notes.AddRange(problems);
            authority = list;
        }

        CodeSwitchSegmenter segmenter;
        // Names on the archive's list are language-neutral too, like gazetteer places.
        INameLexicon names = authority is null ? gazetteer : new NameLexiconUnion(authority, gazetteer);
        try { segmenter = CodeSwitchSegmenter.Load(langid, names); }
        catch (Exception e) when (e is IOException or InvalidDataException or UnauthorizedAccessException or EndOfStreamException)
        {
            error = $"cannot load the language model {langid}: {e.Message}";
            return null;
        }

        NerModel? model = null;
        if (mode == TaggingMode.RulesThenModel)
        {
            if (File.Exists(ModelLocator.PathOf("ner.onnx")))
            {
                try { model = NerModel.Shared(ModelLocator.ModelsDirectory); }
                catch (Exception e) when (e is IOException or InvalidDataException or UnauthorizedAccessException or Microsoft.ML.OnnxRuntime.OnnxRuntimeException or KeyNotFoundException or System.Text.Json.JsonException)
                {
                    error = $"cannot load the name model in {ModelLocator.ModelsDirectory}: {e.Message}";
                    return null;
                }
            }
            else
            {
                notes.Add(new Diagnostic(new SourceLine(ModelLocator.PathOf("ner.onnx"), 0), Severity.Warning,
                    "the name model is missing; names come from the authority list and gazetteer only"));
                mode = TaggingMode.RulesOnly;
            }
        }

        return new IndexStages
        {
            Languages = segmenter,
            Names = new NameTagger(model, authority, gazetteer, mode),
            Lexicon = new IndexLexicon(gazetteer),
            Notes = notes.ToImmutable(),
        };
    }

    /// <summary>Runs the whole pipeline on one transcript (turns, language spans, names, times,
    /// headings, worklist), with the reviewers' decisions applied.</summary>
    public (InterviewIndex Index, ImmutableArray<DecisionOutcome> Outcomes) Run(Transcript transcript, string? mainLanguage, ImmutableArray<Decision> decisions)
    {
        var builder = new IndexStageRecorder(new IndexBuilder(Lexicon, decisions));
        var index = new InterviewPipeline(Languages, Names, builder).Run(transcript, mainLanguage);
        return (index, builder.Outcomes);
    }
}
