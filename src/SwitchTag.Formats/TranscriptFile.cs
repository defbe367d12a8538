using System.Collections.Immutable;
using System.Security.Cryptography;
using System.Text;
using SwitchTag.Core.Documents;
using SwitchTag.Formats.Files;
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

    /// <summary>Files larger than this are refused unless a caller passes a larger limit: the longest
    /// real transcripts are a few MB, and reading takes several times the file's size in memory.</summary>
    public const long DefaultMaxBytes = 64L * 1024 * 1024;

    /// <summary>Reads bytes, decodes them (UTF-8, UTF-16 or UTF-32 with a BOM), detects the format from
    /// the content (unless <paramref name="forced"/>) and parses. Only a regular file is read (symbolic
    /// links followed), and only up to <paramref name="maxBytes"/>.</summary>
    public static ReadResult Read(string path, TranscriptFormat? forced = null, TranscriptReaders? readers = null, long maxBytes = DefaultMaxBytes)
    {
        var kind = FileKinds.Of(path);
        if (kind == FileKind.Missing) return Rejected(path, WholeFile, "cannot read the file: no such file");
        if (kind != FileKind.RegularFile) return Rejected(path, WholeFile, $"not a regular file ({kind.Describe()}); not read");
        byte[] bytes;
        try
        {
            bytes = ReadBounded(path, maxBytes);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return Rejected(path, WholeFile, $"cannot read the file: {e.Message}");
        }
        if (bytes.Length > maxBytes)
            return Rejected(path, WholeFile, $"file is larger than the limit of {maxBytes:N0} bytes; not read");
        if (bytes.Length == 0) return Rejected(path, 1, "file is empty");
        var decoded = TextDecoding.Decode(bytes);
        if (decoded.Text is null) return Rejected(path, decoded.ErrorLine, decoded.Error!);
        return ParseCore(path, decoded.Text, forced, Convert.ToHexStringLower(SHA256.HashData(bytes)), readers ?? TranscriptReaders.Default);
    }

    /// <summary>The file's bytes, or one byte more than the limit when it is larger (the stated length
    /// is not trusted: a file can grow while it is read). Read into an array of the stated length, so
    /// a file that keeps its length is held once, not in a growing buffer and again in its copy.</summary>
    private static byte[] ReadBounded(string path, long maxBytes)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        long length = stream.Length;
        if (length > maxBytes) return new byte[checked((int)Math.Min(maxBytes + 1, int.MaxValue))];
        var bytes = new byte[length];
        int filled = stream.ReadAtLeast(bytes, bytes.Length, throwOnEndOfStream: false);
        if (filled < bytes.Length) return bytes[..filled];
        // Whatever came after the stated length, up to one byte past the limit.
        using var rest = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while (length + rest.Length <= maxBytes && (read = stream.Read(chunk, 0, (int)Math.Min(chunk.Length, maxBytes + 1 - length - rest.Length))) > 0)
            rest.Write(chunk, 0, read);
        return rest.Length == 0 ? bytes : [.. bytes, .. rest.ToArray()];
    }

    /// <summary>Parses text already in memory; the recorded SHA-256 is of its UTF-8 encoding.</summary>
    public static ReadResult Parse(string path, string text, TranscriptFormat? forced = null, TranscriptReaders? readers = null)
    {
        text ??= "";
        if (text.Length > 0 && text[0] == '\uFEFF') text = text[1..];
        return ParseCore(path, text, forced, Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text))), readers ?? TranscriptReaders.Default);
    }

    /// <summary>Files to read, as paths (see <see cref="InputWalker.Find"/> for the real paths and input
    /// roots): folders are walked recursively for <see cref="KnownExtensions"/>, in ordinal path order,
    /// skipping hidden entries (reported in <paramref name="problems"/>), the notes a folder of transcripts carries (<see cref="IsFolderNote"/>)
    /// and this tool's own outputs (<see cref="ToolOutputs"/>); symbolic links are followed, each real
    /// file comes once, loops and special files are reported; a named file is taken whatever its name; a
    /// missing path is reported in <paramref name="problems"/>.</summary>
    public static IEnumerable<string> Expand(IEnumerable<string> paths, ICollection<Diagnostic> problems) =>
        InputWalker.Find(paths, problems).Select(f => f.Path);

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
        string extension = Path.GetExtension(path);
        var reader = forced is { } f ? readers.Find(f) : readers.Detect(text, extension);
        int nul = text.IndexOf('\0');
        if (nul >= 0)
        {
            int line = 1 + text.AsSpan(0, nul).Count('\n');
            if (reader?.Format != TranscriptFormat.WebVtt)
            {
                diagnostics.Error(line, $"binary content (NUL character at char offset {nul})");
                return new ReadResult(null, diagnostics.ToImmutable());
            }
            // W3C WebVTT, "WebVTT parser algorithm": every U+0000 NULL is replaced by U+FFFD. One char
            // for one, so every offset into the text still holds.
            int count = text.AsSpan().Count('\0');
            text = text.Replace('\0', '\uFFFD');
            diagnostics.Warn(line, $"{count} NUL character{(count == 1 ? "" : "s")} replaced by U+FFFD, as the WebVTT parser does");
        }
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
        var transcript = new Transcript(new SourceInfo(path, format, sha256), cues.Value, all);
        return new ReadResult(transcript, all, text);
    }

    private static ReadResult Rejected(string path, int line, string message) =>
        new(null, [new Diagnostic(new SourceLine(path, line), Severity.Error, message)]);
}
