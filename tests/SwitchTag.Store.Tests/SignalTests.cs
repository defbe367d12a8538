using System.Diagnostics;
using System.Runtime.InteropServices;
using System.Text;
using System.Text.Json;
using Microsoft.Data.Sqlite;
using SwitchTag.Output;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Store.Tests;

/// <summary>Issue 11 (found item 7, deliver item 3): a run ended by SIGTERM or SIGINT (signal numbers 15 and 2, POSIX
/// signal.h on Linux) leaves no temporary file, no hidden half folder and no hot store journal, and
/// the outputs of earlier runs stay whole. The command runs as a child process, as a person runs it.</summary>
// One collection: the child processes of these tests would otherwise compete for the CPU and
// stretch each other past their waits.
[Collection("child processes")]
public class SignalTests
{
    private static readonly string Demo = Path.Combine(TestPaths.RepoRoot, "transcripts-demo", "kowalczyk-1998.vtt");

    [DllImport("libc", SetLastError = true)]
    private static extern int kill(int pid, int signal);

    [Theory]
    [InlineData(15)] // SIGTERM
    [InlineData(2)] // SIGINT
    public void A_signal_mid_run_leaves_nothing_half_written_and_earlier_outputs_whole(int signal)
    {
        using var dir = new TempDir();
        string input = Path.Combine(dir.Path, "in"), outDir = Path.Combine(dir.Path, "out");
        Copies(input, "first", 3);
        using (var first = Start(input, outDir))
        {
            first.Process.WaitForExit();
            Assert.True(first.Process.ExitCode == 0, first.Log());
        }
        var before = Folders(outDir).ToDictionary(f => f, f => File.ReadAllBytes(Path.Combine(f, "index.json")));
        Assert.Equal(3, before.Count);

        // Many more interviews, one at a time: the signal lands while some are still to do.
        Copies(input, "more", 60);
        // Woken by the file system (inotify) when a folder appears in OUT or the child ends, not by a
        // timer: each wake re-counts, so no event can be missed between a count and the wait.
        using var changed = new AutoResetEvent(false);
        using var watcher = new FileSystemWatcher(outDir) { NotifyFilter = NotifyFilters.DirectoryName };
        watcher.Created += (_, _) => changed.Set();
        watcher.Renamed += (_, _) => changed.Set();
        watcher.EnableRaisingEvents = true;
        using var run = Start(input, outDir, "--force");
        run.Process.EnableRaisingEvents = true;
        run.Process.Exited += (_, _) => changed.Set();
        var waited = Stopwatch.StartNew();
        while (Folders(outDir).Count < before.Count + 4 && !run.Process.HasExited)
            Assert.True(changed.WaitOne(TimeSpan.FromMinutes(3) - waited.Elapsed is { Ticks: > 0 } left ? left : TimeSpan.Zero), "no interview folder appeared within 3 minutes: " + run.Log());
        Assert.False(run.Process.HasExited, "the run ended before the signal: " + run.Log());
        Assert.Equal(0, kill(run.Process.Id, signal));
        Assert.True(run.Process.WaitForExit(TimeSpan.FromMinutes(2)), "the run did not end after the signal");
        string log = run.Log();
        Assert.NotEqual(0, run.Process.ExitCode);
        Assert.DoesNotContain("interviews indexed", log); // stopped mid-run, not at its end

        // Nothing hidden (swap folders, AtomicFile temp files) and no hot journal is left anywhere.
        Assert.Empty(Directory.GetFileSystemEntries(outDir, ".*", SearchOption.AllDirectories));
        Assert.False(File.Exists(Path.Combine(outDir, CollectionStore.DefaultFileName + "-journal")), log);
        // Every interview folder holds its whole set, and the earlier ones are what they were (the
        // run is deterministic, so a redone interview writes the same bytes).
        var folders = Folders(outDir);
        Assert.True(folders.Count < 63, log);
        foreach (var folder in folders)
        {
            Assert.Equal(OutputWriters.Default.InterviewFileNames.Order(StringComparer.Ordinal),
                Directory.GetFiles(folder).Select(Path.GetFileName).Order(StringComparer.Ordinal));
            using var json = JsonDocument.Parse(File.ReadAllBytes(Path.Combine(folder, "index.json")));
        }
        foreach (var (folder, bytes) in before) Assert.Equal(bytes, File.ReadAllBytes(Path.Combine(folder, "index.json")));
        // The store is whole (SQLite's own check) and names only folders that are there.
        using (var store = CollectionStore.Open(outDir))
            Assert.All(store.Interviews(), i => Assert.True(File.Exists(Path.Combine(outDir, i.Folder, "index.json")), i.Folder));
        using (var connection = new SqliteConnection($"Data Source={Path.Combine(outDir, CollectionStore.DefaultFileName)};Pooling=False"))
        {
            connection.Open();
            using var check = connection.CreateCommand();
            check.CommandText = "PRAGMA integrity_check";
            Assert.Equal("ok", check.ExecuteScalar());
        }

        // The next run finds nothing to sweep and finishes the collection.
        using var again = Start(input, outDir);
        again.Process.WaitForExit();
        Assert.True(again.Process.ExitCode == 0, again.Log());
        Assert.DoesNotContain("removed what an interrupted run left", again.Log());
        Assert.Equal(63, Folders(outDir).Count);
    }

    private static void Copies(string folder, string prefix, int count)
    {
        Directory.CreateDirectory(folder);
        for (int i = 0; i < count; i++) File.Copy(Demo, Path.Combine(folder, $"{prefix}-{i:D3}.vtt"));
    }

    /// <summary>The interview folders of OUT that hold an index.json.</summary>
    private static List<string> Folders(string outDir) =>
        Directory.Exists(outDir)
            ? Directory.EnumerateDirectories(outDir).Where(d => !Path.GetFileName(d).StartsWith('.') && File.Exists(Path.Combine(d, "index.json"))).ToList()
            : [];

    private sealed class Child(Process process, StringBuilder log) : IDisposable
    {
        public Process Process { get; } = process;

        public string Log()
        {
            lock (log) return log.ToString();
        }

        public void Dispose()
        {
            if (!Process.HasExited) Process.Kill();
            Process.Dispose();
        }
    }

    /// <summary>The command as <see cref="BuiltCli"/> builds it, rules-only with the shipped models.</summary>
    private static Child Start(string input, string outDir, params string[] more)
    {
        var start = BuiltCli.Start(["index", input, "--out", outDir, "--names", "rules-only", "--main", "en", "--jobs", "1", .. more]);
        var log = new StringBuilder();
        var process = new Process { StartInfo = start };
        process.ErrorDataReceived += (_, e) => { lock (log) log.AppendLine(e.Data); };
        process.OutputDataReceived += (_, e) => { lock (log) log.AppendLine(e.Data); };
        process.Start();
        process.BeginErrorReadLine();
        process.BeginOutputReadLine();
        return new Child(process, log);
    }
}
