using System.Runtime.InteropServices;

namespace SwitchTag.Cli;

/// <summary>How the C library hands out the native blocks of ONNX Runtime and SQLite. glibc serves a
/// freed large block's size from its own heap ever after (its mmap threshold rises to it), and memory
/// freed inside that heap stays with the process: ONNX Runtime's arena, released after a long turn's
/// last batch, was held through every later stage and output file (one 200k-cue turn: about 30 MB).
/// A fixed threshold at glibc's default keeps every block of 128 KB or more mapped on its own, so
/// freeing it gives it back. Other C libraries are left as they are.</summary>
internal static class NativeHeap
{
    private const int MmapThreshold = -3; // M_MMAP_THRESHOLD of glibc's malloc.h
    private const int ThresholdBytes = 128 * 1024;

    public static void ReturnLargeBlocks()
    {
        if (!OperatingSystem.IsLinux()) return;
        try
        {
            Mallopt(MmapThreshold, ThresholdBytes);
        }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException)
        {
            // Not glibc (musl has no mallopt): its own policy stands.
        }
    }

    [DllImport("libc.so.6", EntryPoint = "mallopt")]
    private static extern int Mallopt(int param, int value);
}
