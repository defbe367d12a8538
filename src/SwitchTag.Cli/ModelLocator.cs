namespace SwitchTag.Cli;

/// <summary>Finds the shipped <c>models/</c> folder: <c>SWITCHTAG_MODELS</c> if set, else the first
/// <c>models/</c> folder above the running binary (a checkout's launcher builds under scripts/.build).</summary>
public static class ModelLocator
{
    public static string ModelsDirectory { get; } = Find();

    public static string PathOf(string fileName) => Path.Combine(ModelsDirectory, fileName);

    private static string Find()
    {
        var env = Environment.GetEnvironmentVariable("SWITCHTAG_MODELS");
        if (!string.IsNullOrEmpty(env)) return env;
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "models");
            if (Directory.Exists(candidate) && File.Exists(Path.Combine(dir.FullName, "SwitchTag.sln")))
                return candidate;
        }
        return Path.Combine(AppContext.BaseDirectory, "models");
    }
}
