using System.Diagnostics;
using Microsoft.Data.Sqlite;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Store.Tests;

// One collection: the child processes of these tests would otherwise compete for the CPU and
// stretch each other past their waits.
[Collection("child processes")]
public class KillTests
{
    /// <summary>A writer killed with SIGKILL in the middle of an interview's transaction leaves the
    /// store as it was before that interview (SQLite's rollback journal, sqlite.org/atomiccommit.html).</summary>
    [Fact]
    public void A_run_killed_mid_interview_leaves_the_store_as_before_that_interview()
    {
        using var dir = new TempDir();
        using var reference = new TempDir();
        using (var store = CollectionStore.Open(reference.Path)) store.Save(Interviews.Small(), "small", "test", [], DateTimeOffset.UnixEpoch);
        IReadOnlyDictionary<string, long> expected;
        using (var store = CollectionStore.Open(reference.Path)) expected = store.Counts();

        string child = ChildPath();
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var a in new[] { child, dir.Path, "4000" }) start.ArgumentList.Add(a);
        using var process = Process.Start(start)!;
        Assert.Equal("saved small", process.StandardOutput.ReadLine());
        string journal = Path.Combine(dir.Path, CollectionStore.DefaultFileName + "-journal");
        var waited = Stopwatch.StartNew();
        // Pages in the journal mean the transaction has changed the database: the kill lands mid-write.
        while (JournalBytes(journal) < 64 * 1024 && !process.HasExited && waited.Elapsed < TimeSpan.FromMinutes(2)) Thread.Sleep(1);
        Assert.True(JournalBytes(journal) >= 64 * 1024, "the child never got far into writing the large interview");
        process.Kill(); // SIGKILL on Linux: no handler, no cleanup
        process.WaitForExit();
        Assert.DoesNotContain("saved large", process.StandardOutput.ReadToEnd());

        using (var store = CollectionStore.Open(dir.Path))
        {
            Assert.Equal(expected, store.Counts());
            Assert.Equal(["small"], store.Interviews().Select(i => i.Folder));
        }
        using var connection = new SqliteConnection($"Data Source={Path.Combine(dir.Path, CollectionStore.DefaultFileName)};Pooling=False");
        connection.Open();
        using var check = connection.CreateCommand();
        check.CommandText = "PRAGMA integrity_check";
        Assert.Equal("ok", check.ExecuteScalar());
        Assert.False(File.Exists(journal), "the hot journal was rolled back and removed on open");
    }

    private static long JournalBytes(string path)
    {
        try { return new FileInfo(path).Length; }
        catch (FileNotFoundException) { return 0; }
    }

    /// <summary>The child is built beside this assembly's project, in the same configuration.</summary>
    private static string ChildPath()
    {
        string here = AppContext.BaseDirectory.TrimEnd(Path.DirectorySeparatorChar);
        string tfm = Path.GetFileName(here), configuration = Path.GetFileName(Path.GetDirectoryName(here)!);
        string path = Path.Combine(TestPaths.RepoRoot, "tests", "SwitchTag.Store.KillChild", "bin", configuration, tfm, "SwitchTag.Store.KillChild.dll");
        Assert.True(File.Exists(path), $"{path} is missing; build the solution first");
        return path;
    }
}
