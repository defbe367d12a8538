using System.Collections.Concurrent;
using System.Runtime.InteropServices;
using SwitchTag.Output;

namespace SwitchTag.Pipeline.Collection;

/// <summary>Replaces an interview's outputs as one set: every file is written into a fresh hidden
/// folder beside the target (<c>.switchtag-new-*</c>), then the old folder is renamed aside
/// (<c>.switchtag-old-*</c>), the new one renamed into place and the old one deleted. A reader sees
/// the old set or the new one, never a mix. Hidden folders and <see cref="Output.AtomicFile"/> temp
/// files left by a killed run are swept at the next run's start (<see cref="Sweep"/>). On SIGINT or
/// SIGTERM, <see cref="WriteGate.Stop"/> first lets the write steps in progress finish (the two renames
/// of a swap are one step, so the target is never missing), then this run's hidden folders are removed
/// before the process ends: earlier outputs stay whole and nothing half-written remains.</summary>
public sealed class FolderSwap : IDisposable
{
    private const string NewPrefix = ".switchtag-new-", OldPrefix = ".switchtag-old-";

    private readonly ConcurrentDictionary<string, byte> _pending = new(StringComparer.Ordinal);
    private readonly PosixSignalRegistration[] _signals;

    public FolderSwap() =>
        _signals = [PosixSignalRegistration.Create(PosixSignal.SIGINT, _ => Stop()), PosixSignalRegistration.Create(PosixSignal.SIGTERM, _ => Stop())];

    public void Dispose()
    {
        foreach (var s in _signals) s.Dispose();
    }

    /// <summary>Calls <paramref name="write"/> with a fresh folder, then puts that folder at <paramref name="target"/>.</summary>
    public void Replace(string target, Action<string> write)
    {
        string parent = Path.GetDirectoryName(Path.GetFullPath(target))!, name = Path.GetFileName(target);
        string fresh = Path.Combine(parent, $"{NewPrefix}{name}.{Guid.NewGuid():N}");
        WriteGate.Step(() =>
        {
            Directory.CreateDirectory(fresh);
            _pending[fresh] = 0;
        });
        try
        {
            write(fresh);
            string? old = WriteGate.Step(() =>
            {
                string? aside = null;
                if (Directory.Exists(target))
                {
                    aside = Path.Combine(parent, $"{OldPrefix}{name}.{Guid.NewGuid():N}");
                    _pending[aside] = 0;
                    Directory.Move(target, aside);
                }
                Directory.Move(fresh, target);
                _pending.TryRemove(fresh, out _);
                return aside;
            });
            // Deleting is a step too: the signal's clean-up waits for it rather than deleting the same
            // folder at the same time (one delete failing on the other's work, the process ending with
            // the folder half gone). Refused after a signal, which leaves the folder to that clean-up.
            if (old is not null)
                WriteGate.Step(() =>
                {
                    Directory.Delete(old, recursive: true);
                    _pending.TryRemove(old, out _);
                });
        }
        finally
        {
            // The same for a fresh folder not swapped in; the entry leaves the pending list only with
            // the folder, so a signal's clean-up, which lists them after the steps in progress, finds it.
            try
            {
                WriteGate.Step(() =>
                {
                    if (Directory.Exists(fresh)) Directory.Delete(fresh, recursive: true);
                    _pending.TryRemove(fresh, out _);
                });
            }
            catch (OperationCanceledException) { }
        }
    }

    /// <summary>Removes what an interrupted run left in <paramref name="outDir"/>: hidden swap folders
    /// (an old set whose new one never arrived is put back) and temp files beside the collection files.
    /// Returns the paths removed, for the log.</summary>
    public static List<string> Sweep(string outDir)
    {
        var removed = new List<string>();
        if (!Directory.Exists(outDir)) return removed;
        foreach (var dir in Directory.EnumerateDirectories(outDir, ".switchtag-*").Order(StringComparer.Ordinal).ToList())
        {
            string name = Path.GetFileName(dir);
            if (name.StartsWith(OldPrefix, StringComparison.Ordinal))
            {
                string target = Path.Combine(outDir, name[OldPrefix.Length..name.LastIndexOf('.')]);
                if (!Directory.Exists(target)) { Directory.Move(dir, target); continue; }
            }
            else if (!name.StartsWith(NewPrefix, StringComparison.Ordinal)) continue;
            Directory.Delete(dir, recursive: true);
            removed.Add(dir);
        }
        foreach (var file in Directory.EnumerateFiles(outDir, ".*.tmp").ToList())
        {
            File.Delete(file);
            removed.Add(file);
        }
        return removed;
    }

    /// <summary>After the write steps in progress, removes this run's hidden folders: fresh ones never
    /// swapped in, and old ones whose new set is already in place (a swap is one step, so no old folder
    /// is without its replacement here). Returning lets the signal end the process.</summary>
    private void Stop()
    {
        WriteGate.Stop();
        foreach (var path in _pending.Keys)
            try { if (Directory.Exists(path)) Directory.Delete(path, recursive: true); }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException) { }
    }
}
