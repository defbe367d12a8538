using System.Text.Json;
using SwitchTag.Tagging;
using SwitchTag.Tests.Shared;
using Xunit;

namespace SwitchTag.Pipeline.Tests;

/// <summary>Reproductions from issue 11 (output folder safety, decisions and authority files), each
/// run through the library's whole run with the shipped rules-only stages.</summary>
public class OutputSafetyRunTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "switchtag-safety-" + Guid.NewGuid().ToString("N"));
    private static readonly string Demo = Path.Combine(TestPaths.RepoRoot, "transcripts-demo", "kowalczyk-1998.vtt");

    public OutputSafetyRunTests() => Directory.CreateDirectory(_dir);

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Input(string relative)
    {
        string path = Path.Combine(_dir, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.Copy(Demo, path);
        return path;
    }

    private (IndexRunResult Result, string Log) Run(IndexRequest request)
    {
        var log = new StringWriter();
        return (IndexRun.Execute(request, log), log.ToString());
    }

    [Fact]
    public void A_hidden_file_in_an_input_folder_is_reported_and_the_run_still_succeeds()
    {
        // Issue 11: hidden files were skipped without a word. Skipped on purpose, so no failed run.
        Input(Path.Combine("in", "kowalczyk-1998.vtt"));
        string hidden = Input(Path.Combine("in", ".kowalczyk-1998.draft.vtt"));
        var request = new IndexRequest([Path.Combine(_dir, "in")], Path.Combine(_dir, "out"), null, "en", TaggingMode.RulesOnly, null, [], []);
        var (result, log) = Run(request);
        Assert.Equal(IndexRunResult.Indexed, result);
        Assert.Contains($"warning: 1 hidden entry (name starting with '.') not read: {hidden}", log);
    }

    [Fact]
    public void A_file_named_dots_writes_inside_out_under_a_safe_folder()
    {
        // Issue 11 item 1: "...txt" used to become interview "..", whose files landed beside --out.
        string vtt = Path.Combine(_dir, "in", "....vtt");
        Directory.CreateDirectory(Path.GetDirectoryName(vtt)!);
        File.Copy(Demo, vtt);
        string outDir = Path.Combine(_dir, "out");
        var (result, log) = Run(new IndexRequest([vtt], outDir, null, "en", TaggingMode.RulesOnly, null, [], []));
        Assert.Equal(IndexRunResult.Indexed, result);
        Assert.Equal(["index.json"], Directory.GetFiles(_dir, "index.json", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(outDir, f)).Select(f => Path.GetFileName(f)).ToArray());
        Assert.True(File.Exists(Path.Combine(outDir, "interview", "index.json")), log);
    }

    [Fact]
    public void An_interview_named_like_the_runs_own_file_does_not_block_the_collection()
    {
        // Issue 11 item 9: a file named collection.json.txt used to block the collection index.
        string file = Input(Path.Combine("in", "collection.json.vtt"));
        string outDir = Path.Combine(_dir, "out");
        var (result, _) = Run(new IndexRequest([file], outDir, null, "en", TaggingMode.RulesOnly, null, [], []));
        Assert.Equal(IndexRunResult.Indexed, result);
        Assert.True(File.Exists(Path.Combine(outDir, "collection.json")));
        Assert.True(File.Exists(Path.Combine(outDir, "collection.json-2", "index.json")));
    }

    [Fact]
    public void An_out_folder_inside_an_input_is_a_usage_error_unless_allowed_and_then_never_read()
    {
        // Issue 11 item 2: "--out archive" over the input "archive" replaced archive/smith/index.md.
        Input(Path.Combine("archive", "smith", "interview.vtt"));
        string archive = Path.Combine(_dir, "archive");
        Assert.Null(IndexRequest.From([archive], archive, null, "en", "rules-only", null, null, out string? usage));
        Assert.Contains("--allow-out-inside-input", usage);
        string inside = Path.Combine(archive, "index");
        Assert.Null(IndexRequest.From([archive], inside, null, "en", "rules-only", null, null, out usage));

        var request = IndexRequest.From([archive], inside, null, "en", "rules-only", null, null, out usage, allowOutInsideInput: true);
        Assert.NotNull(request);
        Assert.Equal(IndexRunResult.Indexed, Run(request!).Result);
        // The second run must not read its own annotated.vtt/index.md back as interviews.
        var (_, log) = Run(request! with { Force = true });
        Assert.Contains("1 of 1 interviews indexed", log);
    }

    [Fact]
    public void Two_files_of_one_name_in_different_folders_are_two_interviews_and_a_decision_targets_one()
    {
        // Issue 11 item 9: two same.vtt in different folders were both interview "same" in the JSON,
        // and a decision for "same" applied to both. The demo transcript names Kraków (line 26), which
        // the rules-only stages link as a LOC heading.
        Input(Path.Combine("in", "a", "same.vtt"));
        Input(Path.Combine("in", "b", "same.vtt"));
        string input = Path.Combine(_dir, "in"), outDir = Path.Combine(_dir, "out");
        string decisions = Path.Combine(_dir, "decisions.csv");
        File.WriteAllText(decisions, "action,interview,label,name,time,value\nreject-heading,b/same,LOC,Kraków,,\n");
        var request = IndexRequest.From([input], outDir, null, "en", "rules-only", null, decisions, out _)!;
        var (result, log) = Run(request);
        Assert.Equal(IndexRunResult.Indexed, result);
        Assert.Contains("decision applied 1x", log);

        JsonElement Index(string folder) => JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, folder, "index.json"))).RootElement;
        bool NamesKrakow(JsonElement index) => index.GetProperty("headings").EnumerateArray().Any(h => h.GetProperty("name").GetString() == "Kraków");
        var a = Index("a_same");
        var b = Index("b_same");
        Assert.Equal("a/same", a.GetProperty("interview").GetString());
        Assert.Equal("b/same", b.GetProperty("interview").GetString());
        Assert.True(NamesKrakow(a));
        Assert.False(NamesKrakow(b));
        var collection = JsonDocument.Parse(File.ReadAllText(Path.Combine(outDir, "collection.json"))).RootElement;
        Assert.Equal(["a/same", "b/same"], collection.GetProperty("interviews").EnumerateArray().Select(i => i.GetProperty("interview").GetString()).Order());

        // The bare file name now names two interviews: refused with file:line, applied to neither.
        File.WriteAllText(decisions, "action,interview,label,name,time,value\nreject-heading,same,LOC,Kraków,,\n");
        (result, log) = Run(IndexRequest.From([input], outDir, null, "en", "rules-only", null, decisions, out _)!);
        Assert.Equal(IndexRunResult.InputsRejected, result);
        Assert.Contains($"{decisions}:2: error: interview \"same\" is the file name of 2 interviews (a/same, b/same)", log);
        Assert.True(NamesKrakow(Index("a_same")));
        Assert.True(NamesKrakow(Index("b_same")));
    }

    [Fact]
    public void A_decisions_file_with_a_bad_row_exits_1_and_keeps_the_later_rows_and_one_with_nothing_usable_is_a_usage_error()
    {
        // Issue 11 item 3: errors in the decisions file used to exit 0.
        string file = Input(Path.Combine("in", "kowalczyk-1998.vtt"));
        string decisions = Path.Combine(_dir, "decisions.csv");
        File.WriteAllText(decisions, "action,interview,label,name,time,value\nfly,,PER,Nobody,,\nreject-heading,,LOC,Kraków,,\n");
        var request = IndexRequest.From([file], Path.Combine(_dir, "out"), null, "en", "rules-only", null, decisions, out _);
        Assert.NotNull(request);
        var (result, log) = Run(request!);
        Assert.Equal(IndexRunResult.InputsRejected, result);
        Assert.Contains($"{decisions}:2: error:", log);
        Assert.Contains("decision applied", log); // the row after the bad one still applied

        File.WriteAllText(decisions, "acton,interview,label,name\nreject-heading,,LOC,Kraków\n");
        Assert.Null(IndexRequest.From([file], Path.Combine(_dir, "out"), null, "en", "rules-only", null, decisions, out string? usage));
        Assert.Contains($"{decisions}:1: error:", usage);
    }

    [Fact]
    public void A_stop_word_in_the_authority_list_is_refused_with_a_reason_and_the_run_exits_1()
    {
        // Issue 11 item 13: "PER,I" used to be accepted silently; "The" is in the English stop words
        // (SwitchTag.Core/Languages/en/stopwords.txt).
        string file = Input(Path.Combine("in", "kowalczyk-1998.vtt"));
        string authority = Path.Combine(_dir, "names.csv");
        File.WriteAllText(authority, "label,name,variants\nPER,I,\nLOC,The,\nPER,Anna Kowalczyk,\n");
        var request = IndexRequest.From([file], Path.Combine(_dir, "out"), null, "en", "rules-only", authority, null, out _);
        var (result, log) = Run(request!);
        Assert.Equal(IndexRunResult.InputsRejected, result);
        Assert.Contains($"{authority}:2: error: \"I\" is a stop word", log);
        Assert.Contains($"{authority}:3: error: \"The\" is a stop word", log);
    }

    [Fact]
    public void An_interviews_outputs_are_replaced_as_a_set_and_leftovers_are_swept_and_stale_folders_reported()
    {
        // Issue 11 item 7: after a kill, index.json was new while the other files were old, and hidden
        // .tmp files stayed for good. Here: what a killed run leaves is planted by hand.
        string file = Input(Path.Combine("in", "kowalczyk-1998.vtt"));
        string outDir = Path.Combine(_dir, "out");
        var request = new IndexRequest([file], outDir, null, "en", TaggingMode.RulesOnly, null, [], []);
        Assert.Equal(IndexRunResult.Indexed, Run(request).Result);
        string folder = Path.Combine(outDir, "kowalczyk-1998");
        File.WriteAllText(Path.Combine(folder, "marker"), "from the earlier set");
        Directory.CreateDirectory(Path.Combine(outDir, ".switchtag-new-kowalczyk-1998.0123"));
        File.WriteAllText(Path.Combine(outDir, ".collection.json.99.abc.tmp"), "half");
        Directory.CreateDirectory(Path.Combine(outDir, "older-run"));
        File.WriteAllText(Path.Combine(outDir, "older-run", "index.json"), "{}");

        var (result, log) = Run(request with { Force = true });
        Assert.Equal(IndexRunResult.Indexed, result);
        Assert.False(File.Exists(Path.Combine(folder, "marker"))); // the folder was replaced whole
        Assert.True(File.Exists(Path.Combine(folder, "index.json")));
        Assert.Contains("removed what an interrupted run left", log);
        Assert.Empty(Directory.GetFileSystemEntries(outDir, ".*"));
        Assert.Contains($"stale folder, no interview of the collection writes it (delete it if it is not needed): {Path.Combine(outDir, "older-run")}", log);
    }
}
