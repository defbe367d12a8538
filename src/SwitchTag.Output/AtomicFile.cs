namespace SwitchTag.Output;

/// <summary>Writes a file so that readers see either the old or the new content, never half of it:
/// the bytes go to a temporary file beside the target, which is then renamed over it (rename within one
/// folder is atomic on POSIX file systems). No fsync per file: it cost more than all the rest of
/// writing, and a crash loses at most a run that can be repeated.</summary>
public static class AtomicFile
{
    /// <summary>Writes <paramref name="path"/> as one <see cref="WriteGate"/> step, so a signal never
    /// leaves its temporary file behind.</summary>
    public static void Write(string path, Action<Stream> write) => WriteGate.Step(() => WriteNow(path, write));

    private static void WriteNow(string path, Action<Stream> write)
    {
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full)!;
        Directory.CreateDirectory(dir);
        string temp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                write(stream);
            }
            File.Move(temp, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }
}
