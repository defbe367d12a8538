using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Indexing;
using SwitchTag.LanguageId.Segmentation;
using SwitchTag.Lexicon;
using SwitchTag.Output;
using SwitchTag.Pipeline.Models;
using SwitchTag.Store;
using SwitchTag.Tagging;

namespace SwitchTag.Pipeline.Collection;

/// <summary>What an interview's outputs depend on besides its own bytes: the model files, the
/// authority and decisions files, the options that change results, and the code (the module ids of
/// SwitchTag's own assemblies, which a deterministic build derives from their content). Two runs with
/// equal fingerprints make equal outputs from equal input, so an unchanged interview can be skipped.</summary>
public static class RunFingerprint
{
    public static string Of(IndexRequest request, ModelLocation models)
    {
        var parts = new List<string>
        {
            $"main={request.MainLanguage}", $"names={request.Names}", $"format={request.Format?.Name}", $"media={request.Media}",
            $"authority={HashOf(request.AuthorityPath)}",
            $"decisions={Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join('\n', request.Decisions))))}",
        };
        // Every model file (the cards, *.md, change nothing an index holds).
        if (Directory.Exists(models.Directory))
            foreach (var model in Directory.EnumerateFiles(models.Directory).Where(f => !f.EndsWith(".md", StringComparison.Ordinal)).Order(StringComparer.Ordinal))
                parts.Add($"{Path.GetFileName(model)}={HashOf(model)}");
        foreach (var assembly in CodeAssemblies)
            parts.Add($"{assembly.GetName().Name}={assembly.ManifestModule.ModuleVersionId:N}");
        return "v1:" + Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(string.Join('\n', parts))))[..32];
    }

    private static readonly Assembly[] CodeAssemblies =
    [
        typeof(InterviewIndex).Assembly, typeof(TranscriptFile).Assembly, typeof(NameFolding).Assembly, typeof(CodeSwitchSegmenter).Assembly,
        typeof(NameTagger).Assembly, typeof(IndexBuilder).Assembly, typeof(OutputWriters).Assembly, typeof(CollectionStore).Assembly,
        typeof(RunFingerprint).Assembly,
    ];

    private static string HashOf(string? path)
    {
        if (path is null || !File.Exists(path)) return "none";
        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(SHA256.HashData(stream));
    }
}
