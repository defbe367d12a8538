using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Training;
using SwitchTag.Tests.Shared;

namespace SwitchTag.LanguageId.Tests;

/// <summary>The shipped model (models/langid.bin) and, on first use, the corpus from ../shared/data
/// (UD sentences in lid/, Universal NER train text, NerKor), shared by all tests.</summary>
public sealed class ModelFixture
{
    private readonly Lazy<List<CorpusLine>> _corpus = new(() => LidCorpus.Load(TestPaths.RequireData()));

    public CodeSwitchSegmenter Segmenter { get; } =
        CodeSwitchSegmenter.Load(Path.Combine(TestPaths.RepoRoot, "models", "langid.bin"));

    public List<CorpusLine> Corpus => _corpus.Value;
}

[CollectionDefinition(nameof(ModelCollection))]
public sealed class ModelCollection : ICollectionFixture<ModelFixture>;
