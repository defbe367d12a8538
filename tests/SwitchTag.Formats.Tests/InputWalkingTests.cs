using System.Diagnostics;
using System.Net.Sockets;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Files;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>Input walking (FORMATS.md, "Files and folders"): each real file once, loops reported, only
/// regular files read, a size limit. File kinds and link rules are POSIX's (stat(2), symlink(7),
/// path_resolution(7): a path may pass at most 40 links on Linux; from memory of the man pages).</summary>
public sealed class InputWalkingTests : IDisposable
{
    private const string Vtt = "WEBVTT\n\n00:01.000 --> 00:02.000\nHello there.\n";
    private readonly string root = Path.Combine(Path.GetTempPath(), "switchtag-walk-" + Guid.NewGuid().ToString("N"));

    public InputWalkingTests() => Directory.CreateDirectory(root);

    public void Dispose() => Directory.Delete(root, recursive: true);

    private string Write(string relative, string text = Vtt)
    {
        string path = Path.Combine(root, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text);
        return path;
    }

    private (List<string> Files, List<Diagnostic> Problems) Expand(params string[] paths)
    {
        var problems = new List<Diagnostic>();
        return ([.. TranscriptFile.Expand(paths, problems)], problems);
    }

    [Fact]
    public void Hidden_entries_are_reported_with_a_count_and_the_first_paths_but_the_tools_temporary_names_are_not()
    {
        // Issue 11: hidden files in walked folders were skipped silently. The temporary names are the
        // tool's own (AtomicFile: ".NAME.PID.GUID.tmp"; FolderSwap: ".switchtag-new-*", ".switchtag-old-*").
        Write("a.vtt");
        Write(".draft.vtt");
        Write(".notes/b.vtt");
        Write("sub/.c.vtt");
        Write("sub/.DS_Store", "x");
        Write(".index.json.4242." + new string('0', 32) + ".tmp", "half");
        Write(".switchtag-new-a.0123/index.json", "{}");
        Write(".switchtag-old-a.0123/index.json", "{}");
        var (files, problems) = Expand(root);
        Assert.Equal([Path.Combine(root, "a.vtt")], files);
        var note = Assert.Single(problems);
        Assert.Equal(Severity.Warning, note.Severity);
        Assert.Equal(root, note.At.Path);
        Assert.Equal($"4 hidden entries (name starting with '.') not read: {Path.Combine(root, ".draft.vtt")}, {Path.Combine(root, ".notes")}, "
            + $"{Path.Combine(root, "sub", ".DS_Store")}, and 1 more", note.Message);
    }

    [Fact]
    public void A_folder_without_hidden_entries_gives_no_warning()
    {
        Write("a.vtt");
        Write(".switchtag-new-a.0123/index.json", "{}");
        Assert.Empty(Expand(root).Problems);
    }

    [Fact]
    public void A_link_to_the_parent_folder_is_reported_as_a_loop_and_each_file_read_once()
    {
        // Issue reproduction: `ln -s .. loop/up` indexed every file 41 times.
        Write("a.vtt");
        Write("loop/b.vtt");
        File.CreateSymbolicLink(Path.Combine(root, "loop", "up"), "..");
        var (files, problems) = Expand(root);
        Assert.Equal([Path.Combine(root, "a.vtt"), Path.Combine(root, "loop", "b.vtt")], files);
        var loop = Assert.Single(problems);
        Assert.Equal(Severity.Warning, loop.Severity);
        Assert.Contains("symbolic link loop", loop.Message);
        Assert.Equal(Path.Combine(root, "loop", "up"), loop.At.Path);
    }

    [Fact]
    public void Two_loops_finish_and_a_second_way_into_a_folder_reads_nothing_twice()
    {
        // Issue reproduction: two such links never finished while memory grew.
        Write("x/a.vtt");
        Write("y/b.vtt");
        File.CreateSymbolicLink(Path.Combine(root, "x", "up"), "..");
        File.CreateSymbolicLink(Path.Combine(root, "y", "up"), "..");
        File.CreateSymbolicLink(Path.Combine(root, "x", "to-y"), Path.Combine(root, "y"));
        var (files, problems) = Expand(root, Path.Combine(root, "y"));
        Assert.Equal(2, files.Count);
        Assert.Equal(2, files.Select(f => Path.GetFileName(f)).Distinct().Count());
        Assert.Equal(2, problems.Count(p => p.Message.Contains("loop")));
    }

    [Fact]
    public void Two_links_to_one_file_give_it_once()
    {
        string real = Write("real.vtt");
        File.CreateSymbolicLink(Path.Combine(root, "alias.vtt"), real);
        var (files, problems) = Expand(root, real);
        Assert.Single(files);
        Assert.Empty(problems);
    }

