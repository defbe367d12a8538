using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.Lexicon;
using SwitchTag.Output;
using SwitchTag.Tagging;

namespace SwitchTag.Cli;

/// <summary>What an interview's index depends on besides its own bytes: the model files, the
/// authority and decisions files, the options that change results, and the code (the module ids of
/// SwitchTag's own assemblies, which a deterministic build derives from their content). Two runs with
/// equal fingerprints make equal outputs from equal input, so an unchanged interview can be skipped.</summary>
public static class ModelFingerprint
{
    public static string Of(IndexOptions options)
    {
        var parts = new List<string>
        {
            $"main={options.MainLanguage}", $"names={options.Names}", $"format={options.Format}",
            $"authority={HashOf(options.AuthorityPath)}",
            $"decisions={Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join('\n', options.Decisions))))}",
        };
        foreach (var model in new[] { "langid.bin", "gazetteer.bin.gz", "ner.onnx", "ner.spm", "ner.labels.json" })
            parts.Add($"{model}={HashOf(ModelLocator.PathOf(model))}");
        foreach (var assembly in CodeAssemblies)
            parts.Add($"{assembly.GetName().Name}={assembly.ManifestModule.ModuleVersionId:N}");
        return "v1:" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join('\n', parts))))[..32];
    }

    private static readonly Assembly[] CodeAssemblies =
    [
        typeof(InterviewIndex).Assembly, typeof(TranscriptFile).Assembly, typeof(NameFolding).Assembly, typeof(CodeSwitchSegmenter).Assembly,
        typeof(NameTagger).Assembly, typeof(IndexBuilder).Assembly, typeof(InterviewOutputs).Assembly, typeof(ModelFingerprint).Assembly,
    ];

    private static string HashOf(string? path)
    {
        if (path is null || !File.Exists(path)) return "none";
        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(SHA256.HashData(stream));
    }
}
