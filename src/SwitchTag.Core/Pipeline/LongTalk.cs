using System.Collections.Immutable;
using SwitchTag.Core.Documents;

namespace SwitchTag.Core.Pipeline;

/// <summary>When a run hands memory back between the steps of one interview. Each step of a long
/// interview (a language pass, a name source, an output file) leaves arrays and objects of the whole
/// talk behind; the GC lets them pile up into the next step and keeps the memory of what it frees
/// committed, so the run's peak was the sum of several steps' leftovers. A compacting collection that
/// also decommits after each step costs a fraction of a second against the seconds each step takes.
/// Short interviews are left to the GC: for them a collection would cost more than it gives back.</summary>
public static class LongTalk
{
    /// <summary>Chars of talk from which an interview counts as long (a 200k-cue turn has about 11.5M).</summary>
    public const long Chars = 2_000_000;

    public static bool IsLong(ImmutableArray<Turn> turns) => turns.Sum(t => (long)t.Text.Length) >= Chars;

    /// <summary>A full, blocking collection that compacts the large object heap too and gives the
    /// freed memory back to the system (a plain <see cref="GC.Collect()"/> keeps it committed).</summary>
    public static void Compact() => GC.Collect(GC.MaxGeneration, GCCollectionMode.Aggressive, blocking: true, compacting: true);
}