    [Fact]
    public void A_link_chain_that_never_ends_is_an_error_not_a_hang()
    {
        File.CreateSymbolicLink(Path.Combine(root, "a.vtt"), "b.vtt");
        File.CreateSymbolicLink(Path.Combine(root, "b.vtt"), "a.vtt");
        Assert.Null(RealPath.Resolve(Path.Combine(root, "a.vtt"), out var error));
        Assert.Contains("link loop", error);
        var (files, problems) = Expand(root);
        Assert.Empty(files);
        Assert.Equal(2, problems.Count);
        Assert.Contains("cannot read", Reads.SingleError(TranscriptFile.Read(Path.Combine(root, "a.vtt"))).Message);
    }

    [Fact]
    public void A_link_to_dev_zero_is_refused_without_reading_it()
    {
        // Issue reproduction: an OutOfMemoryException at File.ReadAllBytes, later files never read.
        Write("ok.vtt");
        string zero = Path.Combine(root, "zero.txt");
        File.CreateSymbolicLink(zero, "/dev/zero");
        var (files, problems) = Expand(root);
        Assert.Equal([Path.Combine(root, "ok.vtt")], files);
        Assert.Contains("character device", Assert.Single(problems).Message);
        var e = Reads.SingleError(TranscriptFile.Read(zero));
        Assert.Contains("not a regular file (a character device)", e.Message);
        Assert.Equal(TranscriptFile.WholeFile, e.At.Line);
    }

    [Fact]
    public void A_named_pipe_is_refused_not_waited_on()
    {
        // Issue reproduction: a FIFO hung the run forever. mkfifo(1) makes one.
        string fifo = Path.Combine(root, "pipe.vtt");
        using (var mk = Process.Start(new ProcessStartInfo("mkfifo", [fifo]))!) mk.WaitForExit();
        Assert.Equal(FileKind.NamedPipe, FileKinds.Of(fifo));
        var (files, problems) = Expand(root);
        Assert.Empty(files);
        Assert.Contains("named pipe", Assert.Single(problems).Message);
        Assert.Contains("named pipe", Reads.SingleError(TranscriptFile.Read(fifo)).Message);
        Assert.Contains("named pipe", Assert.Single(Expand(fifo).Problems).Message);
    }

    [Fact]
    public void A_socket_is_refused()
    {
        string path = Path.Combine(root, "s.srt");
        using var socket = new Socket(AddressFamily.Unix, SocketType.Stream, ProtocolType.Unspecified);
        socket.Bind(new UnixDomainSocketEndPoint(path));
        Assert.Equal(FileKind.Socket, FileKinds.Of(path));
        Assert.Contains("socket", Assert.Single(Expand(root).Problems).Message);
        Assert.Contains("socket", Reads.SingleError(TranscriptFile.Read(path)).Message);
    }

    [Fact]
    public void A_file_over_the_size_limit_is_refused_with_the_limit_named()
    {
        string path = Write("big.vtt", Vtt + new string('x', 500));
        var e = Reads.SingleError(TranscriptFile.Read(path, maxBytes: 100));
        Assert.Contains("larger than the limit of 100 bytes", e.Message);
        Assert.NotNull(TranscriptFile.Read(path).Transcript);
    }

    [Fact]
    public void A_broken_link_is_reported()
    {
        File.CreateSymbolicLink(Path.Combine(root, "gone.vtt"), Path.Combine(root, "nowhere.vtt"));
        Assert.Contains("broken symbolic link", Assert.Single(Expand(root).Problems).Message);
        Assert.Contains("broken symbolic link", Assert.Single(Expand(Path.Combine(root, "gone.vtt")).Problems).Message);
    }

    [Fact]
    public void The_tools_own_outputs_are_skipped_only_beside_its_index_json()
    {
        // Issue reproduction: with --out inside the input, a second run read annotated.vtt back in.
        Write("smith.vtt");
        Write("out/smith/index.json", "{\n  \"schema\": \"switchtag.index/1\",\n  \"interview\": \"smith\"\n}");
        Write("out/smith/annotated.vtt");
        Write("out/smith/index.md", "[00:00:01] A: x\n");
        Write("out/smith/notes.md", "[00:00:01] A: kept\n");
        Write("other/index.md", "[00:00:01] A: a transcript that happens to be called index\n");
        Write("other/index.json", "{\"schema\": \"someone.else/1\"}");
        Write("README.md", "[00:00:01] not a transcript\n");
        var (files, problems) = Expand(root);
        Assert.Empty(problems);
        Assert.Equal(
            [Path.Combine(root, "other", "index.md"), Path.Combine(root, "out", "smith", "notes.md"), Path.Combine(root, "smith.vtt")],
            files);
    }

    [Fact]
    public void Walk_reports_the_real_path_and_the_input_root()
    {
        string real = Write("deep/real.vtt");
        File.CreateSymbolicLink(Path.Combine(root, "alias"), Path.Combine(root, "deep"));
        var found = InputWalker.Find([root], new List<Diagnostic>());
        var file = Assert.Single(found);
        Assert.Equal(root, file.Root);
        Assert.Equal(real, file.RealPath);
    }
}
