namespace SwitchTag.Formats.Files;

/// <summary>Recognises this tool's own per-interview outputs, so a walk over a folder that holds an
/// earlier run's results does not read them back as new interviews. A folder is an output folder
/// when it holds an <c>index.json</c> whose schema is this tool's (<c>switchtag.index/…</c>); in it,
/// the output files with a transcript extension (<c>index.md</c>, <c>annotated.vtt</c>) are skipped.
/// Files of the same name in any other folder are ordinary transcripts.</summary>
public static partial class ToolOutputs
{
    /// <summary>The per-interview files the tool writes (SCHEMA.md); kept here because the readers
    /// must know them and the writers sit above the readers.</summary>
    public static readonly IReadOnlyList<string> FileNames =
        ["index.json", "index.md", "index.html", "mentions.csv", "worklist.csv", "places.geojson", "annotated.vtt", "index.tei.xml"];

    /// <summary>The run-level files the tool writes into the output folder's root.</summary>
    public static readonly IReadOnlyList<string> CollectionFileNames = ["collection.json", "collection.html"];

    private const string SchemaPrefix = "\"switchtag.index/";

    public static bool IsOutputName(string fileName) => FileNames.Contains(fileName, StringComparer.Ordinal);

    /// <summary>The hidden names this tool gives what it writes before putting it in place: an output
    /// file's temporary copy (<c>.NAME.PID.GUID.tmp</c>, Output's AtomicFile) and an interview's fresh
    /// or replaced folder (<c>.switchtag-new-*</c>, <c>.switchtag-old-*</c>, Pipeline's FolderSwap).</summary>
    public static bool IsTemporaryName(string name) =>
        name.StartsWith(".switchtag-new-", StringComparison.Ordinal) || name.StartsWith(".switchtag-old-", StringComparison.Ordinal)
        || TemporaryFile().IsMatch(name);

    [System.Text.RegularExpressions.GeneratedRegex(@"^\..+\.[0-9]+\.[0-9a-f]{32}\.tmp$", System.Text.RegularExpressions.RegexOptions.CultureInvariant)]
    private static partial System.Text.RegularExpressions.Regex TemporaryFile();

    /// <summary>True when the folder holds an index.json written by this tool (its first 512 bytes
    /// name the schema; the writer puts it first).</summary>
    public static bool FolderHoldsIndex(string folder)
    {
        string path = Path.Join(folder, "index.json");
        try
        {
            if (FileKinds.Of(path) != FileKind.RegularFile) return false;
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite);
            var head = new byte[512];
            int read = stream.ReadAtLeast(head, head.Length, throwOnEndOfStream: false);
            return System.Text.Encoding.UTF8.GetString(head, 0, read).Contains(SchemaPrefix, StringComparison.Ordinal);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return false;
        }
    }
}
