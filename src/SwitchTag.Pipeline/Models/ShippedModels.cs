using SwitchTag.Core.Stages;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.Lexicon;
using SwitchTag.Tagging;

namespace SwitchTag.Pipeline.Models;

/// <summary>The models of models/ by file name, each loaded through <see cref="ModelLoader"/>.</summary>
public static class ShippedModels
{
    public const string LanguageModelFile = "langid.bin";
    public const string NameModelFile = "ner.onnx";

    public static CodeSwitchSegmenter? LoadLanguageModel(ModelLocation at, INameLexicon? names, out ModelLoadError? error)
    {
        string path = at.PathOf(LanguageModelFile);
        return ModelLoader.Load(path, "language model", "scripts/train-langid", () => CodeSwitchSegmenter.Load(path, names), out error);
    }

    public static NerModel? LoadNameModel(ModelLocation at, out ModelLoadError? error) =>
        ModelLoader.Load(at.PathOf(NameModelFile), "name model", "scripts/train-ner", () => NerModel.Shared(at.Directory), out error);

    /// <summary>The gazetteer, or an empty one whose <see cref="Gazetteer.Problems"/> say why: places
    /// then get no coordinates, which is a note, not a failure.</summary>
    public static Gazetteer LoadGazetteer(ModelLocation at) => Gazetteer.Load(at.PathOf(Gazetteer.FileName));
}
