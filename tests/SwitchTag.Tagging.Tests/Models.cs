using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Tagging.Tests;

/// <summary>The shipped model (the checkout's models/ folder, or SWITCHTAG_MODELS as the CLI's
/// ModelLocation reads it), loaded once for all tests.</summary>
internal static class Models
{
    public static string Directory { get; } =
        Environment.GetEnvironmentVariable("SWITCHTAG_MODELS") is { Length: > 0 } env ? env : Path.Combine(TestPaths.RepoRoot, "models");

    public static NerModel Ner => NerModel.Shared(Directory);
}
