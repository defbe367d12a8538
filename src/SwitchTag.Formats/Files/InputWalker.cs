using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Formats.Files;

/// <summary>Finds the files a run reads (FORMATS.md, "Files and folders"). Folders are walked by hand
/// rather than by a recursive enumeration, because that follows a link back to a folder above it until
/// the path is too long, reading every file again on each lap. Here every folder and file is known by
/// its real path: a folder reached again is not walked again, a link to a folder above is reported as
/// a loop, and only regular files are taken (a named pipe would block the read forever, a link to
/// /dev/zero would never end). Hidden entries (a name starting with '.') are not read, and are reported:
/// one warning per folder given, with their count and the first <see cref="HiddenShown"/> paths; only
/// this tool's own temporary files and folders (<see cref="ToolOutputs.IsTemporaryName"/>) pass silently.</summary>
public static class InputWalker
{
    /// <summary>Hidden paths a warning names before "and N more".</summary>
    public const int HiddenShown = 3;

    /// <param name="skipFolders">Real paths of folders never walked (an output folder inside an input,
    /// <see cref="OutputSafety"/>); files named directly are still read.</param>
    /// <param name="notes">Where the hidden-entry warnings go, when not into <paramref name="problems"/>:
    /// they report what was skipped on purpose, not a file that could not be read.</param>
    public static ImmutableArray<InputFile> Find(IEnumerable<string> paths, ICollection<Diagnostic> problems, IEnumerable<string>? skipFolders = null,
        ICollection<Diagnostic>? notes = null)
    {
        var files = ImmutableArray.CreateBuilder<InputFile>();
        var seenFiles = new HashSet<string>(StringComparer.Ordinal);
        // A folder marked seen is never walked: that is all skipping takes.
        var seenFolders = new HashSet<string>(skipFolders ?? [], StringComparer.Ordinal);
        foreach (var path in paths)
        {
            string? real = RealPath.Resolve(path, out var error);
            if (real is null) { Problem(problems, path, Severity.Error, error!); continue; }
            switch (FileKinds.Of(real))
            {
                case FileKind.Directory:
                    var found = new List<InputFile>();
                    var hidden = new List<string>();
                    Walk(path, real, found, hidden, seenFolders, problems);
                    if (hidden.Count > 0) Problem(notes ?? problems, path, Severity.Warning, HiddenMessage(hidden));
                    found.Sort((a, b) => string.CompareOrdinal(a.Path, b.Path));
                    foreach (var f in found)
                        if (seenFiles.Add(f.RealPath)) files.Add(f);
                    break;
                case FileKind.RegularFile:
                    if (seenFiles.Add(real)) files.Add(new InputFile(path, real, null));
                    break;
                case FileKind.Missing:
                    Problem(problems, path, Severity.Error, IsLink(path) ? "broken symbolic link (its target does not exist)" : "no such file or folder");
                    break;
                case var kind:
                    Problem(problems, path, Severity.Error, $"not a regular file ({kind.Describe()}); not read");
                    break;
            }
        }
        return files.ToImmutable();
    }

    private static string HiddenMessage(List<string> hidden)
    {
        hidden.Sort(StringComparer.Ordinal);
        string shown = string.Join(", ", hidden.Take(HiddenShown));
        string more = hidden.Count > HiddenShown ? $", and {hidden.Count - HiddenShown} more" : "";
        return $"{hidden.Count} hidden {(hidden.Count == 1 ? "entry" : "entries")} (name starting with '.') not read: {shown}{more}";
    }

    private static void Walk(string root, string realRoot, List<InputFile> found, List<string> hidden, HashSet<string> seenFolders, ICollection<Diagnostic> problems)
    {
        if (!seenFolders.Add(realRoot)) return;
        // Depth first, each folder with the real paths of the folders above it, to tell a loop (a link
        // to one of those) from a second way into a folder already walked.
        var stack = new Stack<(string Path, string Real, ImmutableHashSet<string> Above)>();
        stack.Push((root, realRoot, ImmutableHashSet.Create(StringComparer.Ordinal, realRoot)));
        while (stack.TryPop(out var folder))
        {
            FileSystemInfo[] entries;
            try
            {
                entries = new DirectoryInfo(folder.Path).GetFileSystemInfos();
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                Problem(problems, folder.Path, Severity.Warning, $"cannot list the folder: {e.Message}; its files are not read");
                continue;
            }
            Array.Sort(entries, (a, b) => string.CompareOrdinal(b.Name, a.Name));
            bool outputsHere = ToolOutputs.FolderHoldsIndex(folder.Path);
            foreach (var entry in entries)
            {
                string path = Path.Join(folder.Path, entry.Name);
                if (entry.Name.StartsWith('.'))
                {
                    if (!ToolOutputs.IsTemporaryName(entry.Name)) hidden.Add(path);
                    continue;
                }
                string? real = Path.Join(folder.Real, entry.Name);
                if (entry.LinkTarget is { } target)
                {
                    real = RealPath.Resolve(path, out var error);
                    if (real is null) { Problem(problems, path, Severity.Warning, $"symbolic link -> {target}: {error}; not followed"); continue; }
                }
                var kind = FileKinds.Of(real);
                switch (kind)
                {
                    case FileKind.Directory:
                        if (folder.Above.Contains(real))
                            Problem(problems, path, Severity.Warning, $"symbolic link loop: leads back to {real}, a folder above it; not followed");
                        else if (seenFolders.Add(real))
                            stack.Push((path, real, folder.Above.Add(real)));
                        break;
                    case FileKind.RegularFile:
                        if (IsCandidate(entry.Name) && !(outputsHere && ToolOutputs.IsOutputName(entry.Name)))
                            found.Add(new InputFile(path, real, root));
                        break;
                    case FileKind.Missing:
                        if (entry.LinkTarget is { } broken && IsCandidate(entry.Name))
                            Problem(problems, path, Severity.Warning, $"broken symbolic link -> {broken}; skipped");
                        break;
                    default:
                        if (IsCandidate(entry.Name))
                            Problem(problems, path, Severity.Warning, $"not a regular file ({kind.Describe()}); skipped");
                        break;
                }
            }
        }
    }

    private static bool IsCandidate(string name) =>
        TranscriptFile.KnownExtensions.Contains(Path.GetExtension(name).ToLowerInvariant()) && !TranscriptFile.IsFolderNote(name);

    private static bool IsLink(string path)
    {
        try
        {
            return new FileInfo(path).LinkTarget is not null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return false;
        }
    }

    private static void Problem(ICollection<Diagnostic> problems, string path, Severity severity, string message) =>
        problems.Add(new Diagnostic(new SourceLine(path, TranscriptFile.WholeFile), severity, message));
}
