namespace SwitchTag.Pipeline.Models;

/// <summary>The folder holding the shipped models. <see cref="Default"/> is <c>SWITCHTAG_MODELS</c>
/// if set, else the first <c>models/</c> folder above the running binary that sits beside a
/// <c>SwitchTag.sln</c> (a checkout's launcher builds under scripts/.build).</summary>
public sealed record ModelLocation(string Directory)
{
    public static ModelLocation Default { get; } = new(Find());

    public string PathOf(string fileName) => Path.Combine(Directory, fileName);

    private static string Find()
    {
        var env = Environment.GetEnvironmentVariable("SWITCHTAG_MODELS");
        if (!string.IsNullOrEmpty(env)) return env;
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "models");
            if (System.IO.Directory.Exists(candidate) && File.Exists(Path.Combine(dir.FullName, "SwitchTag.sln")))
                return candidate;
        }
        return Path.Combine(AppContext.BaseDirectory, "models");
    }
}
