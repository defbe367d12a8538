using System.Collections.Immutable;
using System.Security.Cryptography;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Reading;
using SwitchTag.Formats.Text;

namespace SwitchTag.Formats;

/// <summary>Reads transcript files of every supported format into <see cref="Transcript"/>s. Nothing
/// here throws on bad input: problems come back as diagnostics with file:line (FORMATS.md).</summary>
public static class TranscriptFile
{
    /// <summary>File line used for problems with a path as a whole (missing, unreadable).</summary>
    public const int WholeFile = 0;

    /// <summary>The extensions of the default readers, which a folder walk picks up.</summary>
    public static IReadOnlyList<string> KnownExtensions => TranscriptReaders.Default.Extensions;

    /// <summary>Reads bytes, decodes them (UTF-8, or UTF-16 with a BOM), detects the format from the
    /// content (unless <paramref name="forced"/>) and parses.</summary>
    public static ReadResult Read(string path, TranscriptFormat? forced = null, TranscriptReaders? readers = null)
    {
        byte[] bytes;
        try
        {
            bytes = File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return Rejected(path, WholeFile, $"cannot read the file: {e.Message}");
        }
        if (bytes.Length == 0) return Rejected(path, 1, "file is empty");
        var decoded = TextDecoding.Decode(bytes);
        if (decoded.Text is null) return Rejected(path, decoded.ErrorLine, decoded.Error!);
        return ParseCore(path, decoded.Text, forced, Convert.ToHexStringLower(SHA256.HashData(bytes)), readers ?? TranscriptReaders.Default);
    }

    /// <summary>Parses text already in memory; the recorded SHA-256 is of its UTF-8 encoding.</summary>
    public static ReadResult Parse(string path, string text, TranscriptFormat? forced = null, TranscriptReaders? readers = null)
    {
        text ??= "";
        if (text.Length > 0 && text[0] == '\uFEFF') text = text[1..];
        return ParseCore(path, text, forced, Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text))), readers ?? TranscriptReaders.Default);
    }

    /// <summary>Files to read: folders are walked recursively for <see cref="KnownExtensions"/>, in
    /// ordinal path order, skipping hidden entries and the notes a folder of transcripts carries
    /// (README, LICENSE, CHANGELOG, CONTRIBUTING, SOURCES: <see cref="IsFolderNote"/>); a named file is
    /// taken whatever its name; a missing path is reported in <paramref name="problems"/>. Each file
    /// comes once.</summary>
    public static IEnumerable<string> Expand(IEnumerable<string> paths, ICollection<Diagnostic> problems)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var path in paths)
        {
            if (Directory.Exists(path))
            {
                List<string> found;
                try
                {
                    found = [.. Walk(path)];
                }
                catch (Exception e) when (e is IOException or UnauthorizedAccessException)
                {
                    problems.Add(new Diagnostic(new SourceLine(path, WholeFile), Severity.Error, $"cannot list the folder: {e.Message}"));
                    continue;
                }
                found.Sort(StringComparer.Ordinal);
                foreach (var file in found)
                    if (seen.Add(Path.GetFullPath(file))) yield return file;
            }
            else if (File.Exists(path))
            {
                if (seen.Add(Path.GetFullPath(path))) yield return path;
            }
            else
                problems.Add(new Diagnostic(new SourceLine(path, WholeFile), Severity.Error, "no such file or folder"));
        }
    }

    private static IEnumerable<string> Walk(string folder)
    {
        var options = new EnumerationOptions { RecurseSubdirectories = true, AttributesToSkip = FileAttributes.Hidden | FileAttributes.System, IgnoreInaccessible = true };
        return Directory.EnumerateFiles(folder, "*", options)
            .Where(f => !Path.GetRelativePath(folder, f).Split(Path.DirectorySeparatorChar).Any(part => part.StartsWith('.')))
            .Where(f => KnownExtensions.Contains(Path.GetExtension(f).ToLowerInvariant()) && !IsFolderNote(f));
    }

    /// <summary>A folder's own documentation rather than a transcript, by file name.</summary>
    public static bool IsFolderNote(string path) =>
        Path.GetFileNameWithoutExtension(path).ToUpperInvariant() is "README" or "LICENSE" or "LICENCE" or "CHANGELOG" or "CONTRIBUTING" or "SOURCES" or "NOTICE";

    private static ReadResult ParseCore(string path, string text, TranscriptFormat? forced, string sha256, TranscriptReaders readers)
    {
        var diagnostics = new Diagnostics(path);
        try
        {
            return ParseChecked(path, text, forced, sha256, readers, diagnostics);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // The readers are written not to throw; should one still, the file is rejected, not the run.
            diagnostics.Error(WholeFile, $"reader failed: {e.GetType().Name}: {e.Message}");
            return new ReadResult(null, diagnostics.ToImmutable());
        }
    }

    private static ReadResult ParseChecked(string path, string text, TranscriptFormat? forced, string sha256, TranscriptReaders readers, Diagnostics diagnostics)
    {
        if (text.AsSpan().IsWhiteSpace())
        {
            diagnostics.Error(1, text.Length == 0 ? "file is empty" : "file holds only whitespace");
            return new ReadResult(null, diagnostics.ToImmutable());
        }
        int nul = text.IndexOf('\0');
        if (nul >= 0)
        {
            diagnostics.Error(1 + text.AsSpan(0, nul).Count('\n'), $"binary content (NUL character at char offset {nul})");
            return new ReadResult(null, diagnostics.ToImmutable());
        }

        string extension = Path.GetExtension(path);
        var reader = forced is { } f ? readers.Find(f) : readers.Detect(text, extension);
        if (reader is null)
        {
            diagnostics.Error(1, forced is null
                ? "unknown format: no WEBVTT header, no SubRip timing line (\"00:00:01,000 --> 00:00:02,000\") and no line opening with a timestamp in the first lines"
                : $"no reader for the format {forced}");
            return new ReadResult(null, diagnostics.ToImmutable());
        }
        var format = reader.Format;
        if (forced is null && readers.ClaimedBy(extension) is { } expected && expected != reader)
            diagnostics.Warn(1, $"content reads as {format} although the extension {extension} suggests {expected.Format}; read as {format}"
                + (expected.MissingSignature is { } missing ? $" ({missing})" : ""));

        var cues = reader.Read(new SourceText(path, text), diagnostics);
        if (cues is { IsEmpty: true })
        {
            diagnostics.Error(1, $"no cues found (read as {format})");
            cues = null;
        }
        if (cues is null) return new ReadResult(null, diagnostics.ToImmutable());
        var all = diagnostics.ToImmutable();
        var transcript = new Transcript(new SourceInfo(path, format, sha256), text, cues.Value, all);
        return new ReadResult(transcript, all);
    }

    private static ReadResult Rejected(string path, int line, string message) =>
        new(null, [new Diagnostic(new SourceLine(path, line), Severity.Error, message)]);
}
