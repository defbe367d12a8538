using System.Collections.Immutable;
using SwitchTag.Core.Decisions;
using SwitchTag.Core.Documents;
using SwitchTag.Formats;
using SwitchTag.Formats.Files;
using SwitchTag.Indexing.Decisions;
using SwitchTag.Tagging;

namespace SwitchTag.Pipeline;

/// <summary>The checked settings of one index run, from the words a person typed.</summary>
public sealed record IndexRequest(
    ImmutableArray<string> Paths,
    string OutDir,
    TranscriptFormat? Format,
    string? MainLanguage,
    TaggingMode Names,
    string? AuthorityPath,
    ImmutableArray<Decision> Decisions,
    ImmutableArray<Diagnostic> DecisionProblems,
    string? Media = null,
    int Jobs = 0,
    bool Force = false,
    bool Prune = false,
    ImmutableArray<string> SkipFolders = default)
{
    /// <summary>The request, or null with <paramref name="usage"/> saying which value is wrong.</summary>
    public static IndexRequest? From(string[] paths, string outDir, string? format, string? main, string names,
        string? authority, string? decisions, out string? usage, string? media = null, bool allowOutInsideInput = false)
    {
        usage = null;
        TranscriptFormat? forced = null;
        if (format is not null)
        {
            if (TranscriptReaders.Default.Find(format) is not { } reader) { usage = $"unknown --format \"{format}\" ({TranscriptReaders.Default.NameList})"; return null; }
            forced = reader.Format;
        }
        TaggingMode mode;
        switch (names)
        {
            case "rules-only": mode = TaggingMode.RulesOnly; break;
            case "default": mode = TaggingMode.RulesThenModel; break;
            default: usage = $"unknown --names \"{names}\" (rules-only or default)"; return null;
        }
        if (main is not null && (main.Length is < 2 or > 3 || !main.All(char.IsAsciiLetterLower)))
        {
            usage = $"--main wants an ISO 639 code such as en or pl, not \"{main}\"";
            return null;
        }
        if (authority is not null && !File.Exists(authority)) { usage = $"--authority: no such file {authority}"; return null; }
        ImmutableArray<Decision> list = [];
        ImmutableArray<Diagnostic> problems = [];
        if (decisions is not null)
        {
            if (!File.Exists(decisions)) { usage = $"--decisions: no such file {decisions}"; return null; }
            (list, problems) = DecisionsFile.Read(decisions);
            if (list.IsEmpty && problems.Any(p => p.Severity == Severity.Error))
            {
                usage = "--decisions: nothing in the file can be applied:" + string.Concat(problems.Select(p => Environment.NewLine + p));
                return null;
            }
        }
        if (File.Exists(outDir)) { usage = $"--out {outDir} is a file, not a folder"; return null; }
        var conflicts = OutputSafety.Check(outDir, paths);
        if (!conflicts.IsEmpty && !allowOutInsideInput)
        {
            usage = string.Join(Environment.NewLine, conflicts) + " (--allow-out-inside-input writes there anyway and never reads the output folder as input)";
            return null;
        }
        return new IndexRequest([.. paths], outDir, forced, main, mode, authority, list, problems, string.IsNullOrWhiteSpace(media) ? null : media,
            SkipFolders: [.. conflicts.Select(c => c.Output).Distinct()]);
    }

    /// <summary><see cref="Jobs"/>: interviews indexed at once, 0 for one per core; the outputs are the
    /// same for any number. <see cref="Force"/> redoes interviews the store holds unchanged;
    /// <see cref="Prune"/> removes from the collection the interviews whose source file is gone.</summary>
    public IndexRequest WithCollection(int jobs, bool force, bool prune) => this with { Jobs = jobs, Force = force, Prune = prune };

    /// <summary>The recording of one interview: <see cref="Media"/> with <c>{interview}</c> replaced by its
    /// id, each folder of it URL-escaped and the '/' between them kept, so recordings may mirror the input folders.</summary>
    public string? MediaOf(string interview) =>
        Media?.Replace("{interview}", string.Join('/', interview.Split('/').Select(Uri.EscapeDataString)), StringComparison.Ordinal);

    /// <summary>The builder for this request: the shipped models and the request's settings.</summary>
    public IndexPipelineBuilder Builder() => new IndexPipelineBuilder()
        .UseShippedModels(Names)
        .UseAuthorityList(AuthorityPath)
        .UseFormat(Format)
        .UseMainLanguage(MainLanguage)
        .UseDecisions(Decisions);
}
