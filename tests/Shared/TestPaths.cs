namespace SwitchTag.Tests.Shared;

/// <summary>Finds the repository root and the read-only shared data folder (<c>../shared/data</c>
/// beside the checkout). Tests that need the data call <see cref="RequireData"/>, which fails with a
/// plain message when the folder is absent rather than letting the test pass silently.</summary>
public static class TestPaths
{
    public static string RepoRoot { get; } = FindRepoRoot();

    public static string? DataRoot { get; } = FindData();

    public static string RequireData(string relative = "")
    {
        if (DataRoot is null)
            throw new InvalidOperationException(
                "The shared data folder ../shared/data was not found beside the checkout (or in SWITCHTAG_DATA); " +
                "this test checks against it and cannot run without it.");
        return Path.Combine(DataRoot, relative);
    }

    private static string FindRepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SwitchTag.sln")))
            dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("SwitchTag.sln not found above " + AppContext.BaseDirectory);
    }

    private static string? FindData()
    {
        var env = Environment.GetEnvironmentVariable("SWITCHTAG_DATA");
        if (!string.IsNullOrEmpty(env) && Directory.Exists(env)) return env;
        var candidate = Path.GetFullPath(Path.Combine(RepoRoot, "..", "shared", "data"));
        return Directory.Exists(candidate) ? candidate : null;
    }
}
