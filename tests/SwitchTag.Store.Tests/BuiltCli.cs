using System.Diagnostics;
using SwitchTag.Tests.Shared;

namespace SwitchTag.Store.Tests;

/// <summary>The switchtag command, built from this checkout's sources once per test run, for the
/// tests that run it as a process as a person does: no project references the exe. The build has
/// its own MSBuild artifacts folder under this project's obj/, so it shares no file with the build
/// that runs the tests, and it is incremental across runs.</summary>
public static class BuiltCli
{
    private static readonly Lazy<string> Dll = new(Build);

    /// <summary>A start for <c>dotnet switchtag.dll ARGS</c> with both streams redirected.</summary>
    public static ProcessStartInfo Start(params string[] args)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        start.ArgumentList.Add(Dll.Value);
        foreach (var a in args) start.ArgumentList.Add(a);
        return start;
    }

    private static string Build()
    {
        // The configuration this assembly was built in: bin/CONFIGURATION/TFM/.
        string configuration = Path.GetFileName(Path.GetDirectoryName(AppContext.BaseDirectory.TrimEnd(Path.DirectorySeparatorChar))!);
        string artifacts = Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Store.Tests", "obj", "cli");
        string project = Path.Combine(TestPaths.RepoRoot, "src", "SwitchTag.Cli", "SwitchTag.Cli.csproj");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var a in new[] { "build", project, "-c", configuration, "--artifacts-path", artifacts, "-m:1", "-nodeReuse:false", "-nologo", "-v", "quiet" })
            start.ArgumentList.Add(a);
        using var build = Process.Start(start)!;
        var errors = build.StandardError.ReadToEndAsync();
        string output = build.StandardOutput.ReadToEnd();
        build.WaitForExit();
        if (build.ExitCode != 0) throw new InvalidOperationException($"building {project} failed:\n{output}{errors.Result}");
        // The artifacts layout (learn.microsoft.com, "Artifacts output layout"): bin/PROJECT/PIVOT, the pivot the lower-cased configuration.
        string dll = Path.Combine(artifacts, "bin", "SwitchTag.Cli", configuration.ToLowerInvariant(), "switchtag.dll");
        return File.Exists(dll) ? dll : throw new InvalidOperationException($"{dll} is missing after building {project}");
    }
}
