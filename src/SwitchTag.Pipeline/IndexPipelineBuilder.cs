using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Core.Stages;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.Lexicon;
using SwitchTag.Lexicon.NameLists;
using SwitchTag.Output;
using SwitchTag.Pipeline.Models;
using SwitchTag.Tagging;
using SwitchTag.Tagging.Sources;
using SwitchTag.Core.Languages;

namespace SwitchTag.Pipeline;

/// <summary>Composes an <see cref="IndexPipeline"/>: each <c>Use...</c> call registers one stage or
/// setting, <see cref="Build"/> loads what was registered (models once, for a whole run). A stage
/// given as an object (<see cref="UseSegmenter"/>, <see cref="UseTagger"/>,
/// <see cref="UseHeadingLexicon"/>) replaces the shipped one, which is how tests run fakes.</summary>
public sealed class IndexPipelineBuilder
{
    private ModelLocation _models = ModelLocation.Default;
    private bool _languageModel, _gazetteer, _nameModel, _nameLists;
    private string? _authorityPath;
    private ILanguageSegmenter? _segmenter;
    private INameTagger? _tagger;
    private IHeadingLexicon? _lexicon;
    private TranscriptFormat? _format;
    private string? _mainLanguage;
    private ImmutableArray<Decision> _decisions = [];
    private OutputWriters? _writers;
    private readonly List<INameSource> _nameSources = [];
    private NamePrecedence? _precedence;
    private TranscriptReaders _readers = TranscriptReaders.Default;

    public IndexPipelineBuilder UseModels(ModelLocation location) { _models = location; return this; }

    /// <summary>Where the shipped models are read from (part of a run's fingerprint).</summary>
    public ModelLocation Models => _models;

    /// <summary>The outputs registered so far.</summary>
    public OutputWriters Writers => _writers ?? OutputWriters.Default;

    /// <summary>The shipped language model (models/langid.bin); gazetteer places and listed names
    /// count as language-neutral words in it.</summary>
    public IndexPipelineBuilder UseLanguageModel() { _languageModel = true; return this; }

    /// <summary>The shipped gazetteer: place names for tagging and place links for headings.</summary>
    public IndexPipelineBuilder UseGazetteer() { _gazetteer = true; return this; }

    /// <summary>The shipped name lists (models/lexicon): person cues, words that are never places,
    /// locative prepositions and person name variants for the name cascade and person grouping.</summary>
    public IndexPipelineBuilder UseNameLists() { _nameLists = true; return this; }

    /// <summary>An archive's authority list (CSV label,name,variants); null registers nothing.</summary>
    public IndexPipelineBuilder UseAuthorityList(string? path) { _authorityPath = path; return this; }

    /// <summary>The shipped name model after the rules; when its file is missing the run goes on with
    /// the rules only and says so in a note.</summary>
    public IndexPipelineBuilder UseNameModel() { _nameModel = true; return this; }

    /// <summary>Every shipped stage: language model, gazetteer, name lists and, for
    /// <see cref="TaggingMode.RulesThenModel"/>, the name model.</summary>
    public IndexPipelineBuilder UseShippedModels(TaggingMode names)
    {
        UseLanguageModel().UseGazetteer().UseNameLists();
        return names == TaggingMode.RulesThenModel ? UseNameModel() : this;
    }

    /// <summary>Another name source beside the shipped ones; give it a place with <see cref="UseNamePrecedence"/>.</summary>
    public IndexPipelineBuilder UseNameSource(INameSource source) { _nameSources.Add(source); return this; }

    /// <summary>The policy deciding between overlapping names; <see cref="NamePrecedence.Default"/> when not given.</summary>
    public IndexPipelineBuilder UseNamePrecedence(NamePrecedence precedence) { _precedence = precedence; return this; }

    public IndexPipelineBuilder UseSegmenter(ILanguageSegmenter segmenter) { _segmenter = segmenter; return this; }

    public IndexPipelineBuilder UseTagger(INameTagger tagger) { _tagger = tagger; return this; }

    public IndexPipelineBuilder UseHeadingLexicon(IHeadingLexicon lexicon) { _lexicon = lexicon; return this; }

    /// <summary>Exactly these readers instead of the shipped ones.</summary>
    public IndexPipelineBuilder UseReaders(TranscriptReaders readers) { _readers = readers; return this; }

    /// <summary>Read every file as this format instead of detecting it; null detects.</summary>
    public IndexPipelineBuilder UseFormat(TranscriptFormat? format) { _format = format; return this; }

