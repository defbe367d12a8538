using SwitchTag.Core.Documents;
using SwitchTag.Formats.Files;
using Xunit;

namespace SwitchTag.Formats.Tests;

/// <summary>The helpers a run uses to keep its output apart from its input (FORMATS.md, "Output
/// folder safety"): where the output folder sits against the inputs, and a stable id per input.</summary>
public sealed class OutputSafetyTests : IDisposable
{
    private readonly string root = Path.Combine(Path.GetTempPath(), "switchtag-safety-" + Guid.NewGuid().ToString("N"));

    public OutputSafetyTests() => Directory.CreateDirectory(root);

    public void Dispose() => Directory.Delete(root, recursive: true);

    private string Write(string relative)
    {
        string path = Path.Combine(root, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, "WEBVTT\n\n00:01.000 --> 00:02.000\nx\n");
        return path;
    }

    [Fact]
    public void Output_folder_equal_to_or_inside_an_input_folder_is_found()
    {
        // Issue reproduction: `switchtag index archive --out archive` replaced archive/smith/index.md.
        string archive = Path.GetDirectoryName(Write("archive/smith/index.md"))!;
        archive = Path.GetDirectoryName(archive)!;
        var same = Assert.Single(OutputSafety.Check(archive, [archive]));
        Assert.Equal(OutputConflict.OutputInsideInput, same.Kind);
        Assert.Equal(OutputConflict.OutputInsideInput, Assert.Single(OutputSafety.Check(Path.Combine(archive, "out", "new"), [archive])).Kind);
        Assert.Empty(OutputSafety.Check(Path.Combine(root, "elsewhere"), [archive]));
        // A link to the input folder is the input folder.
        string link = Path.Combine(root, "link");
        File.CreateSymbolicLink(link, archive);
        Assert.Single(OutputSafety.Check(Path.Combine(link, "out"), [archive]));
        // A sibling whose name starts the same is not inside.
        Assert.Empty(OutputSafety.Check(archive + "-out", [archive]));
    }

    [Fact]
    public void Input_inside_the_output_folder_is_found()
    {
        string file = Write("out/smith/annotated.vtt");
        var conflict = Assert.Single(OutputSafety.Check(Path.Combine(root, "out"), [file]));
        Assert.Equal(OutputConflict.InputInsideOutput, conflict.Kind);
        Assert.Contains("may replace it", conflict.ToString());
    }

    [Fact]
    public void A_skipped_output_folder_is_never_walked()
    {
        Write("archive/a.vtt");
        Write("archive/out/a/notes.vtt");
        string archive = Path.Combine(root, "archive");
        var all = InputWalker.Find([archive], new List<Diagnostic>());
        Assert.Equal(2, all.Length);
        var kept = InputWalker.Find([archive], new List<Diagnostic>(), [RealPath.Resolve(Path.Combine(archive, "out"), out _)!]);
        Assert.Equal(Path.Combine(archive, "a.vtt"), Assert.Single(kept).Path);
    }

    [Fact]
    public void Interview_ids_are_relative_paths_made_unique_by_extension_then_root()
    {
        // Issue reproduction: two inputs called "same" in different folders were one interview "same".
        Write("a/one/same.vtt");
        Write("a/two/same.vtt");
        Write("a/two/pair.vtt");
        Write("a/two/pair.srt");
        Write("b/one/same.vtt");
        Write("c.txt");
        var files = InputWalker.Find([Path.Combine(root, "a"), Path.Combine(root, "b"), Path.Combine(root, "c.txt")], new List<Diagnostic>());
        var ids = InterviewIds.Assign(files);
        Assert.Equal("a/one/same|two/pair.srt|two/pair.vtt|two/same|b/one/same|c", string.Join('|', ids));
        Assert.Equal(ids.ToArray(), InterviewIds.Assign(files).ToArray()); // stable
    }
}
