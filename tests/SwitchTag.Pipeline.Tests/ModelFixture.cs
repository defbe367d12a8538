using SwitchTag.LanguageId.Segmentation;
using SwitchTag.LanguageId.Training;
using SwitchTag.Pipeline.Models;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Pipeline.Tests;

/// <summary>The shipped language model, loaded the way the commands load it, and on first use the
/// corpus from ../shared/data (UD sentences in lid/), shared by the contract tests.</summary>
public sealed class ModelFixture
{
    private readonly Lazy<List<CorpusLine>> _corpus = new(() => LidCorpus.Load(TestPaths.RequireData()));

    public CodeSwitchSegmenter Segmenter { get; } =
        ShippedModels.LoadLanguageModel(new ModelLocation(Path.Combine(TestPaths.RepoRoot, "models")), null, out var error)
        ?? throw new InvalidOperationException(error!.ToString());

    public List<CorpusLine> Corpus => _corpus.Value;
}

[CollectionDefinition(nameof(ModelCollection))]
public sealed class ModelCollection : ICollectionFixture<ModelFixture>;