    /// <summary>The interviews' main language; null chooses it per interview (the language stage
    /// decides). A code the language stage does not support makes <see cref="Build"/> fail.</summary>
    public IndexPipelineBuilder UseMainLanguage(string? code) { _mainLanguage = code; return this; }

    public IndexPipelineBuilder UseDecisions(ImmutableArray<Decision> decisions) { _decisions = decisions.IsDefault ? [] : decisions; return this; }

    /// <summary>Adds a per-interview output to the shipped ones (or to those of <see cref="UseWriters"/>).</summary>
    public IndexPipelineBuilder UseWriter(IInterviewWriter writer) { (_writers ??= OutputWriters.Default).Add(writer); return this; }

    /// <summary>Adds a collection output to the shipped ones (or to those of <see cref="UseWriters"/>).</summary>
    public IndexPipelineBuilder UseWriter(ICollectionWriter writer) { (_writers ??= OutputWriters.Default).Add(writer); return this; }

    /// <summary>Exactly these outputs instead of the shipped ones.</summary>
    public IndexPipelineBuilder UseWriters(OutputWriters writers) { _writers = writers; return this; }

    /// <summary>Loads what was registered. On failure the result holds no pipeline and says why.</summary>
    public PipelineBuild Build()
    {
        var notes = ImmutableArray.CreateBuilder<Diagnostic>();
        if (_segmenter is null && !_languageModel)
            return PipelineBuild.Failed("no language stage registered (UseLanguageModel or UseSegmenter)");

        var gazetteer = Gazetteer.Empty;
        if (_gazetteer)
        {
            gazetteer = ShippedModels.LoadGazetteer(_models);
            notes.AddRange(gazetteer.Problems.Select(p => p with { Severity = Severity.Warning, Message = p.Message + "; places get no coordinates" }));
        }

        var lists = _nameLists ? NameListSet.Load(_models.PathOf(NameListSet.FolderName)) : NameListSet.Empty;

        AuthorityList? authority = null;
        if (_authorityPath is not null)
        {
            var (list, problems) = AuthorityList.Load(_authorityPath);
            if (list.Entries.IsEmpty && problems.Any(p => p.Severity == Severity.Error))
                return PipelineBuild.Failed(string.Join(Environment.NewLine, problems));
            notes.AddRange(problems);
            authority = list;
        }

        var segmenter = _segmenter;
        if (segmenter is null)
        {
            // Names on the archive's list are language-neutral too, like gazetteer places.
            INameLexicon names = authority is null ? gazetteer : new NameLexiconUnion(authority, gazetteer);
            segmenter = ShippedModels.LoadLanguageModel(_models, names, out var error);
            if (segmenter is null) return PipelineBuild.Failed(error!.ToString());
        }
        LanguageCode? main = null;
        if (_mainLanguage is not null)
        {
            if (!segmenter.Languages.Any(l => l.Code == _mainLanguage))
                return PipelineBuild.Failed($"--main \"{_mainLanguage}\" is not a supported language code; switchtag langid --languages lists them");
            main = new LanguageCode(_mainLanguage);
        }

        var tagger = _tagger;
        if (tagger is null)
        {
            NerModel? model = null;
            if (_nameModel && !File.Exists(_models.PathOf(ShippedModels.NameModelFile)))
                notes.Add(new Diagnostic(new SourceLine(_models.PathOf(ShippedModels.NameModelFile), 0), Severity.Warning,
                    "the name model is missing; names come from the authority list and gazetteer only"));
            else if (_nameModel)
            {
                model = ShippedModels.LoadNameModel(_models, out var error);
                if (model is null) return PipelineBuild.Failed(error!.ToString());
            }
            var sources = NameTagger.ShippedSources(model, authority, gazetteer, lists);
            foreach (var source in _nameSources) sources.Add(source);
            tagger = new NameTagger(sources, _precedence, NameTagger.ShippedVetoes(gazetteer, lists));
        }

        var pipeline = new IndexPipeline(_readers, segmenter, tagger, _lexicon ?? new HeadingLexicon(gazetteer, lists), _format, main, _decisions, Writers);
        return new PipelineBuild(pipeline, null, notes.ToImmutable());
    }
}

/// <summary>What <see cref="IndexPipelineBuilder.Build"/> gave: the pipeline, or null and the reason;
/// and notes about stages that run degraded (a missing gazetteer or name model, authority-list rows skipped).</summary>
public sealed record PipelineBuild(IndexPipeline? Pipeline, string? Error, ImmutableArray<Diagnostic> Notes)
{
    public static PipelineBuild Failed(string error) => new(null, error, []);
}
